import { TemperatureRangeError } from '../../shared/engine/errors';
import { prepareStrainCurve, strainAt, strainChange, strainIntegral, uniformGrowthMm } from '../../shared/engine/expansion';
import { fToC, inPer100FtToMmPerM } from '../../shared/units';
import {
  ASME_IID_2001_TE1_CARBON,
  B31_3_AUSTENITIC_18CR8NI,
  B31_3_CARBON,
  alloyWith,
  enCarbonElongation,
  enStainlessElongation,
  meanCteTable,
  range,
} from './published';

const relErr = (got: number, want: number) => Math.abs(got - want) / Math.abs(want);

/** Table rows from °F total-expansion data referenced to 70 °F, as a catalogue would store them. */
function b31Table(rows: [number, number, unknown][]) {
  const ref = fToC(70);
  return alloyWith({
    referenceTempC: ref,
    cte: rows.map(([f, inPer100Ft]) => ({
      tempC: fToC(f),
      meanUmPerMK: (inPer100FtToMmPerM(inPer100Ft) * 1e3) / (fToC(f) - ref),
    })),
  });
}

describe('EN 1993-1-2 §3.4.1.1 carbon steel', () => {
  // Table every 10 °C plus the points that bound the plateau, as a careful data entry would.
  const temps = [...range(30, 1200, 10), 749.99].sort((a, b) => a - b);
  const curve = prepareStrainCurve(alloyWith({ cte: meanCteTable(enCarbonElongation, temps) }));

  it('when the table is generated from the closed form, then strain off the table points reproduces it within 0.5 % over 20–1000 °C', () => {
    for (let t = 21; t <= 1000; t += 1.7) {
      expect(relErr(strainAt(curve, t), enCarbonElongation(t))).toBeLessThan(0.005);
    }
  });

  it('when at 600 °C, then Δl/l is 8.3984e-3 (reference-data §0 item 1, derived from eq. 3.1a)', () => {
    expect(strainAt(curve, 600)).toBeCloseTo(8.3984e-3, 7);
  });

  it('when at the reference temperature, then strain is exactly 0', () => {
    expect(strainAt(curve, 20)).toBe(0);
  });

  it('when between 750 and 860 °C, then strain stays on the 1.1e-2 plateau (eq. 3.1b)', () => {
    for (const t of [750, 775, 800, 833.3, 860]) expect(strainAt(curve, t)).toBeCloseTo(1.1e-2, 9);
  });

  it('when crossing 750 °C, then the standard’s own jump of about −8.4e-6 is reproduced, not smoothed', () => {
    const jump = strainAt(curve, 750) - strainAt(curve, 749.99);
    expect(jump).toBeCloseTo(enCarbonElongation(750) - enCarbonElongation(749.99), 12);
    expect(jump).toBeCloseTo(-8.4e-6, 6);
  });
});

describe('EN 1993-1-2 Annex C austenitic stainless', () => {
  const curve = prepareStrainCurve(alloyWith({ cte: meanCteTable(enStainlessElongation, range(30, 1200, 10)) }));

  it('when the table is generated from the closed form, then strain off the table points reproduces it within 0.5 % over 20–1000 °C', () => {
    for (let t = 21; t <= 1000; t += 1.3) {
      expect(relErr(strainAt(curve, t), enStainlessElongation(t))).toBeLessThan(0.005);
    }
  });

  it('when at 800 and 1000 °C, then Δl/l is 14.8484e-3 and 19.1561e-3 (reference-data §0 item 2)', () => {
    expect(strainAt(curve, 800)).toBeCloseTo(14.8484e-3, 6);
    expect(strainAt(curve, 1000)).toBeCloseTo(19.1561e-3, 6);
  });

  it('when 1 m is heated 20 → 950 °C, then it grows 18.069 mm (reference-data §5, derived from Annex C)', () => {
    expect(uniformGrowthMm(curve, 1000, 950, 20)).toBeCloseTo(18.069, 2);
  });

  it('when the integral of strain is taken over a range, then it matches the trapezoid sum of the same curve at 0.1 °C', () => {
    let sum = 0;
    for (let t = 100; t < 900; t += 0.1) sum += ((strainAt(curve, t) + strainAt(curve, t + 0.1)) / 2) * 0.1;
    expect(relErr(strainIntegral(curve, 100, 900), sum)).toBeLessThan(1e-6);
    expect(strainIntegral(curve, 900, 100)).toBeCloseTo(-strainIntegral(curve, 100, 900), 12);
  });
});

