import { angularEquivalentMm, EJMA_RELATION_NOTE, lateralEquivalentMm } from '../../shared/engine/ejma';

/**
 * The equivalent-movement relations checked against the mechanics they come from, computed
 * here from first principles rather than from the product's formula:
 * - lateral: a length L held square at both ends and offset sideways by y bends like a
 *   fixed–guided beam, end moment M = 6·E·I·y/L² (Roark's Formulas for Stress and Strain,
 *   beam with both ends fixed and one end displaced; from memory of the textbook's case), so
 *   the end curvature is κ = M/(E·I) = 6y/L² and the strain at radius D_m/2 is κ·D_m/2.
 *   Summed over the convolutions of pitch L/N that is κ·(D_m/2)·L of axial movement.
 * - angular: turning the ends by θ stretches the line at radius D_m/2 by the arc θ·D_m/2.
 */
describe('EJMA equivalent axial movement (beam theory and geometry)', () => {
  it('when a 60 mm bellows of 80 mm mean diameter is offset 2 mm, then the equivalent is the fixed–guided beam strain summed over its length', () => {
    const [dm, lb, y] = [80, 60, 2];
    const endCurvature = (6 * y) / (lb * lb); // Roark, fixed–guided beam
    const beam = endCurvature * (dm / 2) * lb;
    expect(lateralEquivalentMm(dm, lb, y, 0)).toBeCloseTo(beam, 12);
    // reference-data §4.3 worked example (derived): 0.80 mm per convolution × 10 convolutions.
    expect(lateralEquivalentMm(dm, lb, y, 0)).toBeCloseTo(8.0, 12);
  });

  it('when the same bellows is compressed 6 mm first, then its shorter length makes the lateral term larger (L_b − x)', () => {
    expect(lateralEquivalentMm(80, 60, 2, -6)).toBeCloseTo((3 * 80 * 2) / 54, 12);
    expect(lateralEquivalentMm(80, 60, 2, 6)).toBeCloseTo((3 * 80 * 2) / 66, 12);
  });

  it('when the ends turn by 2°, then the equivalent is the arc at the mean radius', () => {
    const arc = ((2 * Math.PI) / 180) * (80 / 2);
    expect(angularEquivalentMm(80, 2)).toBeCloseTo(arc, 12);
    // reference-data §4.3 worked example (derived): 0.140 mm per convolution × 10.
    expect(angularEquivalentMm(80, 2)).toBeCloseTo(1.396, 3);
  });

  it('when no lateral or angular movement is given, then nothing is added', () => {
    expect(lateralEquivalentMm(80, 60, 0, -100)).toBe(0);
    expect(angularEquivalentMm(80, 0)).toBe(0);
  });

  it('when shown, then the relation names the EJMA Standards and says it is recalled, to verify', () => {
    expect(EJMA_RELATION_NOTE).toMatch(/EJMA Standards/);
    expect(EJMA_RELATION_NOTE).toMatch(/from memory; verify/);
  });
});
