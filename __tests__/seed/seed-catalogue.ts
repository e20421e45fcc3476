/** The seed catalogue as the seed tests read it, and small helpers over its tables. */
import * as fs from 'fs';
import * as path from 'path';

export type Kind = 'standard' | 'handbook' | 'datasheet' | 'memory';
export interface Source { key: string; kind: Kind; title: string; issuer: string | null; edition: string | null; url: string | null; note: string }
export interface CtePoint { tempC: number; meanUmPerMK: number; source: string }
export interface ModPoint { tempC: number; gpa: number; source: string }
export interface YieldPoint { tempC: number; mpa: number; source: string }
export interface Warning { fromC: number; toC: number; code: string; message: string }
export interface Alloy {
  designation: string; uns: string; family: string;
  densityKgM3: number; densitySource: string;
  maxContinuousC: number; maxIntermittentC: number; limitsSource: string;
  pricePerKg: number; currency: string; priceSetOn: string; priceIsDemo: boolean;
  referenceTempC: number; notes: string; dataCautions: string; warningRanges: Warning[];
  cte: CtePoint[]; modulus: ModPoint[]; yield: YieldPoint[];
}
export interface Catalogue { sources: Source[]; alloys: Alloy[] }

export const SEED_DIR = path.join(__dirname, '..', '..', 'data', 'seed');
export const catalogueText = fs.readFileSync(path.join(SEED_DIR, 'catalogue.json'), 'utf8');
export const catalogue: Catalogue = JSON.parse(catalogueText);
export const sourceByKey = new Map(catalogue.sources.map((s) => [s.key, s]));

export function byUns(uns: string): Alloy {
  const a = catalogue.alloys.find((x) => x.uns === uns);
  if (!a) throw new Error(`alloy ${uns} missing from the seed`);
  return a;
}

export const clone = <T>(x: T): T => JSON.parse(JSON.stringify(x));
export const relErr = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);
export const topOf = (a: Alloy) => a.cte[a.cte.length - 1].tempC;

/** Strain knots ε = ᾱ·(T − T_ref), with ε(T_ref) = 0 as the first knot (the calculator inserts the same one). */
export function knots(a: Alloy): { t: number; e: number }[] {
  return [{ t: a.referenceTempC, e: 0 }, ...a.cte.map((p) => ({ t: p.tempC, e: p.meanUmPerMK * 1e-6 * (p.tempC - a.referenceTempC) }))];
}

/** Linear strain interpolation between the knots, as the calculator does it; T within the table. */
export function strainAt(a: Alloy, t: number): number {
  const k = knots(a);
  const i = Math.max(1, k.findIndex((p) => p.t >= t));
  const lo = k[i - 1];
  const hi = k[i];
  return lo.e + ((hi.e - lo.e) * (t - lo.t)) / (hi.t - lo.t);
}

/** Strain from T0 to T on the alloy's table (the change of reference rule, reference-data §5). */
export const strainFrom = (a: Alloy, t0: number, t: number) => strainAt(a, t) - strainAt(a, t0);
