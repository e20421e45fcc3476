import type { CurvePoint, RunResult } from '../../shared/engine/types';
import type { RunView } from '../../shared/schemas/jobs';

/** About as many points along a run as the job page's drawing can show apart. */
const DRAWN_POINTS = 26;
const round = (x: number, places: number) => Math.round(x * 10 ** places) / 10 ** places;

/**
 * The growth curve at the drawing's resolution: every few points, both ends, and both points at each
 * segment joint (where the temperature may step); distances and temperatures to 0.1, growth to 0.001 mm.
 */
export function drawnCurve(curve: CurvePoint[]): CurvePoint[] {
  const every = Math.max(1, Math.ceil(curve.length / DRAWN_POINTS));
  const atJoint = (i: number) => curve[i - 1]?.atMm === curve[i].atMm || curve[i + 1]?.atMm === curve[i].atMm;
  return curve
    .filter((_, i) => i % every === 0 || i === curve.length - 1 || atJoint(i))
    .map((p) => ({ atMm: round(p.atMm, 1), tempC: round(p.tempC, 1), growthMm: round(p.growthMm, 3) }));
}

/**
 * A result as a drawing shows it: the growth curve at the drawing's resolution, without the
 * growth-per-metre curve or every flex candidate (the chosen part stays).
 */
export function briefResult<R extends RunResult>(result: R): R {
  return {
    ...result,
    curve: drawnCurve(result.curve),
    growthPerMetreCurve: [],
    ...(result.flex ? { flex: { ...result.flex, candidates: [] } } : {}),
  };
}

/** A run as the job page draws it; only the run's own page shows the full curves and candidates. */
export function briefRun(run: RunView): RunView {
  return run.result ? { ...run, result: briefResult(run.result) } : run;
}
