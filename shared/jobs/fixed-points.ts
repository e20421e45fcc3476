/**
 * What holds each end of a run. `kind` says what the end does to the tube's growth:
 * `fixed` holds it, `guide` carries the tube but lets it slide, `movement` takes the growth up,
 * `free` lets the end move as it likes.
 */
export type FixingKind = 'fixed' | 'guide' | 'movement' | 'free';

/**
 * What the end does for the system's supports: an `engine` flange (manifold, turbo) is fixed
 * but must not carry the pipe's weight; an `anchor` holds it; a `slide` carries it and lets it
 * move along; a `hanger` carries it flexibly; a `joint` takes the growth; `free` does nothing.
 */
export type FixingRole = 'engine' | 'anchor' | 'slide' | 'hanger' | 'joint' | 'free';

export const FIXED_POINTS = [
  { id: 'flange', label: 'Flange', kind: 'fixed', role: 'anchor' },
  { id: 'manifold_flange', label: 'Manifold flange', kind: 'fixed', role: 'engine' },
  { id: 'turbo_inlet', label: 'Turbo inlet flange', kind: 'fixed', role: 'engine' },
  { id: 'turbo_outlet', label: 'Turbo outlet', kind: 'fixed', role: 'engine' },
  { id: 'v_band', label: 'V-band clamp', kind: 'fixed', role: 'anchor' },
  { id: 'anchor_bracket', label: 'Anchor bracket', kind: 'fixed', role: 'anchor' },
  { id: 'equipment_nozzle', label: 'Equipment nozzle', kind: 'fixed', role: 'anchor' },
  { id: 'sliding_bracket', label: 'Sliding bracket', kind: 'guide', role: 'slide' },
  { id: 'isolator_hanger', label: 'Isolator hanger', kind: 'guide', role: 'hanger' },
  { id: 'flex_section', label: 'Flex section', kind: 'movement', role: 'joint' },
  { id: 'slip_joint', label: 'Slip joint', kind: 'movement', role: 'joint' },
  { id: 'free_end', label: 'Free end', kind: 'free', role: 'free' },
] as const satisfies readonly { id: string; label: string; kind: FixingKind; role: FixingRole }[];

export type FixedPointId = (typeof FIXED_POINTS)[number]['id'];

export const FIXED_POINT_IDS = FIXED_POINTS.map((p) => p.id) as [FixedPointId, ...FixedPointId[]];

const BY_ID = new Map<string, (typeof FIXED_POINTS)[number]>(FIXED_POINTS.map((p) => [p.id, p]));

export function fixedPointLabel(id: FixedPointId): string {
  return BY_ID.get(id)?.label ?? id;
}

export function fixedPointKind(id: FixedPointId): FixingKind {
  return BY_ID.get(id)?.kind ?? 'fixed';
}

export function fixedPointRole(id: FixedPointId): FixingRole {
  return BY_ID.get(id)?.role ?? 'anchor';
}

/** Roles that carry the pipe's weight at that point. */
export const CARRYING_ROLES: readonly FixingRole[] = ['anchor', 'slide', 'hanger'];

/**
 * True when nothing in the run takes up its growth: both ends hold the tube and no joint is fitted,
 * so the growth turns into the restrained stress the result reports.
 */
export function isRestrained(startFixing: FixedPointId, endFixing: FixedPointId, jointType: 'none' | 'flex' | 'slip'): boolean {
  return jointType === 'none' && fixedPointKind(startFixing) === 'fixed' && fixedPointKind(endFixing) === 'fixed';
}
