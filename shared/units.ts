import convert from 'convert-units';

/** Conversions at the edges of the app; the engine and the API stay SI (mm, °C, kg, MPa). */

export type UnitSystem = 'metric' | 'imperial';

/*
 * Exact factors from NIST SP 811 Appendix B: 1 in = 25.4 mm, 1 lb = 0.45359237 kg (both exact
 * by definition), 1 psi = 6894.757 Pa. convert-units bridges metric and imperial through rounded
 * anchors (3.28084 ft/m, 453.592 g/lb: 2 in → 50.79999837 mm), which would store 50.79999837 for
 * a typed 2 in; it keeps only the steps inside one system (ft ↔ in).
 */
const MM_PER_IN = 25.4;
const KG_PER_LB = 0.45359237;
/** 1 lbf = 4.4482216152605 N (NIST SP 811 App. B, exact through the pound and standard gravity). */
const N_PER_LBF = 4.4482216152605;
/** 1 ksi = 1000 lbf/in² = 6.894757293… MPa (N/mm²); SP 811 prints the psi rounded as 6894.757 Pa. */
const MPA_PER_KSI = (1000 * N_PER_LBF) / (MM_PER_IN * MM_PER_IN);
/** 1 lb/in³ in kg/m³: 0.45359237 kg over (0.0254 m)³ = 27 679.90471… kg/m³. */
const KG_M3_PER_LB_IN3 = KG_PER_LB / (MM_PER_IN / 1000) ** 3;

export const mmToIn = (mm: number): number => mm / MM_PER_IN;
export const inToMm = (inch: number): number => inch * MM_PER_IN;
// °F = °C × 9/5 + 32 (NIST SP 811 §4.2.1.1), written out so a typed 932 °F is stored as 500 °C exactly.
export const cToF = (c: number): number => (c * 9) / 5 + 32;
export const fToC = (f: number): number => ((f - 32) * 5) / 9;
export const kgToLb = (kg: number): number => kg / KG_PER_LB;
export const lbToKg = (lb: number): number => lb * KG_PER_LB;
export const mpaToKsi = (mpa: number): number => mpa / MPA_PER_KSI;
export const ksiToMpa = (ksi: number): number => ksi * MPA_PER_KSI;
/** Elastic modulus: GPa ↔ Msi (10⁶ psi), the unit of ASME's US-customary modulus tables. */
export const gpaToMsi = (gpa: number): number => gpa / MPA_PER_KSI;
export const msiToGpa = (msi: number): number => msi * MPA_PER_KSI;
export const kgM3ToLbIn3 = (kgM3: number): number => kgM3 / KG_M3_PER_LB_IN3;
export const lbIn3ToKgM3 = (lbIn3: number): number => lbIn3 * KG_M3_PER_LB_IN3;
/** A price per kg ↔ per lb: a pound costs 0.45359237 of a kilogram's price. */
export const perKgToPerLb = (perKg: number): number => perKg * KG_PER_LB;
export const perLbToPerKg = (perLb: number): number => perLb / KG_PER_LB;

/**
 * Temperature differences scale by 9/5 with no offset: a rise of 100 °C is a rise of 180 °F.
 * convert-units only knows temperature levels, and routing a difference through them adds
 * the 32 °F offset, which is the classic bug.
 */
export const deltaCToF = (dc: number): number => (dc * 9) / 5;
export const deltaFToC = (df: number): number => (df * 5) / 9;

/** Mean expansion coefficient: µm/(m·K) ↔ µin/(in·°F). */
export const cteMetricToImperial = (perK: number): number => (perK * 5) / 9;
export const cteImperialToMetric = (perF: number): number => (perF * 9) / 5;

/** Growth per length: mm per metre ↔ inches per 100 ft (the unit of ASME B31.3 Appendix C). */
const IN_PER_100FT_IN_MM_PER_M = inToMm(1) / (inToMm(convert(100).from('ft').to('in')) / 1000);
export const mmPerMToInPer100Ft = (mmPerM: number): number => mmPerM / IN_PER_100FT_IN_MM_PER_M;
export const inPer100FtToMmPerM = (inPer100Ft: number): number => inPer100Ft * IN_PER_100FT_IN_MM_PER_M;

/** Birmingham Wire Gauge tube walls in inches, as the tube trade sells them. Sheet gauges differ. */
export const BWG_WALL_IN: Readonly<Record<number, number>> = {
  20: 0.035,
  18: 0.049,
  16: 0.065,
  14: 0.083,
  13: 0.095,
  12: 0.109,
  11: 0.12,
  10: 0.134,
};

export const TUBE_GAUGES: readonly number[] = Object.keys(BWG_WALL_IN)
  .map(Number)
  .sort((a, b) => b - a);

/** Wall in mm for a BWG gauge; null for a gauge not in the table. */
export function gaugeToWallMm(gauge: number): number | null {
  const inch = BWG_WALL_IN[gauge];
  return inch === undefined ? null : inToMm(inch);
}