describe('ASME B31.3 Appendix C total expansion from 70 °F (non-20 °C reference)', () => {
  it('when 100 ft of 18Cr-8Ni is installed at 70 °F, then growth at each table row is the table value', () => {
    const alloy = b31Table(B31_3_AUSTENITIC_18CR8NI);
    const curve = prepareStrainCurve(alloy);
    for (const [f, inPer100Ft] of B31_3_AUSTENITIC_18CR8NI) {
      const mmPerM = uniformGrowthMm(curve, 1000, fToC(f), fToC(70));
      expect(mmPerM).toBeCloseTo(inPer100FtToMmPerM(inPer100Ft), 9);
    }
  });

  it('when only every other row is given, then interpolated strain matches the omitted rows within 2 %', () => {
    // 2 % is the spread reference-data §1.2 reports between reputable tables for the same steel.
    for (const rows of [B31_3_AUSTENITIC_18CR8NI, B31_3_CARBON]) {
      const interior = (i: number) => i % 2 === 1 && i < rows.length - 1;
      const kept = rows.filter((_, i) => !interior(i));
      const omitted = rows.filter((_, i) => interior(i));
      const curve = prepareStrainCurve(b31Table(kept));
      for (const [f, inPer100Ft] of omitted) {
        expect(relErr(uniformGrowthMm(curve, 1000, fToC(f), fToC(70)), inPer100FtToMmPerM(inPer100Ft))).toBeLessThan(0.02);
      }
    }
  });

  it('when 18Cr-8Ni at 800 °F is compared with EN Annex C (20 °C basis), then they agree within 2 % (7.333 vs 7.246 mm/m, reference-data §1.2)', () => {
    const asme = prepareStrainCurve(b31Table(B31_3_AUSTENITIC_18CR8NI));
    const t = fToC(800);
    expect(relErr(strainAt(asme, t) * 1000, enStainlessElongation(t) * 1000)).toBeLessThan(0.02);
    expect(strainAt(asme, t) * 1000).toBeCloseTo(7.333, 3);
  });

  it('when installed at 20 °C instead of the 70 °F reference, then growth follows (ε(T) − ε(T0)) / (1 + ε(T0)) (reference-data §5, changing-reference rule)', () => {
    const curve = prepareStrainCurve(b31Table(B31_3_CARBON));
    const t = fToC(800);
    const e0 = strainAt(curve, 20);
    expect(e0).toBeLessThan(0);
    const want = ((inPer100FtToMmPerM(6.7) / 1000 - e0) / (1 + e0)) * 1000;
    expect(uniformGrowthMm(curve, 1000, t, 20)).toBeCloseTo(want, 9);
    expect(uniformGrowthMm(curve, 1000, t, 20)).toBeGreaterThan(inPer100FtToMmPerM(6.7));
  });

  it('when the B (mean) column of ASME II-D 2001 TE-1 is the data, then the C column is reproduced within 0.05 in/100 ft', () => {
    const ref = fToC(70);
    const curve = prepareStrainCurve(
      alloyWith({
        referenceTempC: ref,
        cte: ASME_IID_2001_TE1_CARBON.map(([f, , bPerF]) => ({ tempC: fToC(f), meanUmPerMK: bPerF * 1.8 })),
      }),
    );
    for (const [f, , , c] of ASME_IID_2001_TE1_CARBON) {
      const inPer100Ft = (uniformGrowthMm(curve, 1000, fToC(f), ref) / inPer100FtToMmPerM(1));
      expect(Math.abs(inPer100Ft - c)).toBeLessThanOrEqual(0.05 + 1e-9);
    }
  });
});

describe('the edges of the data', () => {
  const curve = prepareStrainCurve(alloyWith({ cte: [{ tempC: 100, meanUmPerMK: 16.467 }, { tempC: 900, meanUmPerMK: 19.304 }] }));

  it('when below the first point, then the first mean coefficient applies down to −50 °C (issue 3 rule)', () => {
    expect(strainAt(curve, 60)).toBeCloseTo(16.467e-6 * (60 - 20), 14);
    expect(strainAt(curve, -50)).toBeCloseTo(16.467e-6 * (-50 - 20), 14);
  });

  it('when below −50 °C, then the engine refuses', () => {
    expect(() => strainAt(curve, -50.1)).toThrow(TemperatureRangeError);
  });

  it('when above the last point, then the engine refuses and names the top of the data', () => {
    expect(() => strainAt(curve, 900.01)).toThrow(/max 900 °C/);
    expect(() => strainChange(curve, 901, 20)).toThrow(TemperatureRangeError);
  });

  it('when the reference lies between two table points, then ε(T_ref) is still 0', () => {
    const c = prepareStrainCurve(alloyWith({ referenceTempC: 25, cte: [{ tempC: 0, meanUmPerMK: 12 }, { tempC: 100, meanUmPerMK: 13 }] }));
    expect(strainAt(c, 25)).toBe(0);
  });
});
