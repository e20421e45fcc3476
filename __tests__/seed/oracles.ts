/**
 * Published values the seed tests check the catalogue against: standards' formulas and tables,
 * and a textbook. Each names its source; reference-data.md (shared notes) says where each was read.
 * Producer and supplier sheets are not held here as oracles: the seed is only checked to transcribe them.
 */

export const KSI_MPA = 6.894757; // 1 ksi = 6.894757 MPa
export const LB_IN3_KG_M3 = 27679.9; // 1 lb/in³ = 27 679.9 kg/m³
export const PER_F_TO_PER_K = 1.8; // 1e-6/°F = 1.8e-6/K (exact)
export const IN_PER_100FT = 1 / 1200; // 1 in/100 ft = 1/1200 (exact)
export const fToC = (f: number) => Math.round(((f - 32) / 1.8) * 10) / 10;

/** EN 1993-1-2:2005 Annex C, C.3.1: thermal elongation of austenitic stainless steel, 20 ≤ θ ≤ 1200 °C. */
export const enAnnexC = (t: number) => (16 + 4.79e-3 * t - 1.243e-6 * t * t) * (t - 20) * 1e-6;
/** EN 1993-1-2:2005 §3.4.1.1, eq. (3.1a–c): thermal elongation of carbon steel. */
export const enCarbon = (t: number) => {
  if (t < 750) return 1.2e-5 * t + 0.4e-8 * t * t - 2.416e-4;
  if (t <= 860) return 1.1e-2;
  return 2e-5 * t - 6.2e-3;
};

const F = [100, 150, 200, 250, 300, 350, 400, 450, 500, 550, 600, 650, 700, 750, 800];
const column = (values: number[]): [number, number][] => values.map((v, i) => [F[i], v]);
/**
 * ASME B31.3 Appendix C style table, total linear expansion from 70 °F in in/100 ft, every 50 °F,
 * as read in a public reproduction (reference-data §1.2 and the same page's other columns).
 */
export const B31_3 = {
  carbon: column([0.23, 0.61, 0.99, 1.40, 1.82, 2.26, 2.70, 3.16, 3.62, 4.11, 4.60, 5.11, 5.63, 6.16, 6.70]),
  aus18_8: column([0.34, 0.90, 1.46, 2.03, 2.61, 3.20, 3.80, 4.41, 5.01, 5.62, 6.24, 6.87, 7.50, 8.15, 8.80]),
  aus25_20: column([0.32, 0.84, 1.37, 1.91, 2.45, 2.99, 3.53, 4.07, 4.61, 5.15, 5.69, 6.23, 6.77, 7.31, 7.85]),
  alloy800: column([0.28, 0.76, 1.23, 1.76, 2.30, 2.88, 3.48, 4.04, 4.59, 5.16, 5.72, 6.30, 6.88, 7.47]),
  alloy600_625: column([0.26, 0.70, 1.15, 1.61, 2.09, 2.56, 3.05, 3.53, 4.02, 4.52, 5.02, 5.53, 6.05, 6.57]),
};
/**
 * EN 10095:1999, heat-resisting steels: mean coefficient of linear expansion from 20 °C, 1e-6/K, at the
 * standard's own points (every 200 °C), as read in a public reproduction (a tube supplier's grade page).
 */
export const EN_10095_CTE: Record<string, Record<number, number>> = {
  '1.4876': { 200: 15.0, 400: 16.0, 600: 17.0, 800: 17.5, 1000: 18.5 }, // X10NiCrAlTi32-21, the Alloy 800 composition
};
/**
 * A mean coefficient from 20 °C (EN data, first point at 200 °C) moved to another reference temperature:
 * α′ = (α·(T − 20) − α₂₀₀·(ref − 20))/(T − ref), rounded to 0.001 as the seed records it.
 */
export const enMeanOnBasis = (table: Record<number, number>, t: number, ref: number) =>
  Math.round(((table[t] * (t - 20) - table[200] * (ref - 20)) / (t - ref)) * 1000) / 1000;
/** Strain from 70 °F at a B31.3 row, dimensionless. */
export const b31Strain = (inPer100ft: number) => inPer100ft * IN_PER_100FT;

/** ASME II-D (2001) Table TE-1, carbon and low-alloy steels (Group 1), column B: mean from 70 °F, 1e-6/°F (reference-data §1.3). */
export const TE1_2001_GROUP1_B: [number, number][] = [[200, 6.7], [300, 6.9], [400, 7.1], [500, 7.3], [600, 7.4], [700, 7.6], [800, 7.8], [900, 7.9], [1000, 8.1], [1100, 8.2], [1200, 8.3]];

/** ASME II-D Table TM-1, carbon steels C ≤ 0.30 %, E in GPa (metric, public transcription). */
export const ASME_TM1_CARBON: Record<number, number> = { 25: 202, 100: 198, 150: 195, 200: 192, 250: 189, 300: 185, 350: 179, 400: 171, 450: 162, 500: 151, 550: 137 };
/** ASME II-D Table TM-1, austenitic stainless, E in GPa (metric, public transcription). */
export const ASME_TM1_AUSTENITIC: Record<number, number> = { 25: 195, 100: 189, 150: 186, 200: 183, 250: 179, 300: 176, 350: 172, 400: 169, 450: 165, 500: 160, 550: 156, 600: 151, 650: 146, 700: 140 };

/** EN 1993-1-2:2005 Annex E, Table E.1: k_p0.2,θ for carbon steel (0.2 % proof), 100…1000 °C. */
export const EN_E1_KP02: Record<number, number> = { 100: 1, 200: 0.89, 300: 0.78, 400: 0.65, 500: 0.53, 600: 0.3, 700: 0.13, 800: 0.07, 900: 0.05, 1000: 0.03 };
/** EN 1993-1-2:2005 Table 3.1: k_y,θ (effective yield at 2 % strain), the factor the 0.2 % proof table must not be. */
export const EN_T31_KY: Record<number, number> = { 100: 1, 200: 1, 300: 1, 400: 1, 500: 0.78, 600: 0.47, 700: 0.23, 800: 0.11, 900: 0.06, 1000: 0.04 };

/** Callister, Materials Science and Engineering, Table B.6: commercially pure titanium, 8.6e-6/K near room temperature. */
export const CALLISTER_CP_TI_CTE = 8.6;
