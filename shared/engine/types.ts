/** Plain data the engine works on. SI inside: mm, °C, MPa, GPa, kg. */
import type { Phrase } from '../units';

export interface AlloyData {
  /** Reference temperature of the mean CTE table. */
  referenceTempC: number;
  /** Mean (secant) coefficient from referenceTempC to tempC, in µm/(m·K). */
  cte: { tempC: number; meanUmPerMK: number }[];
  modulus: { tempC: number; gpa: number }[];
  /** 0.2 % proof strength. */
  yield: { tempC: number; mpa: number }[];
  densityKgM3: number;
  maxContinuousC: number;
  maxIntermittentC: number;
  pricePerKg: number;
  warningRanges?: { fromC: number; toC: number; code: string; message: string }[];
  /** Where the modulus and yield tables come from, named on the result (e.g. the cited sources' titles). */
  modulusBasis?: string | null;
  yieldBasis?: string | null;
}

/** What a flex part is made for: only a thermal bellows is meant to take growth. */
export type FlexPurpose = 'thermal_bellows' | 'vibration_decoupler' | 'braided_hose';

export interface FlexPart {
  id: string;
  name: string;
  purpose: FlexPurpose;
  boreMm: number;
  /** Convoluted (live) length L_b. */
  liveLengthMm: number;
  /** Face-to-face length the part takes out of the tube; the live length when the maker gives none. */
  overallLengthMm?: number | null;
  /** Bellows mean diameter D_m; estimated from the bore when the maker gives none. */
  meanDiameterMm?: number | null;
  ratedAxialCompressionMm: number;
  ratedAxialExtensionMm: number;
  lateralOffsetMm: number;
  ratedAngularDeg: number;
  /** Heat cycles the maker rates the part for at its rated movements; null when not rated. */
  ratedCycles: number | null;
  maxTempC: number;
  price: number;
}

/** A stretch of tube whose temperature varies linearly from start to end. */
export interface Segment {
  lengthMm: number;
  startTempC: number;
  endTempC: number;
}

export interface Tube {
  odMm: number;
  wallMm: number;
}

/**
 * The shop's design basis for joints (shop settings): how much of a rated travel the computed
 * movement may use, and the coldest ambient a system starts from.
 */
export interface DesignBasis {
  travelShare: number;
  coldestAmbientC: number;
}

export interface FlexOptions {
  /** The part the fabricator picked; absent = the engine picks among the candidates. */
  partId?: string;
  /** Inline candidates; when absent the caller's catalogue list is used. */
  parts?: FlexPart[];
  /** Where the flex sits along the run (its centre, from the run's start); absent = judge it at the run's peak temperature. */
  atMm?: number;
  /** Lateral offset across the flex at the hottest state (engine movement, offsets of connected legs). */
  lateralOffsetMm?: number;
  /** Angular rotation across the flex at the hottest state. */
  rotationDeg?: number;
  /** A leg perpendicular to this run whose growth offsets the flex sideways (run alloy, uniform temperature). */
  perpendicularLeg?: { lengthMm: number; tempC: number };
  /** Heat cycles (cold start to full temperature and back) the system is expected to see. */
  heatCycles?: number;
}

export interface SlipMemberInput {
  alloyId?: string;
  alloy?: AlloyData;
  /** Inner: spigot OD (default the tube OD). Outer: sleeve bore (default inner + cold clearance). */
  diameterMm?: number;
  tempC: number;
}

export interface SlipInput {
  inner: SlipMemberInput;
  outer: SlipMemberInput;
  /** Nominal diametral clearance at install: sleeve bore minus spigot OD. */
  coldClearanceMm: number;
  coldEngagementMm: number;
  coldAxialGapMm: number;
  /** Default: 1 × the inner tube's diameter. */
  minEngagementMm?: number;
  /** ± on the spigot OD and on the sleeve bore; default from the tube standard's OD tolerance. */
  toleranceMm?: number;
  /** Oxide scale allowed for on each of the two sliding surfaces in service. */
  scalePerSurfaceMm?: number;
  /** Radial clearance the fit must keep (tightest case) and may not exceed (loosest case), hot and at the coldest start. */
  minRadialClearanceMm?: number;
  maxRadialClearanceMm?: number;
}

export interface RunInput {
  tube: Tube;
  installTempC: number;
  segments: Segment[];
  flex?: FlexOptions;
  slip?: SlipInput;
}

/** Words for people with the quantities left as values: the screen words them in the reader's units (`wordPhrase`). */
export interface EngineWarning {
  code: string;
  message: Phrase;
}

export interface CurvePoint {
  atMm: number;
  tempC: number;
  growthMm: number;
}

export interface GrowthPerMetrePoint {
  tempC: number;
  growthMmPerM: number;
}

export type LimitStatus = 'ok' | 'caution' | 'over';

export interface LimitResult {
  status: LimitStatus;
  /** Governing limit minus peak temperature; negative when over. */
  marginC: number;
  continuousC: number;
  intermittentC: number;
  /** The lower of the two limits, which the status is judged against. */
  governingC: number;
  governedBy: 'continuous' | 'intermittent';
  cautionBandC: number;
}

export type RestraintVerdict = 'clear' | 'marginal' | 'yields' | 'unknown';

/** The point of the run where the restrained stress comes closest to yield. */
export interface GoverningStress {
  stressMPa: number;
  tempC: number;
  yieldMPa: number;
  /** stressMPa / yieldMPa */
  ratio: number;
}

