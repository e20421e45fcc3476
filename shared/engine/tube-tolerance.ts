/**
 * Permissible variation in outside diameter of austenitic stainless tube, ASTM A269 (seamless
 * and welded tubing for general service), by nominal OD. From memory, to be verified against
 * the standard's table; ASTM A554 (welded mechanical tubing) gives tolerances of the same order.
 * Upper bounds are exclusive, in inches as the standard gives them.
 */
const A269_OD_TOLERANCE_IN: { belowIn: number; plusMinusIn: number }[] = [
  { belowIn: 1.5, plusMinusIn: 0.005 },
  { belowIn: 3.5, plusMinusIn: 0.01 },
  { belowIn: 5.5, plusMinusIn: 0.015 },
  { belowIn: 8, plusMinusIn: 0.03 },
  { belowIn: 12, plusMinusIn: 0.04 },
  { belowIn: 14, plusMinusIn: 0.05 },
];

const MM_PER_IN = 25.4;

export const TUBE_TOLERANCE_NOTE =
  '± on the spigot OD and the sleeve bore; default from the OD tolerance of ASTM A269 for the tube size (from memory, to be verified). Enter your own where the fit is sized or measured';

/** ± tolerance in mm for a tube of this OD, or null above the table. */
export function standardOdToleranceMm(odMm: number): number | null {
  const odIn = odMm / MM_PER_IN;
  const row = A269_OD_TOLERANCE_IN.find((r) => odIn < r.belowIn);
  return row ? row.plusMinusIn * MM_PER_IN : null;
}

/** Oxide scale allowed for on each sliding surface. Common practice, no published source. */
export const DEFAULT_SCALE_PER_SURFACE_MM = 0.025;
export const SCALE_NOTE = 'Oxide scale on each sliding surface in service: common practice, no published source';

/**
 * Radial clearance a sliding fit should keep in its tightest case, and not exceed in its
 * loosest (beyond it the joint leaks and rattles). Common practice, no published source.
 */
export const DEFAULT_MIN_RADIAL_CLEARANCE_MM = 0.05;
export const DEFAULT_MAX_RADIAL_CLEARANCE_MM = 0.25;
export const CLEARANCE_LIMITS_NOTE = 'Radial clearance limits: common practice, no published source';
