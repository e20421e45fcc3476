import type { ChartPoint } from './line-chart';

export interface Range {
  min: number;
  max: number;
}

/** The span a chart's y-axis covers: from zero (or below, for negative values) to the largest value. */
export function rangeOf(points: ChartPoint[]): Range {
  const ys = points.map((p) => p.y);
  const min = Math.min(0, ...ys);
  const max = Math.max(...ys);
  return { min, max: max > min ? max : min + 1 };
}

/** Maps a value on the secondary axis onto the primary axis's scale, so both share one plot. */
export const scaler = (from: Range, to: Range) => (v: number) => to.min + ((v - from.min) * (to.max - to.min)) / (from.max - from.min);
