import { type StrainCurve, strainChange } from './expansion';
import type { FlexDuty } from './flex';
import { tempAtMm, totalLengthMm } from './run-growth';
import type { DesignBasis, FlexOptions, FlexState, Segment } from './types';

export interface FlexDutyInput {
  curve: StrainCurve;
  segments: Segment[];
  installTempC: number;
  hotGrowthMm: number;
  peakC: number;
  odMm: number;
  options: FlexOptions;
  design: DesignBasis;
}

/**
 * The movement a flex must take, at install, at the hottest running state and at the coldest
 * start. Entered lateral offset and rotation are the hot values; at the coldest start they are
 * taken in proportion to the run's axial movement (they come from the same heating). A
 * perpendicular leg's growth is computed at each state with the run's alloy.
 */
export function flexDuty(d: FlexDutyInput): FlexDuty & { coldestAmbientC: number; tempBasis: 'location' | 'peak' } {
  const { curve, installTempC, design, options } = d;
  const coldC = design.coldestAmbientC;
  const coldGrowthMm = totalLengthMm(d.segments) * strainChange(curve, coldC, installTempC);
  const ratio = d.hotGrowthMm === 0 ? 0 : Math.abs(coldGrowthMm / d.hotGrowthMm);
  const leg = options.perpendicularLeg;
  const legGrowth = (tempC: number) => (leg ? Math.abs(leg.lengthMm * strainChange(curve, tempC, installTempC)) : 0);
  const lateral = options.lateralOffsetMm ?? 0;
  const rotation = options.rotationDeg ?? 0;
  const states: FlexState[] = [
    { state: 'install', tempC: installTempC, axialGrowthMm: 0, lateralMm: 0, rotationDeg: 0 },
    { state: 'hot', tempC: d.peakC, axialGrowthMm: d.hotGrowthMm, lateralMm: lateral + legGrowth(leg?.tempC ?? installTempC), rotationDeg: rotation },
    { state: 'cold', tempC: coldC, axialGrowthMm: coldGrowthMm, lateralMm: lateral * ratio + legGrowth(coldC), rotationDeg: rotation * ratio },
  ];
  const atLocation = options.atMm !== undefined;
  return {
    states,
    odMm: d.odMm,
    tempAtFlexC: atLocation ? tempAtMm(d.segments, options.atMm as number) : d.peakC,
    tempBasis: atLocation ? 'location' : 'peak',
    heatCycles: options.heatCycles ?? null,
    travelShare: design.travelShare,
    coldestAmbientC: coldC,
  };
}
