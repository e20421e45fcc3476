import { colors, fonts, typography } from '../../constants/theme';

/** Series colours in order; far enough apart to tell four curves apart, each readable on white. */
export const SERIES_COLORS = [colors.primary, colors.warning, colors.success, colors.danger, colors.textMuted] as const;

export const seriesColor = (index: number) => SERIES_COLORS[index % SERIES_COLORS.length];

/** Axis, grid and label styles every chart of the app shares. */
export const chartAxisStyle = {
  axis: { stroke: colors.borderStrong },
  grid: { stroke: colors.border, strokeDasharray: '2,4' },
  tickLabels: {
    fontFamily: fonts.regular,
    fontSize: typography.caption.fontSize - 1,
    fill: colors.textMuted,
    padding: 4,
  },
  axisLabel: {
    fontFamily: fonts.semibold,
    fontSize: typography.caption.fontSize,
    fill: colors.text,
    padding: 32,
  },
};
