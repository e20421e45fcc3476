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

const f = (x: number, d = 2) => (Math.round(x * 10 ** d) / 10 ** d).toString();

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
        ? `The ±${f(toleranceMm, 3)} mm tolerance and scale spread the radial clearance over ${f(band, 3)} mm, within the ${f(minRadial, 3)}–${f(maxRadial, 3)} mm window`
        : `No cold clearance can work: the ±${f(toleranceMm, 3)} mm tolerance and scale spread the radial clearance over ${f(band, 3)} mm, wider than the ${f(minRadial, 3)}–${f(maxRadial, 3)} mm window. Size the sleeve to the spigot (expand or machine it) and enter the tolerance of the sized fit`,
    },
    {
      code: 'assembles',
      ok: install.tightestRadialMm >= 0,
      message:
        install.tightestRadialMm >= 0
          ? 'Goes together at install even with both members at the tight end of their tolerance'
          : `May not go together: at the tight end of the ±${f(toleranceMm, 3)} mm tolerance the spigot is ${f(-2 * install.tightestRadialMm, 3)} mm larger than the bore`,
    },
    ...[hot, cold].flatMap((s): JointCheck[] => {
      const where = s.state === 'hot' ? 'Hot,' : `At the coldest start (${f(coldC, 0)} °C),`;
      return [
        {
          code: `${s.state}_min_clearance`,
          ok: s.tightestRadialMm >= minRadial,
          message:
            s.tightestRadialMm >= minRadial
              ? `${where} the tightest fit keeps ${f(s.tightestRadialMm, 3)} mm radial clearance (at least ${f(minRadial, 3)} mm): it slides`
              : `${where} the tightest fit keeps ${f(s.tightestRadialMm, 3)} mm radial clearance, under the ${f(minRadial, 3)} mm minimum: it may seize`,
        },
        {
          code: `${s.state}_max_clearance`,
          ok: s.loosestRadialMm <= maxRadial,
          message:
            s.loosestRadialMm <= maxRadial
              ? `${where} the loosest fit opens to ${f(s.loosestRadialMm, 3)} mm radial clearance (at most ${f(maxRadial, 3)} mm)`
              : `${where} the loosest fit opens to ${f(s.loosestRadialMm, 3)} mm radial clearance, over the ${f(maxRadial, 3)} mm maximum: it leaks and rattles`,
        },
      ];
    }),
    {
      code: 'axial_gap',
      ok: input.coldAxialGapMm >= requiredGap,
      message:
        input.coldAxialGapMm >= requiredGap
          ? `The ${f(input.coldAxialGapMm, 1)} mm gap takes the ${f(closure)} mm hot closure within ${Math.round(share * 100)} % of its length`
          : bottomsOut
            ? `Bottoms out: the ${f(closure)} mm hot closure is more than the ${f(input.coldAxialGapMm, 1)} mm gap; leave at least ${f(requiredGap, 1)} mm`
            : `The ${f(input.coldAxialGapMm, 1)} mm gap is short: the ${f(closure)} mm hot closure needs ${f(requiredGap, 1)} mm at ${Math.round(share * 100)} % use`,
    },
    {
      code: 'engagement',
      ok: input.coldEngagementMm >= engagementNeeded,
      message:
        input.coldEngagementMm >= engagementNeeded
          ? `Keeps ${f(coldestEngagement, 1)} mm engaged at the coldest start (at least ${f(minEngagement, 1)} mm, with the draw-out at ${Math.round(share * 100)} % use)`
          : `Engage at least ${f(engagementNeeded, 1)} mm at install: the spigot draws out ${f(drawOut)} mm at the coldest start and at least ${f(minEngagement, 1)} mm must stay engaged`,
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
