import { TUBE_PRESETS } from '../../shared/jobs/tube-presets';
import type { RunFields, RunView } from '../../shared/schemas/jobs';

const DEFAULT_TUBE = TUBE_PRESETS.find((p) => p.odIn === 2.5 && p.gauge === 16) ?? TUBE_PRESETS[0];

/**
 * A new run starts where the last one ended: its alloy, tube and end temperature, so a system
 * is entered from the hottest run down with little typing.
 */
export function newRunFields(runs: RunView[]): RunFields {
  const last = runs[runs.length - 1];
  const lastSegment = last?.segments[last.segments.length - 1];
  const startC = lastSegment ? lastSegment.endTempC : 600;
  return {
    name: `Run ${runs.length + 1}`,
    alloyId: last?.alloyId ?? '',
    tube: last ? { ...last.tube } : { odMm: DEFAULT_TUBE.odMm, wallMm: DEFAULT_TUBE.wallMm },
    installTempC: last?.installTempC ?? 20,
    segments: [{ lengthMm: 500, startTempC: startC, endTempC: startC }],
    startFixing: last?.endFixing ?? 'flange',
    endFixing: 'flange',
    startFlangeAlloyId: null,
    endFlangeAlloyId: null,
    joint: { type: 'none' },
    supports: [],
    nearby: [],
    notes: '',
  };
}

/** The inputs of a saved run, without what the server adds. */
export function fieldsOf(run: RunView): RunFields {
  const { id: _id, jobId: _job, position: _p, alloy: _a, result: _r, problem: _pr, currency: _c, createdAt: _ca, updatedAt: _ua, ...fields } = run;
  return fields;
}
