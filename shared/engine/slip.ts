import { type StrainCurve, strainChange } from './expansion';
import type { SlipInput, SlipResult } from './types';

/** Minimum engagement as a multiple of the tube diameter. Common practice, no published source. */
export const DEFAULT_MIN_ENGAGEMENT_OD_MULTIPLE = 1;
export const MIN_ENGAGEMENT_NOTE = '1 × tube OD by default: common practice, no published source';

export interface SlipMaterials {
  inner: StrainCurve;
  outer: StrainCurve;
}

/**
 * A slip joint that takes the whole run's growth. The spigot slides further in as the run
 * grows, so engagement is least cold and the axial gap closes by the growth. Diameters grow
 * with each member's own alloy and temperature from the install temperature; a spigot that
 * grows more than its sleeve eats the cold clearance and seizes when the clearance is gone.
 */
export function sizeSlip(
  input: SlipInput,
  materials: SlipMaterials,
  runGrowthMm: number,
  tubeOdMm: number,
  installTempC: number,
): SlipResult {
  const innerD = input.inner.diameterMm ?? tubeOdMm;
  const outerD = input.outer.diameterMm ?? innerD + input.coldClearanceMm;
  const innerGrowth = innerD * strainChange(materials.inner, input.inner.tempC, installTempC);
  const outerGrowth = outerD * strainChange(materials.outer, input.outer.tempC, installTempC);
  const differential = innerGrowth - outerGrowth;
  const hotClearance = input.coldClearanceMm - differential;
  const closure = runGrowthMm;
  const bottomsOut = closure >= input.coldAxialGapMm;
  const travel = Math.min(closure, input.coldAxialGapMm);
  const hotEngagement = input.coldEngagementMm + travel;
  const minEngagement = input.minEngagementMm ?? DEFAULT_MIN_ENGAGEMENT_OD_MULTIPLE * innerD;
  return {
    innerDiameterMm: innerD,
    outerDiameterMm: outerD,
    hotAxialClosureMm: closure,
    coldAxialGapMm: input.coldAxialGapMm,
    bottomsOut,
    coldEngagementMm: input.coldEngagementMm,
    hotEngagementMm: hotEngagement,
    minEngagementMm: minEngagement,
    minEngagementNote: MIN_ENGAGEMENT_NOTE,
    engagementOk: Math.min(input.coldEngagementMm, hotEngagement) >= minEngagement,
    innerDiametralGrowthMm: innerGrowth,
    outerDiametralGrowthMm: outerGrowth,
    differentialDiametralGrowthMm: differential,
    coldClearanceMm: input.coldClearanceMm,
    hotClearanceMm: hotClearance,
    verdict: hotClearance <= 0 ? 'seizes' : 'ok',
  };
}
