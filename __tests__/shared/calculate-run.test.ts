import fc from 'fast-check';
import { CAUTIONS, calculateRun } from '../../shared/engine/calculate-run';
import { EngineInputError, isEngineInputError } from '../../shared/engine/errors';
import { prepareStrainCurve } from '../../shared/engine/expansion';
import { runGrowthMm } from '../../shared/engine/run-growth';
import type { AlloyData, FlexPart, RunInput, Segment } from '../../shared/engine/types';
import { inToMm, wordPhrase } from '../../shared/units';
import { enCarbonElongation, enStainlessElongation, enStainlessElongationIntegral, meanCteTable, range, stainless304 } from './published';

// A fixture part, catalogue-like, not data.
const flexPart: FlexPart = {
  id: 'f',
  name: 'f',
  purpose: 'thermal_bellows',
  boreMm: 76.2,
  liveLengthMm: 150,
  ratedAxialCompressionMm: 30,
  ratedAxialExtensionMm: 30,
  lateralOffsetMm: 5,
  ratedAngularDeg: 3,
  ratedCycles: null,
  maxTempC: 900,
  price: 1,
};

const alloy = stainless304();
const TOP = 1200; // top of the stainless304() expansion table
const base = (segments: Segment[], over: Partial<RunInput> = {}): RunInput => ({
  tube: { odMm: inToMm(3), wallMm: inToMm(0.065) },
  installTempC: 20,
  segments,
  ...over,
});

function catchError(fn: () => unknown): unknown {
  try {
    fn();
  } catch (e) {
    return e;
  }
  throw new Error('expected a throw');
}

describe('calculateRun', () => {
  const input = base(
    [
      { lengthMm: 600, startTempC: 880, endTempC: 790 },
      { lengthMm: 400, startTempC: 790, endTempC: 650 },
    ],
    { flex: { parts: [flexPart] }, slip: { inner: { tempC: 850 }, outer: { tempC: 700 }, coldClearanceMm: 0.3, coldEngagementMm: 90, coldAxialGapMm: 25 } },
  );
  const r = calculateRun(input, { ...alloy, pricePerKg: 5.2 });
  // EN 1993-1-2 Annex C integrated in closed form along each linear gradient.
  const enGrowth = (lengthMm: number, a: number, b: number) => (lengthMm * (enStainlessElongationIntegral(b) - enStainlessElongationIntegral(a))) / (b - a);
  const published = enGrowth(600, 880, 790) + enGrowth(400, 790, 650);

  it('when given a run, then the response carries the fields of the API', () => {
    for (const key of ['growthMm', 'curve', 'growthPerMetreCurve', 'peakTempC', 'restraint', 'limit', 'massKg', 'materialCost', 'warnings', 'flex', 'slip']) {
      expect(r).toHaveProperty(key);
    }
    expect(Object.keys(r.limit)).toEqual(expect.arrayContaining(['status', 'marginC', 'continuousC', 'intermittentC']));
  });

  it('when given a run, then growth and mass agree with the published law and the tube formula', () => {
    expect(r.growthMm).toBeCloseTo(published, 3);
    // 3.0 in × 0.065 in 304 weighs 3.0933 kg/m (reference-data §6, m = ρ·π·(OD − t)·t)
    expect(r.massKg).toBeCloseTo(3.0933, 3);
    expect(r.materialCost).toBeCloseTo(3.0933 * 5.2, 2);
    expect(r.peakTempC).toBe(880);
  });

  it('when the run is over the intermittent limit and in the carbide range, then both warnings come back', () => {
    expect(r.limit.status).toBe('over');
    expect(r.warnings.map((w) => w.code)).toEqual(expect.arrayContaining(['TEMP_OVER_LIMIT', 'CARBIDE_PRECIPITATION']));
  });

  it('when flex and slip are asked, then they take the run’s published growth and contraction to the coldest start', () => {
    expect(r.flex?.states.find((s) => s.state === 'hot')?.axialGrowthMm).toBeCloseTo(published, 3);
    expect(r.slip?.hotClosureMm).toBeCloseTo(published, 3);
    // −20 °C default coldest start; below the fixture's first point (30 °C) its first mean coefficient holds.
    expect(r.slip?.coldDrawOutMm).toBeCloseTo(1000 * (enStainlessElongation(30) / 10) * 40, 6);
    expect(r.slip?.innerDiameterMm).toBe(input.tube.odMm);
  });

  it('when a slip member names an alloy the caller resolved, then that alloy is used', () => {
    const carbon: AlloyData = { ...alloy, cte: meanCteTable(enCarbonElongation, range(30, 1200, 10)) };
    const slip = { inner: { tempC: 500 }, outer: { tempC: 500, alloyId: 'carbon' }, coldClearanceMm: 0.3, coldEngagementMm: 90, coldAxialGapMm: 25 };
    const mixed = calculateRun({ ...input, slip }, alloy, { slipAlloys: { outer: carbon } });
    // 76.2·ε_EN,stainless(500) − 76.5·ε_EN,carbon(500): the carbon sleeve grows less.
    const want = inToMm(3) * enStainlessElongation(500) - (inToMm(3) + 0.3) * enCarbonElongation(500);
    expect(mixed.slip?.states.find((s) => s.state === 'hot')?.differentialGrowthMm).toBeCloseTo(want, 3);
    expect(() => calculateRun({ ...input, slip }, alloy)).toThrow(EngineInputError);
  });

  it('when the shop’s design basis is given, then the joints use its share and coldest start', () => {
    const r2 = calculateRun(input, alloy, { design: { travelShare: 0.5, coldestAmbientC: 0 } });
    expect(r2.flex?.travelShare).toBe(0.5);
    expect(r2.flex?.coldestAmbientC).toBe(0);
    expect(r2.slip?.requiredGapMm).toBeCloseTo(published / 0.5, 3);
  });

  it('when shown, then the cautions cover hot surfaces, weld fume, fire and deferral to codes and certified data', () => {
    const text = CAUTIONS.map((c) => c.text).join(' ');
    expect(text).toMatch(/burn/);
    expect(text).toMatch(/chromium/);
    expect(text).toMatch(/nickel/);
    expect(text).toMatch(/brake lines/);
    expect(text).toMatch(/codes/);
    expect(text).toMatch(/certified data/);
  });
});