/** Nearest BWG gauge to a wall, or null when no gauge lies within toleranceMm (default 0.02 mm, finer than any gauge step). */
export function wallMmToGauge(wallMm: number, toleranceMm = 0.02): number | null {
  let best: number | null = null;
  let bestDiff = Infinity;
  for (const g of TUBE_GAUGES) {
    const diff = Math.abs(inToMm(BWG_WALL_IN[g]) - wallMm);
    if (diff < bestDiff) {
      bestDiff = diff;
      best = g;
    }
  }
  return bestDiff <= toleranceMm ? best : null;
}

export type QuantityKind =
  | 'length' // tube lengths, diameters
  | 'smallLength' // growth, walls, movements
  | 'fit' // radial clearances and tolerances of a slip fit
  | 'temperature'
  | 'temperatureDelta'
  | 'mass'
  | 'stress'
  | 'growthPerLength'
  // catalogue data (the alloy form, review and reading screens)
  | 'density' // kg/m³
  | 'modulus' // GPa
  | 'cte' // mean coefficient, µm/(m·K)
  | 'pricePerMass'; // a price per kg, in the alloy's currency

interface Display {
  unit: string;
  decimals: number;
  fromSi: (v: number) => number;
  toSi: (v: number) => number;
}

const same = (v: number) => v;

const DISPLAY: Record<QuantityKind, Record<UnitSystem, Display>> = {
  length: {
    metric: { unit: 'mm', decimals: 1, fromSi: same, toSi: same },
    imperial: { unit: 'in', decimals: 2, fromSi: mmToIn, toSi: inToMm },
  },
  smallLength: {
    metric: { unit: 'mm', decimals: 2, fromSi: same, toSi: same },
    imperial: { unit: 'in', decimals: 3, fromSi: mmToIn, toSi: inToMm },
  },
  fit: {
    metric: { unit: 'mm', decimals: 3, fromSi: same, toSi: same },
    imperial: { unit: 'in', decimals: 4, fromSi: mmToIn, toSi: inToMm },
  },
  temperature: {
    metric: { unit: '°C', decimals: 0, fromSi: same, toSi: same },
    imperial: { unit: '°F', decimals: 0, fromSi: cToF, toSi: fToC },
  },
  temperatureDelta: {
    metric: { unit: '°C', decimals: 0, fromSi: same, toSi: same },
    imperial: { unit: '°F', decimals: 0, fromSi: deltaCToF, toSi: deltaFToC },
  },
  mass: {
    metric: { unit: 'kg', decimals: 2, fromSi: same, toSi: same },
    imperial: { unit: 'lb', decimals: 2, fromSi: kgToLb, toSi: lbToKg },
  },
  stress: {
    metric: { unit: 'MPa', decimals: 0, fromSi: same, toSi: same },
    imperial: { unit: 'ksi', decimals: 1, fromSi: mpaToKsi, toSi: ksiToMpa },
  },
  growthPerLength: {
    metric: { unit: 'mm/m', decimals: 2, fromSi: same, toSi: same },
    imperial: { unit: 'in/100 ft', decimals: 2, fromSi: mmPerMToInPer100Ft, toSi: inPer100FtToMmPerM },
  },
  density: {
    metric: { unit: 'kg/m³', decimals: 0, fromSi: same, toSi: same },
    imperial: { unit: 'lb/in³', decimals: 3, fromSi: kgM3ToLbIn3, toSi: lbIn3ToKgM3 },
  },
  modulus: {
    metric: { unit: 'GPa', decimals: 0, fromSi: same, toSi: same },
    imperial: { unit: 'Msi', decimals: 1, fromSi: gpaToMsi, toSi: msiToGpa },
  },
  cte: {
    metric: { unit: 'µm/m·K', decimals: 2, fromSi: same, toSi: same },
    imperial: { unit: 'µin/in·°F', decimals: 2, fromSi: cteMetricToImperial, toSi: cteImperialToMetric },
  },
  pricePerMass: {
    metric: { unit: 'per kg', decimals: 2, fromSi: same, toSi: same },
    imperial: { unit: 'per lb', decimals: 2, fromSi: perKgToPerLb, toSi: perLbToPerKg },
  },
};

export function unitLabel(kind: QuantityKind, system: UnitSystem): string {
  return DISPLAY[kind][system].unit;
}

/** SI value → the number shown in the chosen system. */
export function toDisplay(kind: QuantityKind, siValue: number, system: UnitSystem): number {
  return DISPLAY[kind][system].fromSi(siValue);
}

/** A number typed in the chosen system → SI. */
export function fromDisplay(kind: QuantityKind, value: number, system: UnitSystem): number {
  return DISPLAY[kind][system].toSi(value);
}

export interface Formatted {
  value: number;
  unit: string;
  text: string;
}

