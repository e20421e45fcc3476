import { angularEquivalentMm, EJMA_RELATION_NOTE, ESTIMATED_MEAN_DIAMETER_FACTOR, lateralEquivalentMm } from './ejma';
import { TRAVEL_SHARE_NOTE } from './design-basis';
import type { EngineWarning, FlexCandidateResult, FlexPart, FlexResult, FlexState, FlexStateUse } from './types';
import { joinPhrases, type Phrase, phrase, quantity } from '../units';

/**
 * A flex part's bore fits the tube when it is within this many mm of the tube OD either way.
 * Our choice: it absorbs inch-versus-metric nominal sizes (76.2 vs 76 mm) and tube OD
 * tolerance; any larger mismatch needs a reducer, which the engine does not design.
 */
export const FLEX_BORE_FIT_TOLERANCE_MM = 1.0;

export const PURPOSE_LABELS: Record<FlexPart['purpose'], string> = {
  thermal_bellows: 'thermal bellows',
  vibration_decoupler: 'vibration decoupler',
  braided_hose: 'braided hose',
};

/** What the part must take: the run's movement at each state and where the part sits. */
export interface FlexDuty {
  states: FlexState[];
  odMm: number;
  tempAtFlexC: number;
  heatCycles: number | null;
  travelShare: number;
}

const fmt = (x: number) => (Math.round(x * 100) / 100).toString();
const len = (mm: number) => quantity('length', mm);
const move = (mm: number) => quantity('smallLength', mm);
const temp = (c: number) => quantity('temperature', c);
const pct = (x: number) => `${Math.round(x * 100)} %`;
/** Uses past this many times a rating are reported as this: the part is far out of range either way, and the figure stays finite. */
export const USE_CAP = 10;
const shareOf = (demand: number, rating: number) => (demand <= 1e-12 ? 0 : rating > 0 ? Math.min(demand / rating, USE_CAP) : USE_CAP);

function meanDiameter(part: FlexPart): { mm: number; estimated: boolean } {
  return part.meanDiameterMm ? { mm: part.meanDiameterMm, estimated: false } : { mm: part.boreMm * ESTIMATED_MEAN_DIAMETER_FACTOR, estimated: true };
}

/** Lateral and angular movement of a state as equivalent axial movement at axial position p. */
function equivalentAt(part: FlexPart, dm: number, s: FlexState, positionMm: number): number {
  return lateralEquivalentMm(dm, part.liveLengthMm, s.lateralMm, positionMm) + angularEquivalentMm(dm, s.rotationDeg);
}

function stateUse(part: FlexPart, dm: number, s: FlexState, presetMm: number): FlexStateUse {
  const positionMm = presetMm - s.axialGrowthMm;
  const equivalentMm = equivalentAt(part, dm, s, positionMm);
  return {
    state: s.state,
    positionMm,
    equivalentMm,
    compressionUse: shareOf(-positionMm + equivalentMm, part.ratedAxialCompressionMm),
    extensionUse: shareOf(positionMm + equivalentMm, part.ratedAxialExtensionMm),
  };
}

/**
 * Pre-set range: at every state the compression demand (−p + X_eq) and the extension demand
 * (p + X_eq), with p = P − growth, must stay within the share of the rated compression and
 * extension. X_eq is taken at the shortest the part gets, which overstates it slightly; the
 * chosen pre-set is then checked exactly.
 */
function presetRange(part: FlexPart, dm: number, duty: FlexDuty): { lo: number; hi: number } {
  const c = duty.travelShare * part.ratedAxialCompressionMm;
  const e = duty.travelShare * part.ratedAxialExtensionMm;
  let lo = -Infinity;
  let hi = Infinity;
  for (const s of duty.states) {
    // Within its share the part is never shorter than L_b − c.
    const eq = equivalentAt(part, dm, s, -c);
    lo = Math.max(lo, s.axialGrowthMm + eq - c);
    hi = Math.min(hi, s.axialGrowthMm - eq + e);
  }
  return { lo, hi };
}

/**
 * The one pre-set of the part: hot at neutral where its share of travel allows (hot, a bellows
 * is weakest and creeps; cold, it carries the deflection when strongest), otherwise as near to
 * it as the range allows; to 0.1 mm, rounded into the range.
 */
export function choosePreset(hotGrowthMm: number, range: { lo: number; hi: number }): number | null {
  if (!(range.lo <= range.hi + 1e-9)) return null;
  const ideal = Math.min(Math.max(hotGrowthMm, range.lo), range.hi);
  const rounded = Math.round(ideal * 10) / 10;
  if (rounded >= range.lo - 1e-9 && rounded <= range.hi + 1e-9) return rounded;
  return rounded < range.lo ? Math.ceil(range.lo * 10) / 10 : Math.floor(range.hi * 10) / 10;
}

