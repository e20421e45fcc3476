import { prepareStrainCurve, strainAt } from '../../shared/engine/expansion';
import { growthPerMetreCurve, MIN_CURVE_POINTS, runGrowthCurve, runGrowthMm, segmentGrowthMm, tempAtMm } from '../../shared/engine/run-growth';
import type { Segment } from '../../shared/engine/types';
import { fToC, inPer100FtToMmPerM } from '../../shared/units';
import {
  B31_3_AUSTENITIC_18CR8NI,
  alloyWith,
  constantAlphaAlloy,
  enStainlessElongation,
  enStainlessElongationIntegral,
  stainless304,
} from './published';

const relErr = (got: number, want: number) => Math.abs(got - want) / Math.abs(want);

describe('uniform temperature, constant coefficient (closed form ΔL = α·L·ΔT)', () => {
  it('when a 1.000 m steel rod goes 20 → 120 °C with α = 1.2e-5, then it grows 1.2 mm (reference-data §5 example 2: L′ = 1.0012 m)', () => {
    const c = prepareStrainCurve(constantAlphaAlloy(1.2e-5));
    expect(runGrowthMm(c, [{ lengthMm: 1000, startTempC: 120, endTempC: 120 }], 20)).toBeCloseTo(1.2, 10);
  });

  it('when a 200 m bridge bed installed at 20 °C sees −30 and +40 °C with α = 12e-6, then it moves −0.120 and +0.048 m (reference-data §5 example 6)', () => {
    const c = prepareStrainCurve(constantAlphaAlloy(12e-6));
    expect(runGrowthMm(c, [{ lengthMm: 200_000, startTempC: -30, endTempC: -30 }], 20)).toBeCloseTo(-120, 8);
    expect(runGrowthMm(c, [{ lengthMm: 200_000, startTempC: 40, endTempC: 40 }], 20)).toBeCloseTo(48, 8);
  });

  it.each([
    // [name, α 1e-6/K, length mm, T0, T, expected mm] — reference-data §5 exhaust-scale values, derived from the [SEEN] coefficients there
    ['321, α̅ 18.9 to 600 °C (supplier data, §1.4)', 18.9, 1000, 20, 600, 10.962],
    ['409 (1.4512), α̅ 12.0 to 500 °C (stockholder data, §1.4)', 12.0, 1000, 20, 500, 5.76],
    ['Alloy 718, α̅ 16.0 from 25 to 760 °C (producer data, §1.4)', 16.0, 500, 25, 760, 5.88],
    ['Alloy X, α̅ 16.6 from 26 to 982 °C (producer data, §1.4)', 16.6, 500, 26, 982, 7.935],
  ])('when %s, then the growth matches reference-data §5', (_name, alpha, length, ref, t, want) => {
    const c = prepareStrainCurve(alloyWith({ referenceTempC: ref, cte: [{ tempC: t, meanUmPerMK: alpha }] }));
    expect(runGrowthMm(c, [{ lengthMm: length, startTempC: t, endTempC: t }], ref)).toBeCloseTo(want, 3);
  });
});

describe('linear gradient', () => {
  it('when the coefficient is constant, then growth is α·L·((Ta + Tb)/2 − T0) (closed form)', () => {
    const alpha = 17e-6;
    const c = prepareStrainCurve(constantAlphaAlloy(alpha));
    const seg = { lengthMm: 750, startTempC: 880, endTempC: 310 };
    const e0 = strainAt(c, 20);
    const want = (alpha * 750 * ((880 + 310) / 2 - 20)) / (1 + e0);
    expect(relErr(segmentGrowthMm(c, seg, 20), want)).toBeLessThan(1e-12);
  });

  it('when the data are EN Annex C, then growth over 880 → 310 °C matches the closed-form integral of Δl/l within 0.01 %', () => {
    const c = prepareStrainCurve(stainless304());
    const [ta, tb, length] = [880, 310, 750];
    const want = (length * (enStainlessElongationIntegral(tb) - enStainlessElongationIntegral(ta))) / (tb - ta);
    expect(relErr(segmentGrowthMm(c, { lengthMm: length, startTempC: ta, endTempC: tb }, 20), want)).toBeLessThan(1e-4);
  });

  it('when the same gradient is cut into many short segments, then the total does not change', () => {
    const c = prepareStrainCurve(stainless304());
    const whole = runGrowthMm(c, [{ lengthMm: 1000, startTempC: 900, endTempC: 100 }], 20);
    const pieces: Segment[] = Array.from({ length: 37 }, (_, i) => ({
      lengthMm: 1000 / 37,
      startTempC: 900 - (800 * i) / 37,
      endTempC: 900 - (800 * (i + 1)) / 37,
    }));
    expect(relErr(runGrowthMm(c, pieces, 20), whole)).toBeLessThan(1e-12);
  });
});

