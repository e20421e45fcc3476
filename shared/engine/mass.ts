import type { Tube } from './types';

/** Mass of a round tube, ρ·π·(OD − t)·t·L, from mm and kg/m³. */
export function tubeMassKg(tube: Tube, lengthMm: number, densityKgM3: number): number {
  const meanDiameterM = (tube.odMm - tube.wallMm) / 1000;
  const wallM = tube.wallMm / 1000;
  return densityKgM3 * Math.PI * meanDiameterM * wallM * (lengthMm / 1000);
}

export function tubeMassPerMetreKg(tube: Tube, densityKgM3: number): number {
  return tubeMassKg(tube, 1000, densityKgM3);
}

export function materialCost(massKg: number, pricePerKg: number): number {
  return massKg * pricePerKg;
}