describe('calculateRun error paths', () => {
  it('when a temperature is above the alloy’s data, then EngineInputError names each field and the top of the data', () => {
    const e = catchError(() =>
      calculateRun(base([{ lengthMm: 100, startTempC: 1250, endTempC: 900 }, { lengthMm: 100, startTempC: 900, endTempC: 1300 }]), alloy),
    );
    expect(isEngineInputError(e)).toBe(true);
    expect((e as EngineInputError).fields).toEqual({
      'segments.0.startTempC': `Above the alloy's data (max ${TOP} °C)`,
      'segments.1.endTempC': `Above the alloy's data (max ${TOP} °C)`,
    });
  });

  it('when the install or a slip temperature is outside the data, then those paths are named', () => {
    const e1 = catchError(() => calculateRun(base([{ lengthMm: 100, startTempC: 500, endTempC: 400 }], { installTempC: -60 }), alloy));
    expect((e1 as EngineInputError).fields).toHaveProperty(['installTempC']);
    const slip = { inner: { tempC: 1300 }, outer: { tempC: 700 }, coldClearanceMm: 0.3, coldEngagementMm: 90, coldAxialGapMm: 25 };
    const e2 = catchError(() => calculateRun(base([{ lengthMm: 100, startTempC: 500, endTempC: 400 }], { slip }), alloy));
    expect((e2 as EngineInputError).fields).toHaveProperty(['slip.inner.tempC']);
  });

  it('when the engine is called without the schema, then it still refuses bad geometry with paths', () => {
    const e = catchError(() => calculateRun(base([], { tube: { odMm: 50, wallMm: 30 } }), alloy));
    expect((e as EngineInputError).fields).toEqual({ 'tube.wallMm': 'Wall must be less than half the outside diameter', segments: 'Add at least one segment' });
  });
});