describe('the growth curve along the run', () => {
  const c = prepareStrainCurve(stainless304());
  const segments: Segment[] = [
    { lengthMm: 600, startTempC: 880, endTempC: 790 },
    { lengthMm: 333, startTempC: 700, endTempC: 520 },
    { lengthMm: 17, startTempC: 520, endTempC: 500 },
  ];
  const { growthMm, curve } = runGrowthCurve(c, segments, 20);

  it('when computed, then it has at least 50 points and ends exactly at the total length and total growth', () => {
    expect(curve.length).toBeGreaterThanOrEqual(MIN_CURVE_POINTS);
    expect(curve[0]).toEqual({ atMm: 0, tempC: 880, growthMm: 0 });
    expect(curve[curve.length - 1].atMm).toBe(950);
    expect(curve[curve.length - 1].growthMm).toBe(growthMm);
  });

  it('when computed, then positions never go backwards and the total equals the sum of the segments', () => {
    for (let i = 1; i < curve.length; i++) expect(curve[i].atMm).toBeGreaterThanOrEqual(curve[i - 1].atMm);
    const sum = segments.reduce((s, g) => s + segmentGrowthMm(c, g, 20), 0);
    expect(growthMm).toBeCloseTo(sum, 10);
  });

  it('when a segment ends, then the curve holds its cumulative growth there and shows the temperature step to the next', () => {
    const atJoint = curve.filter((p) => p.atMm === 600);
    expect(atJoint.map((p) => p.tempC)).toEqual([790, 700]);
    expect(atJoint[0].growthMm).toBeCloseTo(segmentGrowthMm(c, segments[0], 20), 10);
    expect(tempAtMm(segments, 300)).toBeCloseTo(835, 10);
  });
});

describe('growth per metre against temperature', () => {
  it('when the data are the B31.3 18Cr-8Ni table installed at 70 °F, then it runs to the top of the data and passes through 8.80 in/100 ft at 800 °F', () => {
    const ref = fToC(70);
    const alloy = alloyWith({
      referenceTempC: ref,
      cte: B31_3_AUSTENITIC_18CR8NI.map(([f, v]) => ({ tempC: fToC(f), meanUmPerMK: (inPer100FtToMmPerM(v) * 1e3) / (fToC(f) - ref) })),
    });
    const curve = growthPerMetreCurve(prepareStrainCurve(alloy), ref);
    expect(curve.length).toBeGreaterThanOrEqual(50);
    expect(curve[0]).toEqual({ tempC: ref, growthMmPerM: 0 });
    expect(curve[curve.length - 1].tempC).toBeCloseTo(fToC(1500), 9);
    const at800 = curve.find((p) => Math.abs(p.tempC - fToC(800)) < 1e-9);
    // ASME B31.3 App. C, 18Cr-8Ni, 800 °F: 8.80 in/100 ft [SEEN, reference-data §1.2]
    expect(at800?.growthMmPerM).toBeCloseTo(inPer100FtToMmPerM(8.8), 9);
  });

  it('when the data are EN Annex C, then every point matches Δl/l within 0.5 %', () => {
    const curve = growthPerMetreCurve(prepareStrainCurve(stainless304()), 20);
    for (const p of curve.slice(1)) expect(relErr(p.growthMmPerM, enStainlessElongation(p.tempC) * 1000)).toBeLessThan(0.005);
  });
});
