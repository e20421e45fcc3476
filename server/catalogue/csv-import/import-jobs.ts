import { randomUUID } from 'node:crypto';
import type { ImportJobView, ImportPhase, ImportReport } from '../../../shared/catalogue/catalogue-csv';
import { AppError } from '../../http/app-error';

/** Each phase's share of the whole bar (reading is quick, writing is most of the work). */
const PHASE_SPAN: Record<'reading' | 'checking' | 'writing', [number, number]> = {
  reading: [0, 0.1],
  checking: [0.1, 0.2],
  writing: [0.2, 1],
};
const KEEP_FINISHED_MS = 60 * 60 * 1000;

export interface Progress {
  phase(phase: 'reading' | 'checking' | 'writing', done: number, total: number): void;
}

interface Job {
  id: string;
  phase: ImportPhase;
  done: number;
  total: number;
  startedAt: Date;
  finishedAt: Date | null;
  startedBy: string | null;
  report: ImportReport | null;
  error: string | null;
}

/**
 * Imports running in the background and those finished within the hour, in memory: an import's
 * writes are in the database as each batch commits; only its progress would be lost on a restart.
 */
export class ImportJobs {
  private readonly jobs = new Map<string, Job>();

  start(startedBy: string | null, work: (progress: Progress) => Promise<ImportReport>): ImportJobView {
    this.forgetOld();
    const running = [...this.jobs.values()].find((j) => j.phase !== 'done' && j.phase !== 'failed');
    if (running) {
      throw AppError.conflict('import_running', `Another import${running.startedBy ? ` (started by ${running.startedBy})` : ''} is still running; wait for it to finish.`);
    }
    const job: Job = { id: randomUUID(), phase: 'reading', done: 0, total: 1, startedAt: new Date(), finishedAt: null, startedBy, report: null, error: null };
    this.jobs.set(job.id, job);
    const progress: Progress = {
      phase: (phase, done, total) => Object.assign(job, { phase, done, total: Math.max(total, 1) }),
    };
    work(progress).then(
      (report) => Object.assign(job, { phase: 'done', done: job.total, report, finishedAt: new Date() }),
      (err: unknown) => {
        console.error('[dilato] CSV import failed:', err);
        const message = err instanceof AppError ? err.message : 'The import stopped on a server fault; alloys written before it stay as drafts.';
        Object.assign(job, { phase: 'failed', error: message, finishedAt: new Date() });
      },
    );
    return view(job);
  }

  get(id: string): ImportJobView {
    const job = this.jobs.get(id);
    if (!job) throw AppError.notFound('There is no such import (finished imports are kept for an hour).');
    return view(job);
  }

  private forgetOld() {
    const cutoff = Date.now() - KEEP_FINISHED_MS;
    for (const [id, job] of this.jobs) if (job.finishedAt && job.finishedAt.getTime() < cutoff) this.jobs.delete(id);
  }
}

function view(job: Job): ImportJobView {
  let fraction = 1;
  if (job.phase === 'reading' || job.phase === 'checking' || job.phase === 'writing') {
    const [from, to] = PHASE_SPAN[job.phase];
    fraction = from + (to - from) * Math.min(1, job.done / job.total);
  }
  return {
    id: job.id,
    phase: job.phase,
    done: job.done,
    total: job.total,
    fraction,
    startedAt: job.startedAt.toISOString(),
    finishedAt: job.finishedAt?.toISOString() ?? null,
    startedBy: job.startedBy,
    report: job.report,
    error: job.error,
  };
}