describe('partial data and input warnings', () => {
  const segs = [{ lengthMm: 800, startTempC: 800, endTempC: 600 }];
  const withJoints = { flex: { parts: [flexPart] }, slip: { inner: { tempC: 800 }, outer: { tempC: 750 }, coldClearanceMm: 0.3, coldEngagementMm: 90, coldAxialGapMm: 25 } };

  it('when the alloy has no modulus or yield table, then growth, joints, limits, mass and cost still come out and only the stress says "not in the data"', () => {
    const r = calculateRun(base(segs, withJoints), { ...alloy, modulus: [], yield: [] });
    expect(r.growthMm).toBeCloseTo((800 * (enStainlessElongationIntegral(800) - enStainlessElongationIntegral(600))) / 200, 3);
    expect(r.flex?.chosen).not.toBeNull();
    expect(r.slip).toBeDefined();
    expect(r.massKg).toBeGreaterThan(0);
    expect(r.restraint).toMatchObject({ missing: 'modulus', verdict: 'unknown', jointNeeded: null });
  });

  it('when part of the run is colder than its install, then a warning says it shrinks', () => {
    const r = calculateRun(base([{ lengthMm: 500, startTempC: 10, endTempC: 0 }], { installTempC: 20 }), alloy);
    expect(r.growthMm).toBeLessThan(0);
    expect(r.warnings.map((w) => w.code)).toContain('RUN_SHRINKS');
    const mixed = calculateRun(base([{ lengthMm: 500, startTempC: 400, endTempC: 0 }], { installTempC: 20 }), alloy);
    expect(mixed.warnings.map((w) => w.code)).toContain('COLDER_THAN_INSTALL');
  });

  it('when one segment ends at a temperature the next does not start at, then a warning names the step', () => {
    const r = calculateRun(base([{ lengthMm: 500, startTempC: 800, endTempC: 700 }, { lengthMm: 500, startTempC: 600, endTempC: 500 }]), alloy);
    const step = r.warnings.find((w) => w.code === 'TEMPERATURE_STEP');
    expect(wordPhrase(step?.message ?? '', 'metric')).toMatch(/step of 100 °C/);
    expect(calculateRun(base([{ lengthMm: 500, startTempC: 800, endTempC: 700 }, { lengthMm: 500, startTempC: 700, endTempC: 500 }]), alloy).warnings.map((w) => w.code)).not.toContain('TEMPERATURE_STEP');
  });

  it('when the shop’s coldest start is below what the alloy data covers, then the joint field says so', () => {
    const e = catchError(() => calculateRun(base(segs, { flex: { parts: [flexPart] } }), alloy, { design: { coldestAmbientC: -60 } }));
    expect((e as EngineInputError).fields).toHaveProperty(['flex']);
  });
});

describe('properties (fast-check)', () => {
  // 304 from EN Annex C: its strain rises monotonically, which the monotonicity properties assume.
  const curve = prepareStrainCurve(alloy);
  const temp = fc.double({ min: -50, max: TOP, noNaN: true });
  const seg = fc.record({ lengthMm: fc.double({ min: 1, max: 20_000, noNaN: true }), startTempC: temp, endTempC: temp });
  const segs = fc.array(seg, { minLength: 1, maxLength: 12 });

  function allFinite(x: unknown): boolean {
    if (typeof x === 'number') return Number.isFinite(x);
    if (Array.isArray(x)) return x.every(allFinite);
    if (x && typeof x === 'object') return Object.values(x).every(allFinite);
    return true;
  }

  it('when any valid run is calculated, then no number in the result is NaN or Infinity', () => {
    fc.assert(
      fc.property(segs, temp, fc.double({ min: 10, max: 300, noNaN: true }), fc.double({ min: 0.01, max: 0.49, noNaN: true }), (segments, t0, od, wallFrac) => {
        const input = base(segments, {
          installTempC: t0,
          tube: { odMm: od, wallMm: od * wallFrac },
          flex: { parts: [{ ...flexPart, boreMm: od }], lateralOffsetMm: 1, rotationDeg: 1 },
          slip: { inner: { tempC: segments[0].startTempC }, outer: { tempC: segments[0].endTempC }, coldClearanceMm: 0.2, coldEngagementMm: od, coldAxialGapMm: 20 },
        });
        return allFinite(calculateRun(input, alloy));
      }),
    );
  });

  it('when a uniform run gets hotter, then it grows more', () => {
    fc.assert(
      fc.property(temp, temp, fc.double({ min: 1, max: 20_000, noNaN: true }), (a, b, length) => {
        const [lo, hi] = a < b ? [a, b] : [b, a];
        const g = (t: number) => runGrowthMm(curve, [{ lengthMm: length, startTempC: t, endTempC: t }], 20);
        return g(hi) >= g(lo);
      }),
    );
  });

  it('when a hot run gets longer, then it grows more', () => {
    fc.assert(
      fc.property(segs, fc.double({ min: 1.001, max: 10, noNaN: true }), (segments, k) => {
        const hot = segments.map((s) => ({ ...s, startTempC: Math.max(s.startTempC, 21), endTempC: Math.max(s.endTempC, 21) }));
        const longer = hot.map((s) => ({ ...s, lengthMm: s.lengthMm * k }));
        return runGrowthMm(curve, longer, 20) > runGrowthMm(curve, hot, 20);
      }),
    );
  });

  it('when equal-length segments are reordered, then the total growth does not change', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(temp, temp), { minLength: 2, maxLength: 10 }), fc.double({ min: 1, max: 5000, noNaN: true }), (temps, length) => {
        const segments = temps.map(([a, b]) => ({ lengthMm: length, startTempC: a, endTempC: b }));
        const reversed = [...segments].reverse();
        const rotated = [...segments.slice(1), segments[0]];
        const g = runGrowthMm(curve, segments, 20);
        const tol = 1e-9 * Math.max(1, Math.abs(g));
        return Math.abs(runGrowthMm(curve, reversed, 20) - g) <= tol && Math.abs(runGrowthMm(curve, rotated, 20) - g) <= tol;
      }),
    );
  });
});
