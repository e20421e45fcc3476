import { prepareStrainCurve } from '../../shared/engine/expansion';
import { CLEAR_STRESS_NOTE, CLEAR_STRESS_RATIO, prepareStrengthTables, restraint } from '../../shared/engine/restraint';
import type { AlloyData, Segment } from '../../shared/engine/types';
import { stressFigure } from '../../shared/jobs/stress-figure';
import { alloyWith, constantAlphaAlloy, enCarbonElongation, meanCteTable, range, stainless304 } from './published';

const uniform = (t: number): Segment[] => [{ lengthMm: 1000, startTempC: t, endTempC: t }];

function run(alloy: AlloyData, segments: Segment[], installTempC: number) {
  return restraint(prepareStrainCurve(alloy), prepareStrengthTables(alloy), segments, installTempC);
}

describe('clamped bar, σ = E·α·ΔT (textbook worked examples, reference-data §5)', () => {
  it.each([
    // [source, α /K, E GPa, T0, T, published σ MPa]
    ['example 2: steel rod 20 → 120 °C, α 1.2e-5, Y 2e11 Pa', 1.2e-5, 200, 20, 120, 240],
    ['example 3: steel bar 10 → 30 °C, α 13e-6, E 200 GPa', 13e-6, 200, 10, 30, 52],
    ['example 4: rod between rigid walls 27 → 57 °C, α 11.25e-6, E 200 GPa', 11.25e-6, 200, 27, 57, 67.5],
  ])('when %s, then the restrained stress is the published value', (_src, alpha, gpa, t0, t, want) => {
    const alloy = constantAlphaAlloy(alpha, { modulus: [{ tempC: 0, gpa }], yield: [{ tempC: 0, mpa: 1e6 }] });
    expect(run(alloy, uniform(t), t0).peakStressMPa).toBeCloseTo(want, 8);
  });
});

describe('temperature-dependent data', () => {
  it('when 304 is fully restrained 20 → 100 °C, then σ = 193 000 × 1.317e-3 ≈ 254 MPa (reference-data §5, derived) and exceeds yield there', () => {
    const r = run(stainless304(), uniform(100), 20);
    expect(r.peakStressMPa).toBeCloseTo(254.2, 0);
    // 205 MPa × k_0.2p,100 °C = 0.82 (EN 1993-1-2 Annex C, 1.4301)
    expect(r.governing?.yieldMPa).toBeCloseTo(205 * 0.82, 10);
    expect(r.governing?.ratio).toBeCloseTo(254.2 / (205 * 0.82), 2);
    expect(r.verdict).toBe('yields');
    expect(r.jointNeeded).toBe(true);
  });

  it('when carbon steel with E = 210 GPa is fully restrained 20 → 100 °C on EN strain, then σ = 209.7 MPa (reference-data §5, derived)', () => {
    const alloy = alloyWith({ cte: meanCteTable(enCarbonElongation, range(30, 700, 10)), modulus: [{ tempC: 20, gpa: 210 }] });
    expect(run(alloy, uniform(100), 20).peakStressMPa).toBeCloseTo(209.7, 1);
  });

  it('when the modulus falls with temperature (ASME II-D TM-1 carbon steel, 151 GPa at 500 °C), then the stress at 500 °C uses E at 500 °C', () => {
    // TM-1 values [SEEN] via reference-data §2.2; strain from EN 1993-1-2 §3.4.1.1.
    const tm1: [number, number][] = [[25, 202], [100, 198], [150, 195], [200, 192], [250, 189], [300, 185], [350, 179], [400, 171], [450, 162], [500, 151], [550, 137]];
    const alloy = alloyWith({
      cte: meanCteTable(enCarbonElongation, range(30, 700, 10)),
      modulus: tm1.map(([tempC, gpa]) => ({ tempC, gpa })),
      yield: [{ tempC: 20, mpa: 1e6 }, { tempC: 700, mpa: 1e6 }],
    });
    const r = run(alloy, uniform(500), 20);
    expect(r.peakStressMPa).toBeCloseTo(151_000 * enCarbonElongation(500), 1);
    expect(r.peakTempC).toBe(500);
  });

  it('when the stress is small against yield, then no joint is needed', () => {
    // Example 3's 52 MPa against the 304 yield table of the fixture (ASTM minimum × EN Annex C factors).
    const alloy = constantAlphaAlloy(13e-6, { modulus: [{ tempC: 0, gpa: 200 }], yield: stainless304().yield });
    const r = run(alloy, uniform(30), 10);
    expect(r.governing?.yieldMPa).toBeGreaterThan(200);
    expect(r.governing?.ratio).toBeCloseTo(52 / (r.governing?.yieldMPa as number), 10);
    expect(r.verdict).toBe('clear');
    expect(r.jointNeeded).toBe(false);
  });

  it('when the peak stress and the weakest point differ, then the verdict follows the worst local ratio', () => {
    // Synthetic tables (not data): modulus falling faster than strain rises moves the stress peak inside the run.
    const alloy = constantAlphaAlloy(12e-6, {
      modulus: [{ tempC: 20, gpa: 200 }, { tempC: 600, gpa: 20 }],
      yield: [{ tempC: 20, mpa: 500 }, { tempC: 600, mpa: 50 }],
    });
    const r = run(alloy, [{ lengthMm: 1000, startTempC: 600, endTempC: 20 }], 20);
    expect(r.governing?.tempC).toBe(600);
    expect(stressFigure(r)).toMatchObject({ tempC: 600, ratio: r.governing?.ratio, yieldDataEndC: null });
    expect(r.peakTempC).toBeLessThan(600);
    expect(r.governing?.stressMPa as number).toBeLessThan(r.peakStressMPa as number);
    expect(r.jointNeeded).toBe(true);
  });
});

