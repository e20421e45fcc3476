import { colors } from '../../constants/theme';

/** Series colours in order; far enough apart to tell four curves apart, each readable on white. */
export const SERIES_COLORS = [colors.primary, colors.warning, colors.success, colors.danger, colors.textMuted] as const;

export const seriesColor = (index: number) => SERIES_COLORS[index % SERIES_COLORS.length];
