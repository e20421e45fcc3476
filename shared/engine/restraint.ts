import { EngineInputError } from './errors';
import { type StrainCurve, strainAt } from './expansion';
import { interpolateOrNull, type Point, sortedPoints } from './tables';
import type { AlloyData, EngineWarning, RestraintResult, Segment } from './types';

/** Local stress/yield ratio at or above which the run cannot be left rigidly held: it would yield. */
export const JOINT_NEEDED_STRESS_RATIO = 1;
const SUBDIVISIONS = 8;

export interface StrengthTables {
  modulus: Point[]; // GPa
  yield: Point[]; // MPa
}

/** Both tables sorted; values must be positive (a table that falls to zero should stop at its last positive point). */
export function prepareStrengthTables(alloy: Pick<AlloyData, 'modulus' | 'yield'>): StrengthTables {
  const modulus = sortedPoints(alloy.modulus.map((p) => ({ t: p.tempC, v: p.gpa })), 'modulus');
  const yieldPts = sortedPoints(alloy.yield.map((p) => ({ t: p.tempC, v: p.mpa })), 'yield');
  if (modulus.some((p) => p.v <= 0)) throw new EngineInputError({ 'alloy.modulus': 'Modulus values must be above 0' });
  if (yieldPts.some((p) => p.v <= 0)) throw new EngineInputError({ 'alloy.yield': 'Yield values must be above 0' });
  return { modulus, yield: yieldPts };
}

/** E(T) in GPa; above the table the last value is held (see restraint()). */
function modulusAt(s: StrengthTables, tempC: number): number {
  return interpolateOrNull(s.modulus, tempC) ?? s.modulus[s.modulus.length - 1].v;
}

/** Fully restrained thermal stress σ = E(T)·(ε(T) − ε(T0)) in MPa (positive = compression). */
export function restrainedStressMPa(c: StrainCurve, s: StrengthTables, tempC: number, installTempC: number): number {
  return modulusAt(s, tempC) * 1000 * (strainAt(c, tempC) - strainAt(c, installTempC));
}

/** Temperatures to sample: every segment's range, split at every table point inside it. */
function sampleTemps(c: StrainCurve, s: StrengthTables, segments: Segment[]): number[] {
  const lo = Math.min(...segments.map((g) => Math.min(g.startTempC, g.endTempC)));
  const hi = Math.max(...segments.map((g) => Math.max(g.startTempC, g.endTempC)));
  const breaks = new Set<number>([lo, hi]);
  for (const g of segments) {
    breaks.add(g.startTempC);
    breaks.add(g.endTempC);
  }
  for (const p of [...c.knots, ...s.modulus, ...s.yield]) if (p.t > lo && p.t < hi) breaks.add(p.t);
  const sorted = [...breaks].sort((a, b) => a - b);
  const covered = (t: number) =>
    segments.some((g) => t >= Math.min(g.startTempC, g.endTempC) && t <= Math.max(g.startTempC, g.endTempC));
  const temps: number[] = [];
  for (let i = 0; i < sorted.length; i++) {
    if (covered(sorted[i])) temps.push(sorted[i]);
    if (i + 1 < sorted.length) {
      for (let j = 1; j < SUBDIVISIONS; j++) {
        const t = sorted[i] + ((sorted[i + 1] - sorted[i]) * j) / SUBDIVISIONS;
        if (covered(t)) temps.push(t);
      }
    }
  }
  return temps;
}

/**
 * The run held rigidly at both ends, judged element by element (an upper bound: it ignores
 * that a straight run shares one axial force). Below a table's first point its first value
 * holds.
 *
 * Beyond the tables' top:
 * - modulus: the last value is held, with a warning. Modulus falls with temperature, so
 *   this overstates the stress, which errs towards "joint needed".
 * - yield: no value (null), since holding it would overstate the strength. The verdict is
 *   still "joint needed" when the stress there reaches the last tabulated yield (yield does
 *   not rise with temperature in the exhaust range); otherwise it is null: unknown.
 */
export function restraint(c: StrainCurve, s: StrengthTables, segments: Segment[], installTempC: number): RestraintResult {
  const warnings: EngineWarning[] = [];
  const temps = sampleTemps(c, s, segments);
  const topT = temps[temps.length - 1];
  const eMax = s.modulus[s.modulus.length - 1].t;
  const lastYield = s.yield[s.yield.length - 1];
  if (topT > eMax) {
    warnings.push({
      code: 'MODULUS_DATA_RANGE',
      message: `The alloy's modulus data stop at ${eMax} °C, below the run's ${topT} °C: the ${eMax} °C value is used above it, which overstates the restrained stress`,
    });
  }
  if (topT > lastYield.t) {
    warnings.push({
      code: 'YIELD_DATA_RANGE',
      message: `The alloy's yield data stop at ${lastYield.t} °C, below the run's ${topT} °C: no stress ratio above it`,
    });
  }

  let peak = 0;
  let peakT = temps[0];
  let worst = 0;
  let worstT = temps[0];
  let beyondYieldReached = false;
  let beyondYieldUnknown = false;
  for (const t of temps) {
    const sigma = Math.abs(restrainedStressMPa(c, s, t, installTempC));
    if (sigma > peak) {
      peak = sigma;
      peakT = t;
    }
    const y = interpolateOrNull(s.yield, t);
    if (y === null) {
      if (sigma >= lastYield.v * JOINT_NEEDED_STRESS_RATIO) beyondYieldReached = true;
      else beyondYieldUnknown = true;
    } else if (sigma / y > worst) {
      worst = sigma / y;
      worstT = t;
    }
  }
  const yieldAtPeak = interpolateOrNull(s.yield, peakT);
  const coveredSomewhere = temps.some((t) => t <= lastYield.t);
  const jointNeeded =
    worst >= JOINT_NEEDED_STRESS_RATIO || beyondYieldReached ? true : beyondYieldUnknown ? null : false;
  return {
    restrainedStressMPa: peak,
    stressPeakTempC: peakT,
    yieldAtPeakMPa: yieldAtPeak,
    stressRatio: yieldAtPeak === null ? null : peak / yieldAtPeak,
    worstStressRatio: coveredSomewhere ? worst : null,
    worstStressTempC: coveredSomewhere ? worstT : null,
    jointNeeded,
    warnings,
  };
}