/**
 * The run held rigidly at both ends with nothing giving: a flag, not a design stress. The
 * elastic figure far above yield only says that the tube would yield, buckle or crack its welds.
 */
export interface RestraintResult {
  /** What the alloy's data lacks for this check; null when the data covers it. */
  missing: 'modulus' | 'yield' | null;
  /** Highest |E(T)·(ε(T) − ε(T0))| over the run; null without modulus data. */
  peakStressMPa: number | null;
  peakTempC: number | null;
  /** Where stress/yield is highest among the temperatures the yield table covers; the one figure every screen shows. */
  governing: GoverningStress | null;
  /**
   * Above the yield table's top: the highest stress there against the last tabulated yield.
   * Yield does not rise with temperature in this range, so its ratio is a lower bound.
   */
  beyondYieldData: (GoverningStress & { yieldTempC: number }) | null;
  verdict: RestraintVerdict;
  /** Stress/yield at or below which the run may stay rigidly held. */
  clearRatio: number;
  clearRatioNote: string;
  modulusBasis: string | null;
  yieldBasis: string | null;
  /** null when the data cannot decide. */
  jointNeeded: boolean | null;
  warnings: EngineWarning[];
}

/** One check of a joint, in words a fabricator can act on. */
export interface JointCheck {
  code: string;
  ok: boolean;
  message: Phrase;
}

/** Movement across a flex at one state, from the install position. */
export interface FlexState {
  state: 'install' | 'hot' | 'cold';
  tempC: number;
  /** Run growth from install (positive = the run is longer, closing the flex). */
  axialGrowthMm: number;
  lateralMm: number;
  rotationDeg: number;
}

export interface FlexStateUse {
  state: FlexState['state'];
  /** Axial position from the part's neutral length (positive = stretched). */
  positionMm: number;
  /** Lateral and angular movement as equivalent axial movement (EJMA relations). */
  equivalentMm: number;
  /** Compression and extension demand as shares of the part's rated compression and extension. */
  compressionUse: number;
  extensionUse: number;
}

export interface FlexCandidateResult {
  id: string;
  name: string;
  purpose: FlexPurpose;
  fits: boolean;
  /** Why it does not fit (empty when it fits). */
  reasons: Phrase[];
  /** Cold stretch to set at install (negative = compressed); null when no pre-set keeps the part within its share of travel. */
  presetMm: number | null;
  meanDiameterMm: number;
  meanDiameterEstimated: boolean;
  uses: FlexStateUse[];
  lateralUse: number;
  angularUse: number;
  /** Highest share of any rating the part reaches. */
  worstUse: number;
  warnings: EngineWarning[];
}

export interface FlexResult {
  travelShare: number;
  travelShareNote: string;
  coldestAmbientC: number;
  relationNote: string;
  states: FlexState[];
  /** Axial movement from the coldest start to the hottest state. */
  axialRangeMm: number;
  /** Temperature the part's rating is checked against. */
  tempAtFlexC: number;
  tempBasis: 'location' | 'peak';
  heatCycles: number | null;
  boreFitToleranceMm: number;
  /** The part the run uses: the fabricator's pick (even when it does not fit), else the engine's among those that fit. */
  chosen: (FlexCandidateResult & { part: FlexPart }) | null;
  chosenBy: 'fabricator' | 'engine' | null;
  candidates: FlexCandidateResult[];
  /** Set when no part can be used. */
  noneFitsReason: Phrase | null;
}

/** Radial clearance of a slip joint at one state. */
export interface SlipState {
  state: 'install' | 'hot' | 'cold';
  innerTempC: number;
  outerTempC: number;
  /** Spigot diametral growth minus sleeve diametral growth from install. */
  differentialGrowthMm: number;
  nominalRadialMm: number;
  /** With both members at the tight end of their tolerance and (in service) scale on both surfaces. */
  tightestRadialMm: number;
  /** With both members at the loose end of their tolerance and no scale. */
  loosestRadialMm: number;
}

export interface SlipResult {
  innerDiameterMm: number;
  outerDiameterMm: number;
  coldClearanceMm: number;
  toleranceMm: number;
  toleranceNote: string;
  scalePerSurfaceMm: number;
  scaleNote: string;
  minRadialClearanceMm: number;
  maxRadialClearanceMm: number;
  clearanceLimitsNote: string;
  states: SlipState[];
  travelShare: number;
  /** How far the gap closes at the hottest state (the run's growth). */
  hotClosureMm: number;
  /** How far the spigot draws out at the coldest start (the run's contraction, ≥ 0). */
  coldDrawOutMm: number;
  coldAxialGapMm: number;
  /** Gap the hot closure needs with the travel share: closure ÷ share. */
  requiredGapMm: number;
  bottomsOut: boolean;
  coldEngagementMm: number;
  /** Engagement hot (capped where the gap bottoms out) and at the coldest start. */
  hotEngagementMm: number;
  coldestEngagementMm: number;
  minEngagementMm: number;
  minEngagementNote: string;
  checks: JointCheck[];
  verdict: 'ok' | 'fails';
}

export interface RunResult {
  growthMm: number;
  curve: CurvePoint[];
  growthPerMetreCurve: GrowthPerMetrePoint[];
  totalLengthMm: number;
  peakTempC: number;
  restraint: RestraintResult;
  limit: LimitResult;
  massKg: number;
  materialCost: number;
  warnings: EngineWarning[];
  flex?: FlexResult;
  slip?: SlipResult;
}
