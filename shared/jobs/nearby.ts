/** What can sit near a hot pipe, and the hot gap a shop keeps to each by default. */
export const NEARBY_KINDS = ['fuel_line', 'brake_line', 'wiring', 'rubber', 'panel', 'other'] as const;
export type NearbyKind = (typeof NEARBY_KINDS)[number];

export const NEARBY_LABELS: Record<NearbyKind, string> = {
  fuel_line: 'Fuel line',
  brake_line: 'Brake line',
  wiring: 'Wiring',
  rubber: 'Rubber boot or mount',
  panel: 'Floor or body panel',
  other: 'Other',
};

/**
 * Hot gap kept to each kind without a heat shield. Common practice, no published source: the
 * trade keeps fuel and brake lines and wiring about 150 mm from an unshielded exhaust, rubber
 * about 100 mm, and panels about 25 mm with an air gap. A shop setting; local codes and the
 * vehicle or equipment maker's rules come first.
 */
export const DEFAULT_NEARBY_MINIMUMS_MM: Record<NearbyKind, number> = {
  fuel_line: 150,
  brake_line: 150,
  wiring: 150,
  rubber: 100,
  panel: 25,
  other: 50,
};

export const NEARBY_MINIMUMS_NOTE = 'Minimum hot gaps per kind: a shop setting; the defaults are common practice, no published source';

/** Fuel and brake lines near exhaust skins are a fire risk, not only a wear risk. */
export const FIRE_RISK_KINDS: readonly NearbyKind[] = ['fuel_line', 'brake_line'];