describe('tables that stop short of the run', () => {
  it('when the modulus table stops below the peak, then its last value is held and a warning says the stress is overstated', () => {
    const r = run(stainless304(), uniform(800), 20);
    // 800 °C: Δl/l = 14.8484e-3 (EN Annex C, reference-data §0 item 2)
    expect(r.warnings.map((w) => w.code)).toContain('MODULUS_DATA_RANGE');
    expect(r.peakStressMPa).toBeCloseTo(193_000 * 14.8484e-3, 0);
  });

  it('when the yield table stops below the whole run, then no ratio is claimed and the verdict rests on the last tabulated yield', () => {
    const r = run({ ...stainless304(), yield: stainless304().yield.filter((y) => y.tempC <= 500) }, uniform(800), 20);
    expect(r.governing).toBeNull();
    // Against the last tabulated yield, 205 MPa × k_0.2p,500 °C = 0.54 (EN 1993-1-2 Annex C): a lower bound on the ratio.
    expect(r.beyondYieldData).toMatchObject({ tempC: 800, yieldTempC: 500 });
    expect(r.beyondYieldData?.yieldMPa).toBeCloseTo(205 * 0.54, 10);
    expect(r.beyondYieldData?.ratio).toBeCloseTo((193_000 * 14.8484e-3) / (205 * 0.54), 1);
    expect(stressFigure(r)).toMatchObject({ tempC: 800, yieldDataEndC: 500 });
    expect(r.warnings.map((w) => w.code)).toContain('YIELD_DATA_RANGE');
    expect(r.verdict).toBe('yields');
    expect(r.jointNeeded).toBe(true);
  });

  it('when beyond the yield data the stress stays under the last tabulated yield, then the verdict is unknown (null)', () => {
    // Synthetic: a coefficient of 1e-6/K keeps the stress low.
    const alloy = constantAlphaAlloy(1e-6, { modulus: [{ tempC: 20, gpa: 200 }], yield: [{ tempC: 20, mpa: 205 }] });
    const r = run(alloy, uniform(300), 20);
    expect(r.peakStressMPa).toBeLessThan(205 * CLEAR_STRESS_RATIO);
    expect(r.verdict).toBe('unknown');
    expect(r.jointNeeded).toBeNull();
  });
});

describe('the verdict keeps a stated margin on yield', () => {
  // Example 4 (reference-data §5): rod between rigid walls 27 → 57 °C, α 11.25e-6, E 200 GPa → 67.5 MPa.
  const example4 = (yieldMPa: number) =>
    run(constantAlphaAlloy(11.25e-6, { modulus: [{ tempC: 0, gpa: 200 }], yield: [{ tempC: 0, mpa: yieldMPa }, { tempC: 100, mpa: yieldMPa }] }), uniform(57), 27);

  it('when the stress is 75 % of yield, then it is marginal and a joint is needed, not "below yield"', () => {
    const r = example4(90);
    expect(r.governing?.ratio).toBeCloseTo(67.5 / 90, 8);
    expect(r.verdict).toBe('marginal');
    expect(r.jointNeeded).toBe(true);
  });

  it('when the stress is 99 % of yield, then it is still not clear', () => {
    expect(example4(67.5 / 0.99).verdict).toBe('marginal');
    expect(example4(67.4).verdict).toBe('yields');
  });

  it('when the stress is under two thirds of yield, then it is clear, and the margin is labelled common practice', () => {
    const r = example4(110);
    expect(r.verdict).toBe('clear');
    expect(r.clearRatio).toBeCloseTo(2 / 3, 12);
    expect(CLEAR_STRESS_NOTE).toMatch(/common practice, no published source/);
  });
});

describe('partial data', () => {
  it('when the alloy has no modulus table, then the stress is not in the data and the verdict is unknown', () => {
    const r = run({ ...stainless304(), modulus: [] }, uniform(600), 20);
    expect(r).toMatchObject({ missing: 'modulus', peakStressMPa: null, governing: null, verdict: 'unknown', jointNeeded: null });
  });

  it('when the alloy has a modulus but no yield table, then the stress is given and the ratio is not', () => {
    const r = run({ ...stainless304(), yield: [] }, uniform(100), 20);
    expect(r.missing).toBe('yield');
    expect(r.peakStressMPa).toBeCloseTo(254.2, 0);
    expect(r.governing).toBeNull();
    expect(r.verdict).toBe('unknown');
  });

  it('when the alloy names where its tables come from, then the result carries the basis', () => {
    const alloy = { ...stainless304(), modulusBasis: 'ASME BPVC II-D Table TM-1', yieldBasis: 'ASME BPVC II-D Table Y-1' };
    const r = restraint(prepareStrainCurve(alloy), prepareStrengthTables(alloy), uniform(100), 20, alloy);
    expect(r.modulusBasis).toBe('ASME BPVC II-D Table TM-1');
    expect(r.yieldBasis).toBe('ASME BPVC II-D Table Y-1');
  });
});
