import { TemperatureRangeError } from './errors';
import { bracket, type Point, sortedPoints } from './tables';
import type { AlloyData } from './types';

/** Lowest temperature the engine accepts; below the first tabulated point the first mean coefficient is used down to here. */
export const MIN_TEMP_C = -50;

/**
 * Thermal strain ε(T) = ᾱ(T)·(T − T_ref) prepared as knots of a piecewise-linear curve.
 *
 * We interpolate the strain, not the coefficient, between tabulated points: strain is the
 * quantity the table really reports at each point (total expansion), linear strain
 * interpolation stays continuous and keeps the tabulated values exact, it never invents a
 * tangent coefficient, and it makes the integral along a linear temperature profile exact
 * (trapezoids between knots), so a run's growth carries no quadrature error at all.
 */
export interface StrainCurve {
  referenceTempC: number;
  minC: number;
  maxC: number;
  knots: Point[]; // v = strain (dimensionless)
}

export function prepareStrainCurve(alloy: Pick<AlloyData, 'referenceTempC' | 'cte'>): StrainCurve {
  const ref = alloy.referenceTempC;
  const table = sortedPoints(
    alloy.cte.map((p) => ({ t: p.tempC, v: p.meanUmPerMK })),
    'expansion',
  );
  const knots: Point[] = table.map((p) => ({ t: p.t, v: p.v * 1e-6 * (p.t - ref) }));
  const first = table[0];
  const minC = Math.min(MIN_TEMP_C, first.t);
  if (minC < first.t) knots.unshift({ t: minC, v: first.v * 1e-6 * (minC - ref) });
  // ε(T_ref) = 0 by definition; a knot there keeps it so between two tabulated points.
  const inside = knots.findIndex((k) => k.t > ref);
  if (inside > 0 && knots[inside - 1].t < ref) knots.splice(inside, 0, { t: ref, v: 0 });
  if (knots.length === 1) {
    // A single point at the top: the first-coefficient line still defines ε below it.
    knots.unshift({ t: first.t - 1, v: first.v * 1e-6 * (first.t - 1 - ref) });
  }
  return { referenceTempC: ref, minC, maxC: knots[knots.length - 1].t, knots };
}

function checkRange(c: StrainCurve, t: number): void {
  // Written so that NaN fails too.
  if (!(t <= c.maxC)) throw new TemperatureRangeError(t, c.maxC, 'above', 'expansion');
  if (t < c.minC) throw new TemperatureRangeError(t, c.minC, 'below', 'expansion');
}

function strainUnchecked(c: StrainCurve, t: number): number {
  const k = c.knots;
  const i = bracket(k, t);
  const a = k[i];
  const b = k[i + 1];
  return a.v + ((b.v - a.v) * (t - a.t)) / (b.t - a.t);
}

/** ε(T) from the reference temperature; throws TemperatureRangeError outside the data. */
export function strainAt(c: StrainCurve, tempC: number): number {
  checkRange(c, tempC);
  return strainUnchecked(c, tempC);
}

/** ∫ ε(T) dT from ta to tb, exact for the piecewise-linear curve. */
export function strainIntegral(c: StrainCurve, ta: number, tb: number): number {
  checkRange(c, ta);
  checkRange(c, tb);
  if (ta === tb) return 0;
  const sign = tb > ta ? 1 : -1;
  const lo = Math.min(ta, tb);
  const hi = Math.max(ta, tb);
  const k = c.knots;
  let sum = 0;
  let t0 = lo;
  let e0 = strainUnchecked(c, lo);
  for (let i = bracket(k, lo) + 1; i < k.length && k[i].t < hi; i++) {
    sum += ((k[i].t - t0) * (e0 + k[i].v)) / 2;
    t0 = k[i].t;
    e0 = k[i].v;
  }
  sum += ((hi - t0) * (e0 + strainUnchecked(c, hi))) / 2;
  return sign * sum;
}

/** Mean strain over a linear temperature ramp from ta to tb (equals ε(ta) when ta = tb). */
export function meanStrainOverRamp(c: StrainCurve, ta: number, tb: number): number {
  if (ta === tb) return strainAt(c, ta);
  return strainIntegral(c, ta, tb) / (tb - ta);
}

/** Strain from install temperature T0 to T, per unit length at T0: (ε(T) − ε(T0)) / (1 + ε(T0)). */
export function strainChange(c: StrainCurve, tempC: number, installTempC: number): number {
  const e0 = strainAt(c, installTempC);
  return (strainAt(c, tempC) - e0) / (1 + e0);
}

/** Growth of a length held uniformly at tempC, installed at installTempC. */
export function uniformGrowthMm(c: StrainCurve, lengthMm: number, tempC: number, installTempC: number): number {
  return lengthMm * strainChange(c, tempC, installTempC);
}
