import { BWG_WALL_IN } from '../units';

/** Exhaust tube is sold by outside diameter in inches and wall by BWG gauge. */
export const TUBE_OD_IN = [1.5, 1.75, 2, 2.25, 2.5, 2.75, 3, 3.5, 4, 5, 6] as const;
export const TUBE_WALL_GAUGES = [18, 16, 14] as const;

export interface TubePreset {
  /** e.g. "2.5 in × 16 ga" */
  label: string;
  odIn: number;
  gauge: number;
  odMm: number;
  wallMm: number;
}

/** 1 in = 25.4 mm exactly; convert-units is off in the 8th figure, so presets do not go through it. */
const inchToMm = (inch: number, decimals: number) => Math.round(inch * 25.4 * 10 ** decimals) / 10 ** decimals;

export const TUBE_PRESETS: readonly TubePreset[] = TUBE_OD_IN.flatMap((odIn) =>
  TUBE_WALL_GAUGES.map((gauge) => ({
    label: `${odIn} in × ${gauge} ga`,
    odIn,
    gauge,
    odMm: inchToMm(odIn, 6),
    wallMm: inchToMm(BWG_WALL_IN[gauge], 3),
  })),
);

/** The preset a tube matches (within 0.01 mm on both), or null for a free-entry size. */
export function matchTubePreset(odMm: number, wallMm: number): TubePreset | null {
  return TUBE_PRESETS.find((p) => Math.abs(p.odMm - odMm) <= 0.01 && Math.abs(p.wallMm - wallMm) <= 0.01) ?? null;
}
