/** Small helpers for property tables tabulated against temperature. */

export interface Point {
  t: number;
  v: number;
}

/** Copy sorted by temperature; throws on an empty table, a non-finite entry or a repeated temperature. */
export function sortedPoints(points: Point[], what: string): Point[] {
  if (points.length === 0) throw new Error(`The ${what} table is empty`);
  const sorted = [...points].sort((a, b) => a.t - b.t);
  for (let i = 0; i < sorted.length; i++) {
    if (!Number.isFinite(sorted[i].t) || !Number.isFinite(sorted[i].v)) {
      throw new Error(`The ${what} table holds a value that is not a number`);
    }
    if (i > 0 && sorted[i].t === sorted[i - 1].t) {
      throw new Error(`The ${what} table repeats ${sorted[i].t} °C`);
    }
  }
  return sorted;
}

/** Index i with pts[i].t <= t < pts[i+1].t, clamped to [0, n−2]. */
export function bracket(pts: Point[], t: number): number {
  let lo = 0;
  let hi = pts.length - 1;
  if (hi < 1) return 0;
  if (t >= pts[hi].t) return hi - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (pts[mid].t <= t) lo = mid;
    else hi = mid;
  }
  return lo;
}

/**
 * Linear interpolation; below the first point the first value holds (property tables
 * usually start at room temperature and change little below it); above the last point
 * there is no data and the answer is null, never an extrapolation.
 */
export function interpolateOrNull(pts: Point[], t: number): number | null {
  const last = pts[pts.length - 1];
  if (t > last.t) return null;
  if (t <= pts[0].t) return pts[0].v;
  const i = bracket(pts, t);
  const a = pts[i];
  const b = pts[i + 1];
  return a.v + ((b.v - a.v) * (t - a.t)) / (b.t - a.t);
}
