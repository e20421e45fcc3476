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

/** The catalogue's view of an alloy version, reduced to what the engine reads. */
export function toAlloyData(v: VersionData): AlloyData {
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
  };
}
