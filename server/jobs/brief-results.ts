import type { RunView } from '../../shared/schemas/jobs';

/**
 * A run as the job page draws it: the run's growth curve (the system drawing reads it) but not the
 * growth-per-metre curve or every flex candidate, which only the run's own page shows.
 */
export function briefRun(run: RunView): RunView {
  if (!run.result) return run;
  const { result } = run;
  return {
    ...run,
    result: {
      ...result,
      growthPerMetreCurve: [],
      ...(result.flex ? { flex: { ...result.flex, candidates: [] } } : {}),
    },
  };
}