export function assessFlexPart(part: FlexPart, duty: FlexDuty): FlexCandidateResult {
  const reasons: Phrase[] = [];
  const warnings: EngineWarning[] = [];
  const share = duty.travelShare;
  const dm = meanDiameter(part);
  if (Math.abs(part.boreMm - duty.odMm) > FLEX_BORE_FIT_TOLERANCE_MM) {
    reasons.push(phrase`Bore ${len(part.boreMm)} does not fit a ${len(duty.odMm)} tube (±${move(FLEX_BORE_FIT_TOLERANCE_MM)})`);
  }
  if (part.maxTempC < duty.tempAtFlexC) {
    reasons.push(phrase`Rated to ${temp(part.maxTempC)}, below the ${temp(duty.tempAtFlexC)} where it sits`);
  }
  let hot = duty.states[0];
  let lateral = 0;
  let rotation = 0;
  for (const s of duty.states) {
    if (s.state === 'hot') hot = s;
    lateral = Math.max(lateral, s.lateralMm);
    rotation = Math.max(rotation, s.rotationDeg);
  }
  const lateralUse = shareOf(lateral, part.lateralOffsetMm);
  const angularUse = shareOf(rotation, part.ratedAngularDeg);
  if (lateralUse > share) reasons.push(phrase`Lateral offset ${len(lateral)} is ${pct(lateralUse)} of its ${len(part.lateralOffsetMm)} rating (at most ${pct(share)})`);
  if (angularUse > share) reasons.push(phrase`Rotation ${fmt(rotation)}° is ${pct(angularUse)} of its ${fmt(part.ratedAngularDeg)}° rating (at most ${pct(share)})`);

  const preset = choosePreset(hot.axialGrowthMm, presetRange(part, dm.mm, duty));
  const uses = duty.states.map((s) => stateUse(part, dm.mm, s, preset ?? 0));
  if (preset === null) {
    const range = Math.max(...duty.states.map((s) => s.axialGrowthMm)) - Math.min(...duty.states.map((s) => s.axialGrowthMm));
    reasons.push(
      phrase`Needs ${move(range)} of axial travel from the coldest start to hot, plus the lateral and angular equivalent; ${pct(share)} of its ${move(part.ratedAxialCompressionMm)} compression and ${move(part.ratedAxialExtensionMm)} extension is not enough at any pre-set`,
    );
  } else {
    for (const u of uses) {
      if (u.compressionUse > share + 1e-9 || u.extensionUse > share + 1e-9) {
        reasons.push([`At the ${u.state} state it would use ${pct(Math.max(u.compressionUse, u.extensionUse))} of its rated travel (at most ${pct(share)})`]);
      }
    }
  }
  if (part.purpose !== 'thermal_bellows') {
    warnings.push({
      code: 'FLEX_NOT_FOR_GROWTH',
      message: [`${part.name} is a ${PURPOSE_LABELS[part.purpose]}, not meant to take thermal growth: use a thermal bellows for the growth`],
    });
  }
  if (duty.heatCycles !== null) {
    if (part.ratedCycles === null) {
      warnings.push({ code: 'FLEX_CYCLES_NOT_RATED', message: [`${part.name} has no cycle rating: ask its maker whether it is rated for ${duty.heatCycles} heat cycles`] });
    } else if (duty.heatCycles > part.ratedCycles) {
      warnings.push({
        code: 'FLEX_CYCLES_OVER_RATING',
        message: [`${duty.heatCycles} heat cycles exceed the ${part.ratedCycles} cycles ${part.name} is rated for: expect fatigue cracks; choose a part rated for the cycles`],
      });
    }
  }
  let worstUse = Math.max(lateralUse, angularUse);
  for (const u of uses) worstUse = Math.max(worstUse, u.compressionUse, u.extensionUse);
  return {
    id: part.id,
    name: part.name,
    purpose: part.purpose,
    fits: reasons.length === 0,
    reasons,
    presetMm: preset,
    meanDiameterMm: dm.mm,
    meanDiameterEstimated: dm.estimated,
    uses,
    lateralUse,
    angularUse,
    worstUse,
    warnings,
  };
}

/** Thermal bellows first, then the most compact, then the cheapest. */
function preference(a: FlexPart, b: FlexPart): number {
  const growthPart = (p: FlexPart) => (p.purpose === 'thermal_bellows' ? 0 : 1);
  return growthPart(a) - growthPart(b) || a.liveLengthMm - b.liveLengthMm || a.price - b.price || a.id.localeCompare(b.id);
}

export function sizeFlex(duty: FlexDuty & { coldestAmbientC: number; tempBasis: 'location' | 'peak' }, parts: FlexPart[], partId?: string): FlexResult {
  const assessed = parts.map((p) => ({ part: p, result: assessFlexPart(p, duty) }));
  let chosen: (typeof assessed)[number] | undefined;
  let noneFitsReason: Phrase | null = null;
  if (partId !== undefined) {
    chosen = assessed.find((a) => a.part.id === partId);
    if (!chosen) noneFitsReason = ['The flex part picked for this run is no longer in the catalogue: pick another'];
    else if (!chosen.result.fits) noneFitsReason = phrase`${chosen.part.name} does not fit: ${joinPhrases(chosen.result.reasons, '; ')}`;
  } else {
    chosen = assessed.filter((a) => a.result.fits).sort((a, b) => preference(a.part, b.part))[0];
    if (!chosen) noneFitsReason = [parts.length > 0 ? `None of the ${parts.length} flex part(s) fits: see each part's reasons` : 'There are no flex parts in the catalogue'];
  }
  const growths = duty.states.map((s) => s.axialGrowthMm);
  return {
    travelShare: duty.travelShare,
    travelShareNote: TRAVEL_SHARE_NOTE,
    coldestAmbientC: duty.coldestAmbientC,
    relationNote: EJMA_RELATION_NOTE,
    states: duty.states,
    axialRangeMm: Math.max(...growths) - Math.min(...growths),
    tempAtFlexC: duty.tempAtFlexC,
    tempBasis: duty.tempBasis,
    heatCycles: duty.heatCycles,
    boreFitToleranceMm: FLEX_BORE_FIT_TOLERANCE_MM,
    chosen: chosen ? { ...chosen.result, part: chosen.part } : null,
    chosenBy: chosen ? (partId !== undefined ? 'fabricator' : 'engine') : null,
    candidates: assessed.map((a) => a.result),
    noneFitsReason,
  };
}
