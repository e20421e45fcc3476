import type { AlloyData } from '../engine/types';
import type { AlloyInput } from '../schemas/alloy';

type VersionData = Pick<
  AlloyInput,
  | 'referenceTempC'
  | 'cte'
  | 'modulus'
  | 'yield'
  | 'densityKgM3'
  | 'maxContinuousC'
  | 'maxIntermittentC'
  | 'pricePerKg'
  | 'warningRanges'
>;

/** The titles of the sources a table cites, in order of first use: the basis a result names. */
export function tableBasis(points: { sourceId: string }[], sources: { id: string; title: string }[]): string | null {
  const titles = new Map(sources.map((s) => [s.id, s.title]));
  const named = [...new Set(points.map((p) => titles.get(p.sourceId)).filter((t): t is string => t !== undefined))];
  return named.length > 0 ? named.join('; ') : null;
}

/** The catalogue's view of an alloy version, reduced to what the engine reads; with the cited sources, the tables' bases too. */
export function toAlloyData(v: VersionData, sources: { id: string; title: string }[] = []): AlloyData {
  return {
    referenceTempC: v.referenceTempC,
    cte: v.cte.map(({ tempC, meanUmPerMK }) => ({ tempC, meanUmPerMK })),
    modulus: v.modulus.map(({ tempC, gpa }) => ({ tempC, gpa })),
    yield: v.yield.map(({ tempC, mpa }) => ({ tempC, mpa })),
    densityKgM3: v.densityKgM3,
    maxContinuousC: v.maxContinuousC,
    maxIntermittentC: v.maxIntermittentC,
    pricePerKg: v.pricePerKg,
    warningRanges: v.warningRanges,
    modulusBasis: tableBasis(v.modulus, sources),
    yieldBasis: tableBasis(v.yield, sources),
  };
}
