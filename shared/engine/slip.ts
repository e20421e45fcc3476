import { type StrainCurve, strainChange } from './expansion';
import {
  CLEARANCE_LIMITS_NOTE,
  DEFAULT_MAX_RADIAL_CLEARANCE_MM,
  DEFAULT_MIN_RADIAL_CLEARANCE_MM,
  DEFAULT_SCALE_PER_SURFACE_MM,
  SCALE_NOTE,
  standardOdToleranceMm,
  TUBE_TOLERANCE_NOTE,
} from './tube-tolerance';
import type { DesignBasis, JointCheck, SlipInput, SlipResult, SlipState } from './types';
import { phrase, quantity } from '../units';

/** Minimum engagement as a multiple of the tube diameter. Common practice, no published source. */
export const DEFAULT_MIN_ENGAGEMENT_OD_MULTIPLE = 1;
export const MIN_ENGAGEMENT_NOTE = '1 × tube OD by default: common practice, no published source';

export interface SlipMaterials {
  inner: StrainCurve;
  outer: StrainCurve;
}

export interface SlipMovement {
  /** The run's growth from install at the hottest state and at the coldest start. */
  hotGrowthMm: number;
  coldGrowthMm: number;
  installTempC: number;
  design: DesignBasis;
}

/** Radial fits to 0.001 mm (0.0001 in), gaps and engagements to 0.1 mm, movements to 0.01 mm. */
const fit = (mm: number) => quantity('fit', mm);
const len = (mm: number) => quantity('length', mm);
const travel = (mm: number) => quantity('smallLength', mm);

/** The tolerance the joint is judged with: the entered one, else the tube standard's for the spigot OD. */
export function slipTolerance(input: SlipInput, spigotOdMm: number): number | null {
  return input.toleranceMm ?? standardOdToleranceMm(spigotOdMm);
}

/**
 * A slip joint that takes the whole run's growth. The spigot slides further in as the run
 * grows (engagement is least at the coldest start), and the axial gap closes by the growth.
 * Diameters grow with each member's own alloy and temperature from install. The radial fit is
 * judged in its tightest case (spigot at the top of its OD tolerance, sleeve bore at the
 * bottom of its own, scale on both sliding surfaces) against the minimum clearance, and in
 * its loosest case against the maximum, hot and at the coldest start; at install the tightest
 * case must still go together.
 */
