/**
 * Bellows movement relations of the EJMA Standards (Expansion Joint Manufacturers Association,
 * 10th edition, equivalent axial movement per convolution), recalled from memory and checked
 * against the beam theory they come from; verify against the standard before relying on them:
 *
 *   e_x = x / N                 axial
 *   e_y = 3·D_m·y / (N·(L_b ± x)) lateral offset y of a single bellows (+ extended, − compressed)
 *   e_θ = D_m·θ / (2·N)          angular rotation θ in radians
 *
 * Summed over the N convolutions the convolution count drops out, so a part rated by its
 * maker in millimetres of axial travel can be checked against the whole equivalent movement:
 *   X = x + 3·D_m·y / (L_b ± x) + D_m·θ / 2.
 * The lateral term is the bending strain at radius D_m/2 of a length L_b held square at both
 * ends and offset by y (curvature 6y/L_b² at the ends); the angular term is the stretch of the
 * outermost convolution line when the ends turn by θ.
 */
export const EJMA_RELATION_NOTE =
  'Lateral offset and rotation are turned into equivalent axial movement with the single-bellows relations of the EJMA Standards (10th ed.): X = x + 3·Dm·y/(Lb ± x) + Dm·θ/2, recalled from memory; verify against the standard and the part maker’s rating';

/**
 * Mean diameter assumed when the maker gives none: 1.15 × bore. Our assumption, no published
 * source; exhaust bellows have convolutions roughly 5–15 % of the bore deep, and a larger
 * D_m overstates the equivalent movement, which errs towards "does not fit".
 */
export const ESTIMATED_MEAN_DIAMETER_FACTOR = 1.15;

/** Lateral offset y as equivalent axial movement, at axial position `positionMm` (+ extended). */
export function lateralEquivalentMm(meanDiameterMm: number, liveLengthMm: number, lateralMm: number, positionMm: number): number {
  if (lateralMm === 0) return 0;
  // A part pushed past its whole live length is far out of range anyway; keep the figure finite.
  const length = Math.max(liveLengthMm + positionMm, 1e-3 * liveLengthMm);
  return (3 * meanDiameterMm * Math.abs(lateralMm)) / length;
}

/** Angular rotation as equivalent axial movement. */
export function angularEquivalentMm(meanDiameterMm: number, rotationDeg: number): number {
  return (meanDiameterMm * Math.abs(rotationDeg) * Math.PI) / 360;
}
