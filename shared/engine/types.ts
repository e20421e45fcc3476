/** Plain data the engine works on. SI inside: mm, °C, MPa, GPa, kg. */

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
}

export interface FlexPart {
  id: string;
  name: string;
  boreMm: number;
  liveLengthMm: number;
  ratedAxialCompressionMm: number;
  ratedAxialExtensionMm: number;
  lateralOffsetMm: number;
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

export interface FlexOptions {
  /** Factor on the computed growth; default DEFAULT_MOVEMENT_MARGIN. */
  movementMargin?: number;
  /** Inline candidates; when absent the caller's catalogue list is used. */
  parts?: FlexPart[];
  /** Where the flex sits along the run (from the run's start); absent = judge it at the run's peak temperature. */
  atMm?: number;
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
  coldClearanceMm: number;
  coldEngagementMm: number;
  coldAxialGapMm: number;
  /** Default: 1 × the inner tube's diameter. */
  minEngagementMm?: number;
}

export interface RunInput {
  tube: Tube;
  installTempC: number;
  segments: Segment[];
  flex?: FlexOptions;
  slip?: SlipInput;
}

export interface EngineWarning {
  code: string;
  message: string;
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

export interface RestraintResult {
  /** Peak of |E(T)·(ε(T) − ε(T0))| over the run. */
  restrainedStressMPa: number;
  /** Temperature at which that peak occurs. */
  stressPeakTempC: number;
  yieldAtPeakMPa: number | null;
  /** restrainedStressMPa / yieldAtPeakMPa. */
  stressRatio: number | null;
  /** Highest local stress/yield ratio where the yield table covers the run; the verdict is judged on it. */
  worstStressRatio: number | null;
  worstStressTempC: number | null;
  /** null when the data cannot decide. */
  jointNeeded: boolean | null;
  warnings: EngineWarning[];
}

export interface FlexCandidateResult {
  id: string;
  name: string;
  fits: boolean;
  reasons: string[];
  /** Cold extension to set at install (positive = stretched). */
  presetMm: number;
  /** Position at the computed hot growth relative to neutral (negative = compressed). */
  hotPositionMm: number;
}

export interface FlexResult {
  movementMargin: number;
  movementMarginNote: string;
  growthMm: number;
  requiredMovementMm: number;
  /** Cold pre-stretch that leaves the flex at neutral when hot. */
  presetMm: number;
  /** Temperature the part's rating is checked against. */
  tempAtFlexC: number;
  tempBasis: 'location' | 'peak';
  boreFitToleranceMm: number;
  chosen: (FlexCandidateResult & { part: FlexPart }) | null;
  candidates: FlexCandidateResult[];
  /** Set when parts were offered and none fits. */
  noneFitsReason: string | null;
}

export interface SlipResult {
  innerDiameterMm: number;
  outerDiameterMm: number;
  hotAxialClosureMm: number;
  coldAxialGapMm: number;
  bottomsOut: boolean;
  coldEngagementMm: number;
  /** Engagement at the hot position (capped where the gap bottoms out). */
  hotEngagementMm: number;
  minEngagementMm: number;
  minEngagementNote: string;
  engagementOk: boolean;
  innerDiametralGrowthMm: number;
  outerDiametralGrowthMm: number;
  differentialDiametralGrowthMm: number;
  coldClearanceMm: number;
  hotClearanceMm: number;
  verdict: 'seizes' | 'ok';
}

export interface RunResult {
  growthMm: number;
  curve: CurvePoint[];
  growthPerMetreCurve: GrowthPerMetrePoint[];
  totalLengthMm: number;
  peakTempC: number;
  restrainedStressMPa: number;
  stressPeakTempC: number;
  yieldAtPeakMPa: number | null;
  stressRatio: number | null;
  worstStressRatio: number | null;
  jointNeeded: boolean | null;
  limit: LimitResult;
  massKg: number;
  materialCost: number;
  warnings: EngineWarning[];
  flex?: FlexResult;
  slip?: SlipResult;
}
