import { MIN_TEMP_C } from '../engine/expansion';

/**
 * Physical bounds on what a run, a joint or a flex part can be. Past these an input is a typing
 * slip, not hot-section pipework: the schemas refuse it with a field message and nothing is saved.
 */
export const BOUNDS = {
  /** Above this every alloy in the trade has lost its strength or melted. */
  maxRunTempC: 1300,
  minRunTempC: MIN_TEMP_C,
  maxSegmentMm: 50_000,
  maxOdMm: 2000,
  maxWallMm: 100,
  maxClearanceMm: 20,
  maxEngagementMm: 2000,
  maxGapMm: 1000,
  maxToleranceMm: 5,
  maxScaleMm: 1,
  maxRadialClearanceMm: 10,
  maxLateralMm: 500,
  maxRotationDeg: 45,
  maxHeatCycles: 100_000_000,
} as const;
