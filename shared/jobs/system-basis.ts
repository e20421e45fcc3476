import { DEFAULT_NEARBY_MINIMUMS_MM, type NearbyKind } from './nearby';

/** The shop's rules for supports and clearances, from its settings. */
export interface SystemBasis {
  supportNearJointMm: number;
  engineSupportMm: number;
  nearbyMinimumsMm: Record<NearbyKind, number>;
}

/**
 * Defaults, common practice with no published source: a support within about 150 mm of each
 * side of a flex or slip joint so the joint never carries weight, and the first support within
 * about 300 mm of a turbo or manifold flange. That the exhaust's weight must never hang on the
 * turbocharger outlet is published guidance (a generator-set maker's installation manual); the
 * distance is the shop's.
 */
export const DEFAULT_SYSTEM_BASIS: SystemBasis = {
  supportNearJointMm: 150,
  engineSupportMm: 300,
  nearbyMinimumsMm: DEFAULT_NEARBY_MINIMUMS_MM,
};

export const SYSTEM_BASIS_NOTES = [
  'Support distances: a shop setting; the defaults are common practice, no published source',
  'The turbo or manifold flange must not carry the pipe’s weight: published guidance in engine and generator-set installation manuals',
];
