import type { AlloyVersionView } from '../../shared/schemas/alloy';
import type { UnitSystem } from '../../shared/units';
import { growthAt, maxDataC } from './curves';
import { formatGrowth, formatTemp } from './format';

export interface LimitMarking {
  /** The marked point: the continuous limit when the data reach it, else the end of the data. */
  marker: { tempC: number; growth: number; label: string } | null;
  /** Said beside the legend when the limit lies above the data and cannot be drawn. */
  note: string | null;
}

/**
 * The growth chart's marker. Nothing is drawn above the table (the engine does not extrapolate), so a
 * continuous limit above the last table point is named in words, never as a point at the data's end.
 */
export function limitMarking(version: AlloyVersionView, units: UnitSystem): LimitMarking {
  const dataEndC = maxDataC(version);
  const limitC = version.maxContinuousC;
  const reaches = limitC <= dataEndC;
  const tempC = reaches ? limitC : dataEndC;
  const growth = growthAt(version, tempC);
  const at = growth === null ? null : formatGrowth(growth, units);
  return {
    marker:
      growth === null
        ? null
        : { tempC, growth, label: reaches ? `Continuous limit ${formatTemp(limitC, units)}: ${at}` : `End of the data ${formatTemp(dataEndC, units)}: ${at}` },
    note: reaches ? null : `Continuous limit ${formatTemp(limitC, units)}: above the data, so not drawn.`,
  };
}
