/**
 * Published laws and tables the tests check against, each with its source. Tables are built
 * from these as an alloy's data would be; the engine never sees the closed forms.
 */
import type { AlloyData } from '../../shared/engine/types';

/** EN 1993-1-2:2005 §3.4.1.1 eq. (3.1a–c): carbon steel thermal elongation Δl/l, 20 °C basis. */
export function enCarbonElongation(t: number): number {
  if (t < 750) return 1.2e-5 * t + 0.4e-8 * t * t - 2.416e-4;
  if (t <= 860) return 1.1e-2;
  return 2e-5 * t - 6.2e-3;
}

/** EN 1993-1-2:2005 Annex C (C.3.1): austenitic stainless Δl/l, 20 °C basis. */
export function enStainlessElongation(t: number): number {
  return (16 + 4.79e-3 * t - 1.243e-6 * t * t) * (t - 20) * 1e-6;
}

/** Antiderivative of enStainlessElongation, for a closed-form integral over a linear gradient. */
export function enStainlessElongationIntegral(t: number): number {
  // (16 + a t − b t²)(t − 20) = −b t³ + (a + 20 b) t² + (16 − 20 a) t − 320
  const a = 4.79e-3;
  const b = 1.243e-6;
  return ((-b * t ** 4) / 4 + ((a + 20 * b) * t ** 3) / 3 + ((16 - 20 * a) * t * t) / 2 - 320 * t) * 1e-6;
}

/** Mean-coefficient rows (20 °C reference) generated from an elongation law, as a data table would hold them. */
export function meanCteTable(elongation: (t: number) => number, temps: number[]): AlloyData['cte'] {
  return temps.map((t) => ({ tempC: t, meanUmPerMK: (elongation(t) / (t - 20)) * 1e6 }));
}

export function range(from: number, to: number, step: number): number[] {
  const out: number[] = [];
  for (let t = from; t <= to + 1e-9; t += step) out.push(Math.round(t * 1e6) / 1e6);
  return out;
}

/**
 * ASME B31.3 Appendix C, Table C-1 style total linear expansion from 70 °F, in/100 ft.
 * Rows to 800 °F: [SEEN] on a public reproduction of the table (reference-data §1.2).
 * Rows from 900 °F: FROM MEMORY (reference-data §1.2 [MEMORY]), cross-checked there against EN within 1 %.
 */
export const B31_3_AUSTENITIC_18CR8NI: [number, number, 'seen' | 'memory'][] = [
  [200, 1.46, 'seen'],
  [300, 2.61, 'seen'],
  [400, 3.8, 'seen'],
  [500, 5.01, 'seen'],
  [600, 6.24, 'seen'],
  [700, 7.5, 'seen'],
  [750, 8.15, 'seen'],
  [800, 8.8, 'seen'],
  [900, 10.12, 'memory'],
  [1000, 11.48, 'memory'],
  [1100, 12.84, 'memory'],
  [1200, 14.2, 'memory'],
  [1300, 15.56, 'memory'],
  [1400, 16.92, 'memory'],
  [1500, 18.3, 'memory'],
];

/** Same table, carbon steel column: to 800 °F [SEEN]; 900–1400 °F FROM MEMORY. */
export const B31_3_CARBON: [number, number, 'seen' | 'memory'][] = [
  [200, 0.99, 'seen'],
  [300, 1.82, 'seen'],
  [400, 2.7, 'seen'],
  [500, 3.62, 'seen'],
  [600, 4.6, 'seen'],
  [700, 5.63, 'seen'],
  [750, 6.16, 'seen'],
  [800, 6.7, 'seen'],
  [900, 7.81, 'memory'],
  [1000, 8.89, 'memory'],
  [1100, 10.04, 'memory'],
  [1200, 11.1, 'memory'],
  [1300, 12.22, 'memory'],
  [1400, 13.34, 'memory'],
];

/** ASME BPVC II-D (2001) Table TE-1, carbon & low-alloy steels Group 1: [°F, A instantaneous, B mean from 70 °F (1e-6/°F), C in/100 ft]. */
export const ASME_IID_2001_TE1_CARBON: [number, number, number, number][] = [
  [200, 6.9, 6.7, 1.0],
  [400, 7.7, 7.1, 2.8],
  [600, 8.4, 7.4, 4.7],
  [800, 8.9, 7.8, 6.8],
  [1000, 9.3, 8.1, 9.0],
  [1200, 9.6, 8.3, 11.3],
  [1300, 9.6, 8.4, 12.4],
];

/** Fills in the properties a test does not exercise; the numbers are placeholders, not data. */
export function alloyWith(partial: Partial<AlloyData> & Pick<AlloyData, 'cte'>): AlloyData {
  return {
    referenceTempC: 20,
    modulus: [{ tempC: 20, gpa: 200 }],
    yield: [{ tempC: 20, mpa: 200 }],
    densityKgM3: 8000,
    maxContinuousC: 2000,
    maxIntermittentC: 2000,
    pricePerKg: 0,
    ...partial,
  };
}

/** Constant mean coefficient over a wide range: the textbook case ε = α·(T − T_ref). */
export function constantAlphaAlloy(alphaPerK: number, extra: Partial<AlloyData> = {}): AlloyData {
  return alloyWith({
    cte: [
      { tempC: 100, meanUmPerMK: alphaPerK * 1e6 },
      { tempC: 1000, meanUmPerMK: alphaPerK * 1e6 },
    ],
    ...extra,
  });
}

/** EN 1993-1-2 Annex C, grade 1.4301: k_0.2p,θ at 100, 200, …, 1100 °C (reference-data §2.3, [SEEN] in OpenSees StainlessECThermal.cpp). */
export const EN_1_4301_K02P = [0.82, 0.68, 0.64, 0.6, 0.54, 0.49, 0.4, 0.27, 0.14, 0.06, 0.03];

/**
 * 304 / S30400 built from public sources: Annex C expansion (10 °C steps); E 193 GPa at room
 * temperature only and ρ 8000 (Callister Tables B.1/B.2); yield 205 MPa (ASTM A269/A249 tube
 * minimum) scaled by the Annex C reduction factors above; limits 925 °C continuous / 870 °C
 * intermittent (reference-data §3.1).
 */
export function stainless304(): AlloyData {
  return {
    referenceTempC: 20,
    cte: meanCteTable(enStainlessElongation, range(30, 1200, 10)),
    modulus: [{ tempC: 20, gpa: 193 }],
    yield: [{ tempC: 20, mpa: 205 }, ...EN_1_4301_K02P.map((k, i) => ({ tempC: 100 * (i + 1), mpa: 205 * k }))],
    densityKgM3: 8000,
    maxContinuousC: 925,
    maxIntermittentC: 870,
    pricePerKg: 0,
    warningRanges: [
      // SSINA: carbide precipitation in the 300 series at 800–1600 °F (427–871 °C).
      { fromC: 427, toC: 871, code: 'CARBIDE_PRECIPITATION', message: 'Carbide precipitation range of unstabilised austenitic grades' },
    ],
  };
}
