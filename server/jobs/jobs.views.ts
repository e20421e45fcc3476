import type { JobSummary, JobTotals, JobView, RunFields, RunView } from '../../shared/schemas/jobs';
import type { Job, JobRun } from './job.entities';
import type { Computed } from './run-results';

export function runFieldsOf(run: JobRun): RunFields {
  return {
    name: run.name,
    alloyId: run.alloyId,
    tube: { odMm: run.odMm, wallMm: run.wallMm },
    installTempC: run.installTempC,
    segments: run.segments,
    startFixing: run.startFixing,
    endFixing: run.endFixing,
    startFlangeAlloyId: run.startFlangeAlloyId ?? null,
    endFlangeAlloyId: run.endFlangeAlloyId ?? null,
    joint: run.joint,
    supports: run.supports ?? [],
    nearby: run.nearby ?? [],
    notes: run.notes,
  };
}

/** A stored run's revision: results computed for it stay good until it changes. */
export function revisionOf(run: JobRun): string {
  return `${run.id}@${new Date(run.updatedAt).getTime()}`;
}

export function runView(run: JobRun, computed: Computed): RunView {
  return {
    id: run.id,
    jobId: run.jobId,
    position: run.position,
    ...runFieldsOf(run),
    ...computed,
    createdAt: run.createdAt.toISOString(),
    updatedAt: run.updatedAt.toISOString(),
  };
}

const basics = (job: Job) => ({
  id: job.id,
  name: job.name,
  customer: job.customer,
  application: job.application,
  status: job.status,
});

export function jobView(job: Job, userNames: Map<string, string>): JobView {
  const creator = job.createdBy ? userNames.get(job.createdBy) : undefined;
  return {
    ...basics(job),
    notes: job.notes,
    createdBy: job.createdBy && creator !== undefined ? { id: job.createdBy, name: creator } : null,
    createdAt: job.createdAt.toISOString(),
    updatedAt: job.updatedAt.toISOString(),
  };
}

export function jobSummary(job: Job, totals: JobTotals): JobSummary {
  return {
    ...basics(job),
    runCount: totals.runCount,
    totalGrowthMm: totals.growthMm,
    totalMassKg: totals.massKg,
    peakTempC: totals.peakTempC,
    runsWithProblems: totals.runsWithProblems,
    updatedAt: job.updatedAt.toISOString(),
  };
}
