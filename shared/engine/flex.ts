import { tempAtMm } from './run-growth';
import type { FlexCandidateResult, FlexOptions, FlexPart, FlexResult, Segment } from './types';

/** Factor on the computed growth when sizing a flex. Common practice, no published source. */
export const DEFAULT_MOVEMENT_MARGIN = 1.25;
export const MOVEMENT_MARGIN_NOTE = 'Common practice, no published source';

/**
 * A flex part's bore fits the tube when it is within this many mm of the tube OD either way.
 * Our choice: it absorbs inch-versus-metric nominal sizes (76.2 vs 76 mm) and tube OD
 * tolerance; any larger mismatch needs a reducer, which the engine does not design.
 */
export const FLEX_BORE_FIT_TOLERANCE_MM = 1.0;

function fmt(x: number): string {
  return (Math.round(x * 100) / 100).toString();
}

/**
 * Pre-set: the ideal is to install the part stretched by the computed growth, so that it sits
 * at neutral when hot (hot, it is weakest and creeps; cold, it carries the deflection when
 * strongest). If its extension rating is smaller, it is stretched as far as that allows.
 * Envelope check: from the cold position P the part moves by growth × margin; both the cold
 * position and that worst hot position must stay within [−rated compression, +rated extension].
 */
export function assessFlexPart(part: FlexPart, growthMm: number, margin: number, odMm: number, tempC: number): FlexCandidateResult {
  const reasons: string[] = [];
  const compression = part.ratedAxialCompressionMm;
  const extension = part.ratedAxialExtensionMm;
  const preset = Math.min(Math.max(growthMm, -compression), extension);
  const worst = preset - growthMm * margin;
  if (Math.abs(part.boreMm - odMm) > FLEX_BORE_FIT_TOLERANCE_MM) {
    reasons.push(`Bore ${fmt(part.boreMm)} mm does not fit a ${fmt(odMm)} mm tube (±${FLEX_BORE_FIT_TOLERANCE_MM} mm)`);
  }
  if (part.maxTempC < tempC) {
    reasons.push(`Rated to ${fmt(part.maxTempC)} °C, below the ${fmt(tempC)} °C where it sits`);
  }
  if (worst < -compression || worst > extension) {
    reasons.push(
      `Needs ${fmt(Math.abs(growthMm * margin))} mm of travel; rated ${fmt(compression)} mm compression + ${fmt(extension)} mm extension is not enough with this pre-set`,
    );
  }
  return {
    id: part.id,
    name: part.name,
    fits: reasons.length === 0,
    reasons,
    presetMm: preset,
    hotPositionMm: preset - growthMm,
  };
}

export function sizeFlex(
  growthMm: number,
  odMm: number,
  segments: Segment[],
  peakC: number,
  options: FlexOptions,
  catalogue: FlexPart[] = [],
): FlexResult {
  const margin = options.movementMargin ?? DEFAULT_MOVEMENT_MARGIN;
  const parts = options.parts ?? catalogue;
  const atLocation = options.atMm !== undefined;
  const tempC = atLocation ? tempAtMm(segments, options.atMm as number) : peakC;
  const assessed = parts.map((p) => ({ part: p, result: assessFlexPart(p, growthMm, margin, odMm, tempC) }));
  const fitting = assessed
    .filter((a) => a.result.fits)
    .sort((a, b) => a.part.liveLengthMm - b.part.liveLengthMm || a.part.price - b.part.price || a.part.id.localeCompare(b.part.id));
  const best = fitting[0];
  const noneFitsReason =
    !best && parts.length > 0 ? `None of the ${parts.length} flex part(s) fits: see each part's reasons` : null;
  return {
    movementMargin: margin,
    movementMarginNote: MOVEMENT_MARGIN_NOTE,
    growthMm,
    requiredMovementMm: Math.abs(growthMm) * margin,
    presetMm: growthMm,
    tempAtFlexC: tempC,
    tempBasis: atLocation ? 'location' : 'peak',
    boreFitToleranceMm: FLEX_BORE_FIT_TOLERANCE_MM,
    chosen: best ? { ...best.result, part: best.part } : null,
    candidates: assessed.map((a) => a.result),
    noneFitsReason,
  };
}
