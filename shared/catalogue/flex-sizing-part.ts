import type { FlexPart } from '../engine/types';
import type { FlexPartView } from '../schemas/alloy';

/** A catalogue flex part as the calculator's sizing reads it (the server and the live result in the browser alike). */
export function toSizingPart(p: FlexPartView): FlexPart {
  return {
    id: p.id,
    name: `${p.code} ${p.name}`,
    purpose: p.purpose,
    boreMm: p.boreMm,
    liveLengthMm: p.liveLengthMm,
    overallLengthMm: p.overallLengthMm,
    meanDiameterMm: p.meanDiameterMm,
    ratedAxialCompressionMm: p.ratedAxialCompressionMm,
    ratedAxialExtensionMm: p.ratedAxialExtensionMm,
    lateralOffsetMm: p.lateralOffsetMm,
    ratedAngularDeg: p.ratedAngularDeg,
    ratedCycles: p.ratedCycles,
    maxTempC: p.maxTempC,
    price: p.price,
  };
}
