import type { AlloyFamily } from '../schemas/alloy';

/** One base metal of a weld, as the catalogue names it. */
export interface WeldMetal {
  uns: string;
  designation: string;
  /** null when the metal is known only by its UNS number (a flex part's cuff). */
  family: AlloyFamily | null;
}

/** UNS R50001–R59999 are titanium and its alloys (SAE HS-1086 / ASTM DS-56, the UNS numbering). */
export function isTitanium(m: WeldMetal): boolean {
  return m.family === 'titanium' || /^R5\d{4}$/.test(m.uns);
}

const CHROMIUM: readonly AlloyFamily[] = ['austenitic_stainless', 'ferritic_stainless', 'nickel_chromium', 'nickel_iron_chromium'];
const NICKEL: readonly AlloyFamily[] = ['austenitic_stainless', 'nickel_chromium', 'nickel_iron_chromium'];

/** Family from the UNS series where the catalogue gives none: S stainless, N nickel, G/K carbon and low-alloy steel. */
function familyOf(m: WeldMetal): AlloyFamily | null {
  if (m.family) return m.family;
  if (/^S3\d{4}$/.test(m.uns)) return 'austenitic_stainless';
  if (/^S4\d{4}$/.test(m.uns)) return 'ferritic_stainless';
  if (/^N0\d{4}$/.test(m.uns)) return 'nickel_chromium';
  if (/^[GK]\d{5}$/.test(m.uns)) return 'carbon_steel';
  return null;
}

export const FUME_CAUTIONS = {
  chromium:
    'Chromium in the base metal or filler gives hexavalent chromium in the fume, a carcinogen: weld with local fume extraction at the arc and respiratory protection, and keep to the local exposure limit',
  nickel: 'Nickel compounds in the fume are carcinogenic and sensitise the skin and lungs: extraction at the arc and respiratory protection',
  general: 'Welding fume of any metal harms the lungs: extraction at the arc, and respiratory protection where extraction is not enough',
} as const;

/** The fume cautions for a pair and its filler: chromium and nickel named where either side or the filler carries them. */
export function fumeCautions(a: WeldMetal, b: WeldMetal, filler: string | null): string[] {
  const families = [familyOf(a), familyOf(b)];
  const f = (filler ?? '').toUpperCase();
  const chromium = families.some((x) => x !== null && CHROMIUM.includes(x)) || /^ER(3|4|NICR)/.test(f);
  const nickel = families.some((x) => x !== null && NICKEL.includes(x)) || /^ER(3|NI)/.test(f);
  const out: string[] = [];
  if (chromium) out.push(FUME_CAUTIONS.chromium);
  if (nickel) out.push(FUME_CAUTIONS.nickel);
  if (out.length === 0) out.push(FUME_CAUTIONS.general);
  return out;
}

export const metalName = (m: WeldMetal) => `${m.designation} (${m.uns})`;