/** SI value → rounded display value, its unit and "12.34 mm" text. */
export function formatQuantity(
  kind: QuantityKind,
  siValue: number,
  system: UnitSystem,
  decimals: number = DISPLAY[kind][system].decimals,
): Formatted {
  const d = DISPLAY[kind][system];
  const shown = d.fromSi(siValue);
  const factor = 10 ** decimals;
  // + 0 turns −0 into 0, so a tiny negative never prints as "-0.00".
  const value = Math.round(shown * factor) / factor + 0;
  const text = Number.isFinite(value) ? `${value.toFixed(decimals)} ${d.unit}` : `— ${d.unit}`;
  return { value, unit: d.unit, text };
}

/** A measured value inside a message: worded in the reader's units only when shown. */
export interface Quantity {
  kind: QuantityKind;
  si: number;
  /** Decimals in both systems, where the default for the kind does not suit (a mass to 0.1 kg). */
  decimals?: number;
  /** The number alone, its unit given by the next quantity: the 593 of "593 and 816 °C". */
  bare?: boolean;
}

/** A message as text and quantities, e.g. ["Peak ", {temperature 850}, " is within ", …]. */
export type Phrase = readonly (string | Quantity)[];

export const quantity = (kind: QuantityKind, si: number, decimals?: number): Quantity =>
  decimals === undefined ? { kind, si } : { kind, si, decimals };

const isQuantity = (part: unknown): part is Quantity =>
  typeof part === 'object' && part !== null && 'kind' in part && 'si' in part;

/**
 * Builds a phrase from a template: phrase`Peak ${quantity('temperature', 850)} is over`.
 * Plain strings and numbers join the words; quantities stay values until `wordPhrase`.
 */
export function phrase(strings: TemplateStringsArray, ...values: (string | number | Quantity | Phrase)[]): Phrase {
  const parts: (string | Quantity)[] = [];
  const push = (part: string | Quantity) => {
    const last = parts[parts.length - 1];
    if (typeof part === 'string' && typeof last === 'string') parts[parts.length - 1] = last + part;
    else if (part !== '') parts.push(part);
  };
  strings.forEach((text, i) => {
    push(text);
    if (i >= values.length) return;
    const v = values[i];
    if (Array.isArray(v)) v.forEach(push);
    else push(isQuantity(v) ? v : String(v));
  });
  return parts;
}

/** Joins phrases with a separator ("; "), keeping their quantities. */
export function joinPhrases(list: readonly Phrase[], separator: string): Phrase {
  return list.flatMap((p, i) => (i === 0 ? [...p] : [separator, ...p]));
}

/** The words for a phrase in the reader's units: "Peak 1562 °F is within 90 °F of …". */
export function wordPhrase(p: Phrase | string, system: UnitSystem): string {
  if (typeof p === 'string') return p;
  return p
    .map((part) => {
      if (typeof part === 'string') return part;
      const f = formatQuantity(part.kind, part.si, system, part.decimals);
      return part.bare ? String(f.value) : f.text;
    })
    .join('');
}

/** The number for an input box, at the trade's precision for the kind (0.1 mm / 0.01 in, 1 °C / 1 °F); the stored SI value stays exact. */
export function inputNumber(kind: QuantityKind, si: number, system: UnitSystem, decimals?: number): number {
  return formatQuantity(kind, si, system, decimals).value;
}

/** What growth per length is per, in words for a title: "per metre" / "per 100 ft". */
export const growthBasisWords = (system: UnitSystem): string => (system === 'metric' ? 'per metre' : 'per 100 ft');

const WRITTEN_RANGE_C = /(-?\d+(?:\.\d+)?)(\s*(?:–|-|and|to)\s*)(-?\d+(?:\.\d+)?) ?°C|(-?\d+(?:\.\d+)?) ?°C/g;
// Catalogue texts sometimes add the Fahrenheit figures by hand: "(700–950 °F)". Worded from the quantities, they would repeat.
const WRITTEN_F_ASIDE = /\s*\((?:about )?-?\d+(?:\.\d+)?(?:\s*(?:–|-|to)\s*-?\d+(?:\.\d+)?)? ?°F\)/g;

/**
 * A text written in °C (a catalogue caution: "between 593 and 816 °C") as a phrase whose
 * temperatures are quantities, so it reads in °F for an imperial reader. A range's first
 * figure takes the unit of its second ("593 and 816 °C" is two temperatures, read "1099 and 1501 °F").
 */
export function phraseOfText(text: string): Phrase {
  const parts: (string | Quantity)[] = [];
  let last = 0;
  const plain = text.replace(WRITTEN_F_ASIDE, '');
  for (const m of plain.matchAll(WRITTEN_RANGE_C)) {
    parts.push(plain.slice(last, m.index));
    if (m[4] !== undefined) parts.push(quantity('temperature', Number(m[4])));
    else parts.push({ ...quantity('temperature', Number(m[1])), bare: true }, m[2], quantity('temperature', Number(m[3])));
    last = m.index! + m[0].length;
  }
  parts.push(plain.slice(last));
  return parts.filter((p) => p !== '');
}
