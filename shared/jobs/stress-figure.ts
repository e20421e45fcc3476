import type { RestraintResult, RestraintVerdict } from '../engine/types';

/** The restrained-stress figure a screen shows for a run: the same one on the run page, in compare and on the job sheet. */
export interface StressFigure {
  stressMPa: number | null;
  tempC: number | null;
  /** Yield where the figure is taken; null where the data has none. */
  yieldMPa: number | null;
  ratio: number | null;
  /** Set when the figure lies above the yield table: the ratio is against the last tabulated yield, at this temperature, and the real one is higher. */
  yieldDataEndC: number | null;
  verdict: RestraintVerdict;
}

/**
 * The point closest to yield: where the yield table covers the run, or above its top against
 * the last tabulated yield (a lower bound), whichever is the more severe; without yield data,
 * the highest stress with no ratio.
 */
export function stressFigure(r: RestraintResult): StressFigure {
  const g = r.governing;
  const b = r.beyondYieldData;
  if (b && (!g || b.ratio > g.ratio)) {
    return { stressMPa: b.stressMPa, tempC: b.tempC, yieldMPa: b.yieldMPa, ratio: b.ratio, yieldDataEndC: b.yieldTempC, verdict: r.verdict };
  }
  if (g) return { stressMPa: g.stressMPa, tempC: g.tempC, yieldMPa: g.yieldMPa, ratio: g.ratio, yieldDataEndC: null, verdict: r.verdict };
  return { stressMPa: r.peakStressMPa, tempC: r.peakTempC, yieldMPa: null, ratio: null, yieldDataEndC: null, verdict: r.verdict };
}
