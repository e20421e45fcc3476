import { EngineInputError } from './errors';
import { type StrainCurve, strainAt } from './expansion';
import { interpolateOrNull, type Point, sortedPoints } from './tables';
import type { AlloyData, EngineWarning, RestraintResult, RestraintVerdict, Segment } from './types';
import { phrase, quantity } from '../units';

/**
 * The run may be left rigidly held only while the restrained stress stays at or below this
 * share of yield (a factor of 1.5 on yield). Common practice, no published source.
 */
export const CLEAR_STRESS_RATIO = 2 / 3;
export const CLEAR_STRESS_NOTE = 'A rigidly held run passes only at or below two thirds of yield (a factor of 1.5): common practice, no published source';
const SUBDIVISIONS = 8;

/** Each table sorted, or null where the alloy has none (the stress check then says it is not in the data). */
export interface StrengthTables {
  modulus: Point[] | null; // GPa
  yield: Point[] | null; // MPa
}

/** Both tables sorted; values must be positive (a table that falls to zero should stop at its last positive point). */
export function prepareStrengthTables(alloy: Pick<AlloyData, 'modulus' | 'yield'>): StrengthTables {
  const modulus = alloy.modulus.length ? sortedPoints(alloy.modulus.map((p) => ({ t: p.tempC, v: p.gpa })), 'modulus') : null;
  const yieldPts = alloy.yield.length ? sortedPoints(alloy.yield.map((p) => ({ t: p.tempC, v: p.mpa })), 'yield') : null;
  if (modulus?.some((p) => p.v <= 0)) throw new EngineInputError({ 'alloy.modulus': 'Modulus values must be above 0' });
  if (yieldPts?.some((p) => p.v <= 0)) throw new EngineInputError({ 'alloy.yield': 'Yield values must be above 0' });
  return { modulus, yield: yieldPts };
}

/** E(T) in GPa; above the table the last value is held (see restraint()). */
function modulusAt(modulus: Point[], tempC: number): number {
  return interpolateOrNull(modulus, tempC) ?? modulus[modulus.length - 1].v;
}

/** Fully restrained thermal stress σ = E(T)·(ε(T) − ε(T0)) in MPa (positive = compression). */
export function restrainedStressMPa(c: StrainCurve, modulus: Point[], tempC: number, installTempC: number): number {
  return modulusAt(modulus, tempC) * 1000 * (strainAt(c, tempC) - strainAt(c, installTempC));
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
  for (const p of [...c.knots, ...(s.modulus ?? []), ...(s.yield ?? [])]) if (p.t > lo && p.t < hi) breaks.add(p.t);
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

export interface StrengthBases {
  modulusBasis?: string | null;
  yieldBasis?: string | null;
}

function notInData(missing: 'modulus' | 'yield', bases: StrengthBases, rest: Partial<RestraintResult> = {}): RestraintResult {
  return {
    missing,
    peakStressMPa: null,
    peakTempC: null,
    governing: null,
    beyondYieldData: null,
    verdict: 'unknown',
    clearRatio: CLEAR_STRESS_RATIO,
    clearRatioNote: CLEAR_STRESS_NOTE,
    modulusBasis: bases.modulusBasis ?? null,
    yieldBasis: bases.yieldBasis ?? null,
    jointNeeded: null,
    warnings: [],
    ...rest,
  };
}

/**
 * The run held rigidly at both ends with nothing giving, judged element by element (an upper
 * bound: it ignores that a straight run shares one axial force). Below a table's first point
 * its first value holds.
 *
 * Beyond the tables' top:
 * - modulus: the last value is held, with a warning. Modulus falls with temperature, so
 *   this overstates the stress, which errs towards "joint needed".
 * - yield: no value, since holding it would overstate the strength. Yield does not rise with
 *   temperature in the exhaust range, so a stress there at or above the last tabulated yield
 *   yields, and one above the clear share of it cannot be left rigid; otherwise the verdict
 *   is unknown.
 */
export function restraint(c: StrainCurve, s: StrengthTables, segments: Segment[], installTempC: number, bases: StrengthBases = {}): RestraintResult {
  const modulus = s.modulus;
  if (!modulus) return notInData('modulus', bases);
  const warnings: EngineWarning[] = [];
  const temps = sampleTemps(c, s, segments);
  const topT = temps[temps.length - 1];
  const eMax = modulus[modulus.length - 1].t;
  if (topT > eMax) {
    warnings.push({
      code: 'MODULUS_DATA_RANGE',
      message: phrase`The alloy's modulus data stop at ${quantity('temperature', eMax)}, below the run's ${quantity('temperature', topT)}: the ${quantity('temperature', eMax)} value is used above it, which overstates the restrained stress`,
    });
  }
  // One pass, no per-point objects: this runs on every keystroke of the run editor.
  const e0 = strainAt(c, installTempC);
  const yieldPts = s.yield;
  const lastYield = yieldPts ? yieldPts[yieldPts.length - 1] : null;
  let peak = 0;
  let peakT = temps[0];
  let worst = -1;
  let worstI = -1;
  let worstY = 0;
  let beyond = -1;
  let beyondI = -1;
  const stresses = new Float64Array(temps.length);
  for (let i = 0; i < temps.length; i++) {
    const t = temps[i];
    const sigma = Math.abs(modulusAt(modulus, t) * 1000 * (strainAt(c, t) - e0));
    stresses[i] = sigma;
    if (sigma > peak) {
      peak = sigma;
      peakT = t;
    }
    if (!yieldPts || !lastYield) continue;
    const y = interpolateOrNull(yieldPts, t);
    if (y === null) {
      if (sigma / lastYield.v > beyond) {
        beyond = sigma / lastYield.v;
        beyondI = i;
      }
    } else if (sigma / y > worst) {
      worst = sigma / y;
      worstI = i;
      worstY = y;
    }
  }
  if (!yieldPts || !lastYield) return notInData('yield', bases, { peakStressMPa: peak, peakTempC: peakT, warnings });
  if (topT > lastYield.t) {
    warnings.push({
      code: 'YIELD_DATA_RANGE',
      message: phrase`The alloy's yield data stop at ${quantity('temperature', lastYield.t)}, below the run's ${quantity('temperature', topT)}: the stress is judged against yield only up to ${quantity('temperature', lastYield.t)}`,
    });
  }
  const governing = worstI < 0 ? null : { stressMPa: stresses[worstI], tempC: temps[worstI], yieldMPa: worstY, ratio: worst };
  const beyondData =
    beyondI < 0 ? null : { stressMPa: stresses[beyondI], tempC: temps[beyondI], yieldMPa: lastYield.v, yieldTempC: lastYield.t, ratio: beyond };
  worst = Math.max(worst, 0);
  beyond = Math.max(beyond, 0);
  const partlyBeyond = temps.some((t) => t > lastYield.t);
  const verdict: RestraintVerdict =
    worst >= 1 || beyond >= 1 ? 'yields' : worst > CLEAR_STRESS_RATIO || beyond > CLEAR_STRESS_RATIO ? 'marginal' : partlyBeyond ? 'unknown' : 'clear';
  return {
    missing: null,
    peakStressMPa: peak,
    peakTempC: peakT,
    governing,
    beyondYieldData: beyondData,
    verdict,
    clearRatio: CLEAR_STRESS_RATIO,
    clearRatioNote: CLEAR_STRESS_NOTE,
    modulusBasis: bases.modulusBasis ?? null,
    yieldBasis: bases.yieldBasis ?? null,
    jointNeeded: verdict === 'clear' ? false : verdict === 'unknown' ? null : true,
    warnings,
  };
}
