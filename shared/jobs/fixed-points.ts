/**
 * What holds each end of a run. `kind` says what the end does to the tube's growth:
 * `fixed` holds it, `guide` carries the tube but lets it slide, `movement` takes the growth up,
 * `free` lets the end move as it likes.
 */
export type FixingKind = 'fixed' | 'guide' | 'movement' | 'free';

export const FIXED_POINTS = [
  { id: 'flange', label: 'Flange', kind: 'fixed' },
  { id: 'manifold_flange', label: 'Manifold flange', kind: 'fixed' },
  { id: 'turbo_inlet', label: 'Turbo inlet flange', kind: 'fixed' },
  { id: 'turbo_outlet', label: 'Turbo outlet', kind: 'fixed' },
  { id: 'v_band', label: 'V-band clamp', kind: 'fixed' },
  { id: 'anchor_bracket', label: 'Anchor bracket', kind: 'fixed' },
  { id: 'equipment_nozzle', label: 'Equipment nozzle', kind: 'fixed' },
  { id: 'sliding_bracket', label: 'Sliding bracket', kind: 'guide' },
  { id: 'isolator_hanger', label: 'Isolator hanger', kind: 'guide' },
  { id: 'flex_section', label: 'Flex section', kind: 'movement' },
  { id: 'slip_joint', label: 'Slip joint', kind: 'movement' },
  { id: 'free_end', label: 'Free end', kind: 'free' },
] as const satisfies readonly { id: string; label: string; kind: FixingKind }[];

export type FixedPointId = (typeof FIXED_POINTS)[number]['id'];

export const FIXED_POINT_IDS = FIXED_POINTS.map((p) => p.id) as [FixedPointId, ...FixedPointId[]];

const BY_ID = new Map<string, (typeof FIXED_POINTS)[number]>(FIXED_POINTS.map((p) => [p.id, p]));

export function fixedPointLabel(id: FixedPointId): string {
  return BY_ID.get(id)?.label ?? id;
}

export function fixedPointKind(id: FixedPointId): FixingKind {
  return BY_ID.get(id)?.kind ?? 'fixed';
}

/**
 * True when nothing in the run takes up its growth: both ends hold the tube and no joint is fitted,
 * so the growth turns into the restrained stress the result reports.
 */
export function isRestrained(startFixing: FixedPointId, endFixing: FixedPointId, jointType: 'none' | 'flex' | 'slip'): boolean {
  return jointType === 'none' && fixedPointKind(startFixing) === 'fixed' && fixedPointKind(endFixing) === 'fixed';
}
