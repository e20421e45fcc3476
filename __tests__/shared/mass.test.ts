import { materialCost, tubeMassPerMetreKg } from '../../shared/engine/mass';
import { inToMm } from '../../shared/units';

describe('tube mass per metre, m = ρ·π·(OD − t)·t (reference-data §6, derived)', () => {
  it.each([
    // [OD in, wall in, ρ kg/m³ (304 8000, carbon steel 7850, Alloy 625 8440, Ti Gr 2 4510), kg/m from the §6 table]
    [3.0, 0.065, 8000, 3.0933],
    [3.0, 0.065, 4510, 1.7439],
    [2.0, 0.049, 8000, 1.5501],
    [2.5, 0.065, 7850, 2.5183],
    [3.5, 0.065, 8440, 3.8194],
    [4.0, 0.083, 8000, 5.2716],
    [4.0, 0.083, 4510, 2.9718],
  ])('when the tube is %s in × %s in at ρ = %s, then it weighs %s kg/m', (od, wall, rho, want) => {
    expect(tubeMassPerMetreKg({ odMm: inToMm(od), wallMm: inToMm(wall) }, rho)).toBeCloseTo(want, 3);
  });

  it('when priced, then cost is mass × price per kg', () => {
    expect(materialCost(3.0933, 5.2)).toBeCloseTo(3.0933 * 5.2, 12);
  });
});
