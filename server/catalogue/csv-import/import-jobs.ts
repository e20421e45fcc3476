import { randomUUID } from 'node:crypto';
import type { ImportJobView, ImportReport } from '../../../shared/catalogue/catalogue-csv';
import { AppError } from '../../http/app-error';
import { isUniqueViolation } from '../../db/errors';
import { build } from '../../db/store';
import { ImportJobRow } from './import-job.entity';
import type { ImportJobRepository } from './import-job.repository';

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

type Job = Pick<ImportJobRow, 'id' | 'phase' | 'done' | 'total' | 'startedAt' | 'finishedAt' | 'startedBy' | 'report' | 'error'>;

/** Progress is written at most this often while an import runs (phase changes and the end at once). */
const WRITE_EVERY_MS = 200;
/** A running import whose instance stopped writing this long ago is taken as dead. */
const STALE_MS = 10 * 60 * 1000;
const RUNNING = 'one';

/**
 * Imports running in the background and those finished within the hour, in the database so any app
 * instance answers the client's polling: an import's writes are in the database as each batch commits;
 * its progress row is written by the instance running it, at most every 200 ms.
 */
export class ImportJobs {
  constructor(private readonly rows: ImportJobRepository) {}

  async start(startedBy: string | null, work: (progress: Progress) => Promise<ImportReport>): Promise<ImportJobView> {
    await this.rows.forgetFinishedBefore(new Date(Date.now() - KEEP_FINISHED_MS));
    await this.failIfStale();
    const now = new Date();
    const job: Job = { id: randomUUID(), phase: 'reading', done: 0, total: 1, startedAt: now, finishedAt: null, startedBy, report: null, error: null };
    try {
      await this.rows.insert(build(ImportJobRow, { ...job, runningSlot: RUNNING, updatedAt: now }));
    } catch (err) {
      if (!isUniqueViolation(err)) throw err;
      const running = await this.rows.running();
      throw AppError.conflict('import_running', `Another import${running?.startedBy ? ` (started by ${running.startedBy})` : ''} is still running; wait for it to finish.`);
    }
    const writer = new ProgressWriter(this.rows, job);
    const progress: Progress = {
      phase: (phase, done, total) => {
        const changed = phase !== job.phase;
        Object.assign(job, { phase, done, total: Math.max(total, 1) });
        writer.soon(changed);
      },
    };
    work(progress).then(
      (report) => writer.finish({ phase: 'done', done: job.total, report }),
      (err: unknown) => {
        console.error('[dilato] CSV import failed:', err);
        const message = err instanceof AppError ? err.message : 'The import stopped on a server fault; alloys written before it stay as drafts.';
        return writer.finish({ phase: 'failed', error: message });
      },
    );
    return view(job);
  }

  async get(id: string): Promise<ImportJobView> {
    const job = await this.rows.find(id);
    if (!job) throw AppError.notFound('There is no such import (finished imports are kept for an hour).');
    return view(job);
  }

  private async failIfStale() {
    const running = await this.rows.running();
    if (running && running.updatedAt.getTime() < Date.now() - STALE_MS) {
      await this.rows.update(running.id, { phase: 'failed', runningSlot: null, finishedAt: new Date(), error: 'The import stopped when its server stopped; alloys written before it stay as drafts.' });
    }
  }
}

/** Writes one job's progress row without flooding the database: one write in flight, the latest state wins. */
class ProgressWriter {
  private pending: NodeJS.Timeout | null = null;
  private chain: Promise<unknown> = Promise.resolve();

  constructor(
    private readonly rows: ImportJobRepository,
    private readonly job: Job,
  ) {}

  soon(now: boolean) {
    if (now) return this.flush();
    this.pending ??= setTimeout(() => this.flush(), WRITE_EVERY_MS);
  }

  finish(fields: Partial<Job>): Promise<unknown> {
    Object.assign(this.job, fields, { finishedAt: new Date() });
    return this.flush({ runningSlot: null });
  }

  private flush(extra: Partial<ImportJobRow> = {}): Promise<unknown> {
    if (this.pending) clearTimeout(this.pending);
    this.pending = null;
    const { phase, done, total, report, error, finishedAt } = this.job;
    const fields = { phase, done, total, report, error, finishedAt, updatedAt: new Date(), ...extra };
    this.chain = this.chain.then(() => this.rows.update(this.job.id, fields)).catch((err) => console.error('[dilato] import progress not written:', err));
    return this.chain;
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
