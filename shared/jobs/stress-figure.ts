import type { RestraintResult, RestraintVerdict } from '../engine/types';

/** The restrained-stress figure a screen shows for a run: the same one on the run page, in compare and on the job sheet. */
export interface StressFigure {
  stressMPa: number | null;
  tempC: number | null;
  /** Yield where the figure is taken; null where the data has none. */
  yieldMPa: number | null;
  ratio: number | null;
  verdict: RestraintVerdict;
}

/** Where yield is known, the point closest to it; otherwise the highest stress, with no ratio. */
export function stressFigure(r: RestraintResult): StressFigure {
  if (r.governing) {
    const g = r.governing;
    return { stressMPa: g.stressMPa, tempC: g.tempC, yieldMPa: g.yieldMPa, ratio: g.ratio, verdict: r.verdict };
  }
  return { stressMPa: r.peakStressMPa, tempC: r.peakTempC, yieldMPa: null, ratio: null, verdict: r.verdict };
}
