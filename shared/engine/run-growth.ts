import { meanStrainOverRamp, type StrainCurve, strainAt } from './expansion';
import type { CurvePoint, GrowthPerMetrePoint, Segment } from './types';

/** Fewest points in the cumulative growth curve. */
export const MIN_CURVE_POINTS = 50;
const CURVE_POINTS = 101;
const PER_METRE_POINTS = 61;

/** Temperature s mm into a segment; exact at the ends and never outside them, so rounding cannot step past the data. */
function tempAlong(seg: Segment, s: number): number {
  if (s <= 0) return seg.startTempC;
  if (s >= seg.lengthMm) return seg.endTempC;
  const t = seg.startTempC + ((seg.endTempC - seg.startTempC) * s) / seg.lengthMm;
  return Math.min(Math.max(t, Math.min(seg.startTempC, seg.endTempC)), Math.max(seg.startTempC, seg.endTempC));
}

/** Growth of the stretch of a segment from s1 to s2 (mm from the segment's start). */
function pieceGrowth(c: StrainCurve, seg: Segment, s1: number, s2: number, e0: number): number {
  return ((s2 - s1) * (meanStrainOverRamp(c, tempAlong(seg, s1), tempAlong(seg, s2)) - e0)) / (1 + e0);
}

/** Growth of one segment: ∫ (ε(T(x)) − ε(T0)) / (1 + ε(T0)) dx, exact for the strain curve. */
export function segmentGrowthMm(c: StrainCurve, seg: Segment, installTempC: number): number {
  return pieceGrowth(c, seg, 0, seg.lengthMm, strainAt(c, installTempC));
}

export function runGrowthMm(c: StrainCurve, segments: Segment[], installTempC: number): number {
  const e0 = strainAt(c, installTempC);
  let total = 0;
  for (const seg of segments) total += pieceGrowth(c, seg, 0, seg.lengthMm, e0);
  return total;
}

export function totalLengthMm(segments: Segment[]): number {
  return segments.reduce((sum, s) => sum + s.lengthMm, 0);
}

/** Temperature at a distance along the run (at a joint between segments, the downstream segment's start). */
export function tempAtMm(segments: Segment[], atMm: number): number {
  let start = 0;
  for (let i = 0; i < segments.length; i++) {
    const seg = segments[i];
    const end = start + seg.lengthMm;
    if (atMm < end || i === segments.length - 1) return tempAlong(seg, atMm - start);
    start = end;
  }
  throw new Error('The run has no segments');
}

export interface RunGrowth {
  growthMm: number;
  curve: CurvePoint[];
}

/**
 * Total growth and the cumulative curve along the run: evenly spaced points plus both ends
 * of every segment, so a step in temperature between segments shows as two points.
 */
export function runGrowthCurve(c: StrainCurve, segments: Segment[], installTempC: number): RunGrowth {
  const e0 = strainAt(c, installTempC);
  const length = totalLengthMm(segments);
  const step = length / (CURVE_POINTS - 1);
  const curve: CurvePoint[] = [{ atMm: 0, tempC: segments[0].startTempC, growthMm: 0 }];
  let cumulative = 0;
  let start = 0;
  segments.forEach((seg, i) => {
    if (i > 0) curve.push({ atMm: start, tempC: seg.startTempC, growthMm: cumulative });
    let s = 0;
    // The tolerance keeps an even point from landing a rounding error away from a segment end.
    const tol = step * 1e-6;
    const end = start + seg.lengthMm;
    let k = Math.floor(start / step) + 1;
    if (k * step - start < tol) k++;
    while (k * step < end - tol) {
      const next = k * step - start;
      cumulative += pieceGrowth(c, seg, s, next, e0);
      s = next;
      curve.push({ atMm: start + s, tempC: tempAlong(seg, s), growthMm: cumulative });
      k++;
    }
    cumulative += pieceGrowth(c, seg, s, seg.lengthMm, e0);
    start += seg.lengthMm;
    curve.push({ atMm: start, tempC: seg.endTempC, growthMm: cumulative });
  });
  const last = curve[curve.length - 1];
  last.atMm = length;
  return { growthMm: last.growthMm, curve };
}

/** Growth per metre installed at installTempC, from installTempC up to the top of the alloy's data. */
export function growthPerMetreCurve(c: StrainCurve, installTempC: number): GrowthPerMetrePoint[] {
  const e0 = strainAt(c, installTempC);
  const temps = new Set<number>();
  const span = c.maxC - installTempC;
  for (let i = 0; i < PER_METRE_POINTS; i++) temps.add(Math.min(installTempC + (span * i) / (PER_METRE_POINTS - 1), c.maxC));
  for (const k of c.knots) if (k.t > installTempC && k.t < c.maxC) temps.add(k.t);
  temps.add(c.maxC);
  return [...temps]
    .sort((a, b) => a - b)
    .map((t) => ({ tempC: t, growthMmPerM: (1000 * (strainAt(c, t) - e0)) / (1 + e0) }));
}