export function sizeSlip(input: SlipInput, materials: SlipMaterials, move: SlipMovement, tubeOdMm: number, toleranceMm: number): SlipResult {
  const innerD = input.inner.diameterMm ?? tubeOdMm;
  const outerD = input.outer.diameterMm ?? innerD + input.coldClearanceMm;
  const scale = input.scalePerSurfaceMm ?? DEFAULT_SCALE_PER_SURFACE_MM;
  const minRadial = input.minRadialClearanceMm ?? DEFAULT_MIN_RADIAL_CLEARANCE_MM;
  const maxRadial = input.maxRadialClearanceMm ?? DEFAULT_MAX_RADIAL_CLEARANCE_MM;
  const t0 = move.installTempC;
  const coldC = move.design.coldestAmbientC;

  const state = (name: SlipState['state'], innerC: number, outerC: number): SlipState => {
    const differential = innerD * strainChange(materials.inner, innerC, t0) - outerD * strainChange(materials.outer, outerC, t0);
    const nominal = (input.coldClearanceMm - differential) / 2;
    const scaleLoss = name === 'install' ? 0 : 2 * scale;
    return {
      state: name,
      innerTempC: innerC,
      outerTempC: outerC,
      differentialGrowthMm: differential,
      nominalRadialMm: nominal,
      tightestRadialMm: nominal - toleranceMm - scaleLoss,
      loosestRadialMm: nominal + toleranceMm,
    };
  };
  const states = [state('install', t0, t0), state('hot', input.inner.tempC, input.outer.tempC), state('cold', coldC, coldC)];
  const [install, hot, cold] = states;

  const share = move.design.travelShare;
  const closure = move.hotGrowthMm;
  const drawOut = Math.max(0, -move.coldGrowthMm);
  const requiredGap = Math.max(0, closure) / share;
  const bottomsOut = closure >= input.coldAxialGapMm;
  const hotEngagement = input.coldEngagementMm + Math.min(Math.max(closure, -input.coldEngagementMm), input.coldAxialGapMm);
  const coldestEngagement = input.coldEngagementMm - drawOut;
  const minEngagement = input.minEngagementMm ?? DEFAULT_MIN_ENGAGEMENT_OD_MULTIPLE * innerD;
  const engagementNeeded = minEngagement + drawOut / share;

  // Tolerance on both members and scale spread the radial clearance over a band; the band must fit the window.
  const band = 2 * toleranceMm + 2 * scale;
  const windowFits = band <= maxRadial - minRadial;
  const checks: JointCheck[] = [
    {
      code: 'fit_window',
      ok: windowFits,
      message: windowFits
        ? phrase`The ±${fit(toleranceMm)} tolerance and scale spread the radial clearance over ${fit(band)}, within the ${fit(minRadial)}–${fit(maxRadial)} window`
        : phrase`No cold clearance can work: the ±${fit(toleranceMm)} tolerance and scale spread the radial clearance over ${fit(band)}, wider than the ${fit(minRadial)}–${fit(maxRadial)} window. Size the sleeve to the spigot (expand or machine it) and enter the tolerance of the sized fit`,
    },
    {
      code: 'assembles',
      ok: install.tightestRadialMm >= 0,
      message:
        install.tightestRadialMm >= 0
          ? ['Goes together at install even with both members at the tight end of their tolerance']
          : phrase`May not go together: at the tight end of the ±${fit(toleranceMm)} tolerance the spigot is ${fit(-2 * install.tightestRadialMm)} larger than the bore`,
    },
    ...[hot, cold].flatMap((s): JointCheck[] => {
      const where = s.state === 'hot' ? phrase`Hot,` : phrase`At the coldest start (${quantity('temperature', coldC)}),`;
      return [
        {
          code: `${s.state}_min_clearance`,
          ok: s.tightestRadialMm >= minRadial,
          message:
            s.tightestRadialMm >= minRadial
              ? phrase`${where} the tightest fit keeps ${fit(s.tightestRadialMm)} radial clearance (at least ${fit(minRadial)}): it slides`
              : phrase`${where} the tightest fit keeps ${fit(s.tightestRadialMm)} radial clearance, under the ${fit(minRadial)} minimum: it may seize`,
        },
        {
          code: `${s.state}_max_clearance`,
          ok: s.loosestRadialMm <= maxRadial,
          message:
            s.loosestRadialMm <= maxRadial
              ? phrase`${where} the loosest fit opens to ${fit(s.loosestRadialMm)} radial clearance (at most ${fit(maxRadial)})`
              : phrase`${where} the loosest fit opens to ${fit(s.loosestRadialMm)} radial clearance, over the ${fit(maxRadial)} maximum: it leaks and rattles`,
        },
      ];
    }),
    {
      code: 'axial_gap',
      ok: input.coldAxialGapMm >= requiredGap,
      message:
        input.coldAxialGapMm >= requiredGap
          ? phrase`The ${len(input.coldAxialGapMm)} gap takes the ${travel(closure)} hot closure within ${Math.round(share * 100)} % of its length`
          : bottomsOut
            ? phrase`Bottoms out: the ${travel(closure)} hot closure is more than the ${len(input.coldAxialGapMm)} gap; leave at least ${len(requiredGap)}`
            : phrase`The ${len(input.coldAxialGapMm)} gap is short: the ${travel(closure)} hot closure needs ${len(requiredGap)} at ${Math.round(share * 100)} % use`,
    },
    {
      code: 'engagement',
      ok: input.coldEngagementMm >= engagementNeeded,
      message:
        input.coldEngagementMm >= engagementNeeded
          ? phrase`Keeps ${len(coldestEngagement)} engaged at the coldest start (at least ${len(minEngagement)}, with the draw-out at ${Math.round(share * 100)} % use)`
          : phrase`Engage at least ${len(engagementNeeded)} at install: the spigot draws out ${travel(drawOut)} at the coldest start and at least ${len(minEngagement)} must stay engaged`,
    },
  ];
  return {
    innerDiameterMm: innerD,
    outerDiameterMm: outerD,
    coldClearanceMm: input.coldClearanceMm,
    toleranceMm,
    toleranceNote: input.toleranceMm === undefined ? TUBE_TOLERANCE_NOTE : 'Tolerance as entered for this joint',
    scalePerSurfaceMm: scale,
    scaleNote: SCALE_NOTE,
    minRadialClearanceMm: minRadial,
    maxRadialClearanceMm: maxRadial,
    clearanceLimitsNote: CLEARANCE_LIMITS_NOTE,
    states,
    travelShare: share,
    hotClosureMm: closure,
    coldDrawOutMm: drawOut,
    coldAxialGapMm: input.coldAxialGapMm,
    requiredGapMm: requiredGap,
    bottomsOut,
    coldEngagementMm: input.coldEngagementMm,
    hotEngagementMm: hotEngagement,
    coldestEngagementMm: coldestEngagement,
    minEngagementMm: minEngagement,
    minEngagementNote: MIN_ENGAGEMENT_NOTE,
    checks,
    verdict: checks.every((c) => c.ok) ? 'ok' : 'fails',
  };
}
