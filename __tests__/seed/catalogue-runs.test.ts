/**
 * Every seeded alloy through the calculator: a run at every 25 °C from 20 °C to the continuous
 * limit computes without an error, and the limit check turns to caution just below the governing
 * limit and to over just above it. The check values are the seed's own limits (what a shop reads on
 * the alloy screen) and the caution band of 50 °C (our own choice, no published source).
 */
import { calculateRun } from '../../shared/engine/calculate-run';
import { CAUTION_MARGIN_C } from '../../shared/engine/limits';
import type { AlloyData, FlexPart, RunInput } from '../../shared/engine/types';
import { type Alloy, catalogue } from './seed-catalogue';

const data = (a: Alloy): AlloyData => ({
  referenceTempC: a.referenceTempC,
  cte: a.cte.map(({ tempC, meanUmPerMK }) => ({ tempC, meanUmPerMK })),
  modulus: a.modulus.map(({ tempC, gpa }) => ({ tempC, gpa })),
  yield: a.yield.map(({ tempC, mpa }) => ({ tempC, mpa })),
  densityKgM3: a.densityKgM3,
  maxContinuousC: a.maxContinuousC,
  maxIntermittentC: a.maxIntermittentC,
  pricePerKg: a.pricePerKg,
  warningRanges: a.warningRanges,
});
/** 1 m of 63.5 × 1.6 mm tube held at one temperature, installed at 20 °C. */
const run = (tempC: number): RunInput => ({
  tube: { odMm: 63.5, wallMm: 1.6 },
  installTempC: 20,
  segments: [{ lengthMm: 1000, startTempC: tempC, endTempC: tempC }],
});
// A fixture part, not data: generous ratings so that only the alloy data can make a run fail.
const FLEX_FIXTURE: FlexPart = {
  id: 'fixture', name: 'fixture', purpose: 'thermal_bellows', boreMm: 63.5, liveLengthMm: 300, ratedAxialCompressionMm: 60, ratedAxialExtensionMm: 30,
  lateralOffsetMm: 10, ratedAngularDeg: 5, ratedCycles: null, maxTempC: 1200, price: 0,
};
const governing = (a: Alloy) => Math.min(a.maxContinuousC, a.maxIntermittentC);

describe('seed catalogue through the calculator', () => {
  it('when every alloy runs from 20 °C to its continuous limit in 25 °C steps, then none fails', () => {
    const failures: string[] = [];
    for (const a of catalogue.alloys) {
      for (let t = 20; t <= a.maxContinuousC; t += 25) {
        try {
          const r = calculateRun(run(t), data(a));
          if (!(r.growthMm >= 0) || !(r.restraint.peakStressMPa === null || Number.isFinite(r.restraint.peakStressMPa))) failures.push(`${a.uns}@${t}: ${r.growthMm}`);
          // The joints go through the same data, from the −20 °C coldest start to the run's heat.
          const joints = calculateRun({ ...run(t), flex: { parts: [FLEX_FIXTURE] }, slip: { inner: { tempC: t }, outer: { tempC: t }, coldClearanceMm: 0.3, coldEngagementMm: 80, coldAxialGapMm: 40 } }, data(a));
          if (!joints.flex || !joints.slip) failures.push(`${a.uns}@${t}: no joint result`);
        } catch (e) {
          failures.push(`${a.uns}@${t}: ${(e as Error).message} ${JSON.stringify((e as { fields?: unknown }).fields ?? {})}`);
        }
      }
    }
    expect(failures).toEqual([]);
  });

  it('when every alloy runs just below and just above its governing limit, then the check says caution, then over', () => {
    const wrong: string[] = [];
    for (const a of catalogue.alloys) {
      const g = governing(a);
      const status = (t: number) => calculateRun(run(t), data(a)).limit.status;
      const seen = [status(g - CAUTION_MARGIN_C - 1), status(g - 1), status(g + 1)];
      if (seen.join() !== 'ok,caution,over') wrong.push(`${a.uns}: ${seen.join()}`);
    }
    expect(wrong).toEqual([]);
  });

  it('when an alloy\'s table stopped short of its limit (the old 409 at 500 °C against 675 °C), then this check would fail', () => {
    const a = { ...catalogue.alloys.find((x) => x.uns === 'S40910')!, maxContinuousC: 675, maxIntermittentC: 815 };
    expect(() => calculateRun(run(676), data(a))).toThrow();
  });

  it('when the hottest run reaches the yield table\'s end, then the verdict is still given (joint needed) without an error', () => {
    const a = catalogue.alloys.find((x) => x.uns === 'S32100')!;
    const r = calculateRun(run(a.maxContinuousC), data(a));
    expect(r.restraint.jointNeeded).toBe(true);
    expect(r.warnings.map((w) => w.code)).toEqual(expect.arrayContaining(['YIELD_DATA_RANGE', 'MODULUS_DATA_RANGE']));
  });
});
