import { randomUUID } from 'node:crypto';
import { jobTotals } from '../../shared/jobs/job-totals';
import { checkSystem } from '../../shared/jobs/system-check';
import type { PublicUser } from '../../shared/schemas/auth';
import {
  runFieldsSchema,
  type CompareView,
  type JobCreateInput,
  type JobDetail,
  type JobListQuery,
  type JobPatchInput,
  type RunCreateInput,
  type RunFields,
  type RunOrderInput,
  type RunPatchInput,
  type RunView,
} from '../../shared/schemas/jobs';
import type { ActivityView } from '../../shared/schemas/activity';
import type { ActivityActor } from '../activity/activity.repository';
import { activityView, changesBetween } from '../activity/activity.views';
import { AppError } from '../http/app-error';
import { fieldsFromZod } from '../http/validate';
import { Job, JobRun } from './job.entities';
import type { JobsRepository, JobsStore } from './jobs.repository';
import { briefRun } from './brief-results';
import { jobView, revisionOf, runFieldsOf, runView } from './jobs.views';
import type { ResultSession, RunResults } from './run-results';
import { JobAnswers } from './job-answers';
import { JobList, type JobPage } from './job-list';
import { compareAlloys } from './run-compare';
import { laterThan } from './revision-time';

/** Gives runs positions 1..n in the order given; returns the runs whose position changed. */
function renumber(runs: JobRun[]): JobRun[] {
  const changed: JobRun[] = [];
  runs.forEach((run, i) => {
    if (run.position !== i + 1) {
      run.position = i + 1;
      changed.push(run);
    }
  });
  return changed;
}

export class JobsService {
  constructor(
    private readonly store: JobsStore,
    private readonly results: RunResults,
  ) {
    this.lists = new JobList(store, results);
  }

  private readonly answers = new JobAnswers();
  /** Pages of the job list and their answers. */
  readonly lists: JobList;

  // ---- reading ----

  private async computeAll(session: ResultSession, runs: JobRun[]): Promise<RunView[]> {
    return Promise.all(runs.map((run) => this.answer(session, run)));
  }

  /** One page of jobs (see JobList). */
  list(query: JobListQuery): Promise<JobPage> {
    return this.lists.list(query);
  }

  /** `GET /api/jobs/:id`'s answer as JSON text, kept while nothing it rests on has changed (see JobAnswers). */
  async detailJson(id: string, full = false): Promise<string> {
    const repo = this.store.read();
    const job = await this.jobIn(repo, id);
    const names = await repo.userNames(job.createdBy ? [job.createdBy] : []);
    const session = this.results.session();
    const creator = job.createdBy ? (names.get(job.createdBy) ?? '') : '';
    return this.answers.get(job, creator, full, session, () => this.detailOf(repo, job, names, session, full));
  }

  private async detailIn(repo: JobsRepository, job: Job, full = false): Promise<JobDetail> {
    const names = await repo.userNames(job.createdBy ? [job.createdBy] : []);
    return this.detailOf(repo, job, names, this.results.session(), full);
  }

  private async detailOf(repo: JobsRepository, job: Job, names: Map<string, string>, session: ResultSession, full: boolean): Promise<JobDetail> {
    const runs = await repo.runsOf(job.id);
    const views = await this.computeAll(session, runs);
    return {
      ...jobView(job, names),
      runs: full ? views : views.map(briefRun),
      totals: jobTotals(views),
      system: checkSystem(views, await session.systemBasis()),
      resultDetail: full ? 'full' : 'brief',
    };
  }

  private async jobIn(repo: JobsRepository, id: string): Promise<Job> {
    const job = await repo.findJob(id);
    if (!job) throw AppError.notFound('There is no such job.');
    return job;
  }

  private async runIn(repo: JobsRepository, id: string): Promise<JobRun> {
    const run = await repo.findRun(id);
    if (!run) throw AppError.notFound('There is no such run.');
    return run;
  }

  /** The job and its runs; with `full`, each result with its charts' curves and every flex candidate. */
  async detail(id: string, full = false): Promise<JobDetail> {
    const repo = this.store.read();
    return this.detailIn(repo, await this.jobIn(repo, id), full);
  }

  async run(id: string): Promise<RunView> {
    return this.answer(this.results.session(), await this.runIn(this.store.read(), id));
  }

  /** The run computed with each candidate alloy and with its own (see compareAlloys). */
  async compare(id: string, alloyIds: string[]): Promise<CompareView> {
    return compareAlloys(await this.runIn(this.store.read(), id), this.results.session(), alloyIds);
  }

  // ---- writing jobs ----

  async createJob(input: JobCreateInput, actor: PublicUser | null): Promise<JobDetail> {
    const now = new Date();
    const id = randomUUID();
    await this.store.write(async (repo) => {
      await repo.saveJob(repo.create(Job, { id, ...input, status: 'active', createdBy: actor?.id ?? null, createdAt: now, updatedAt: now }));
      await repo.activity.add({ subject: 'job', subjectId: id, subjectName: input.name, jobId: id, action: 'created' }, actor);
    });
    return this.detail(id);
  }

  async patchJob(id: string, patch: JobPatchInput, actor: ActivityActor | null = null): Promise<JobDetail> {
    await this.store.write(async (repo) => {
      const job = await this.jobIn(repo, id);
      const changes = changesBetween(job, patch);
      await repo.saveJob(Object.assign(job, patch, { updatedAt: laterThan(job.updatedAt) }));
      if (changes.length === 0) return;
      const onlyStatus = changes.length === 1 && changes[0].path === 'status';
      const action = onlyStatus ? (patch.status === 'archived' ? 'archived' : 'unarchived') : 'edited';
      await repo.activity.add({ subject: 'job', subjectId: id, subjectName: job.name, jobId: id, action, changes }, actor);
    });
    return this.detail(id);
  }

  // ---- activity ----

  /** The job's own changes and those of its runs (deleted runs included), newest first. */
  async jobActivity(id: string): Promise<ActivityView[]> {
    const repo = this.store.read();
    await this.jobIn(repo, id);
    return (await repo.activity.list({ jobId: id })).map(activityView);
  }

  async runActivity(id: string): Promise<ActivityView[]> {
    const repo = this.store.read();
    await this.runIn(repo, id);
    return (await repo.activity.list({ subject: 'run', subjectId: id })).map(activityView);
  }

  // ---- writing runs ----

  /** The job of a run about to change: it must exist and be open; its updatedAt follows the run. */
  private async openJob(repo: JobsRepository, jobId: string): Promise<Job> {
    const job = await this.jobIn(repo, jobId);
    if (job.status === 'archived') {
      throw AppError.conflict('job_archived', 'This job is archived. Unarchive it to change its runs.');
    }
    job.updatedAt = laterThan(job.updatedAt);
    await repo.saveJob(job);
    return job;
  }

  /** Every alloy a run's inputs name must be published now; a run may keep a retired alloy only by leaving it alone. */
  private async checkAlloys(session: ResultSession, fields: Partial<RunFields>): Promise<void> {
    const named: [string, string][] = [];
    if (fields.alloyId !== undefined) named.push(['alloyId', fields.alloyId]);
    for (const end of ['startFlangeAlloyId', 'endFlangeAlloyId'] as const) {
      const id = fields[end];
      if (id) named.push([end, id]);
    }
    if (fields.joint?.type === 'slip') {
      for (const side of ['inner', 'outer'] as const) {
        const id = fields.joint[side].alloyId;
        if (id) named.push([`joint.${side}.alloyId`, id]);
      }
    }
    const errors: Record<string, string> = {};
    for (const [path, id] of named) {
      if ((await session.alloy(id)).state !== 'published') errors[path] = 'No published alloy with this id';
    }
    if (Object.keys(errors).length > 0) throw AppError.badRequest('invalid_input', 'Some values need attention.', errors);
  }

  private async answer(session: ResultSession, run: JobRun): Promise<RunView> {
    return runView(run, await session.compute(runFieldsOf(run), run.alloyId, { withJoint: true }, revisionOf(run)));
  }

  private newRun(jobId: string, fields: RunFields, position: number): JobRun {
    const now = new Date();
    const run = Object.assign(new JobRun(), { id: randomUUID(), jobId, position, createdAt: now });
    return applyFields(run, fields, now);
  }

  async createRun(jobId: string, input: RunCreateInput, actor: ActivityActor | null = null): Promise<RunView> {
    const session = this.results.session();
    const { position, ...fields } = input;
    await this.checkAlloys(session, fields);
    const run = await this.store.write(async (repo) => {
      await this.openJob(repo, jobId);
      const runs = await repo.runsOf(jobId);
      if (position !== undefined && position > runs.length + 1) {
        throw AppError.badRequest('invalid_input', 'Some values need attention.', { position: `Choose a position from 1 to ${runs.length + 1}` });
      }
      const created = this.newRun(jobId, fields, 0);
      runs.splice((position ?? runs.length + 1) - 1, 0, created);
      await repo.saveRuns(renumber(runs));
      await repo.activity.add({ subject: 'run', subjectId: created.id, subjectName: created.name, jobId, action: 'created' }, actor);
      return created;
    });
    return this.answer(session, run);
  }

  async patchRun(id: string, patch: RunPatchInput, actor: ActivityActor | null = null): Promise<RunView> {
    const session = this.results.session();
    await this.checkAlloys(session, patch);
    const run = await this.store.write(async (repo) => {
      const run = await this.runIn(repo, id);
      await this.openJob(repo, run.jobId);
      // Validated again whole: a change to one field can break a check that spans fields.
      const merged = runFieldsSchema.safeParse({ ...runFieldsOf(run), ...patch });
      if (!merged.success) throw AppError.badRequest('invalid_input', 'Some values need attention.', fieldsFromZod(merged.error));
      const before = runFieldsOf(run);
      applyFields(run, merged.data, new Date());
      await repo.saveRuns([run]);
      const changes = changesBetween(before, runFieldsOf(run));
      if (changes.length > 0) await repo.activity.add({ subject: 'run', subjectId: id, subjectName: run.name, jobId: run.jobId, action: 'edited', changes }, actor);
      return run;
    });
    return this.answer(session, run);
  }

  async deleteRun(id: string, actor: ActivityActor | null = null): Promise<void> {
    await this.store.write(async (repo) => {
      const run = await this.runIn(repo, id);
      await this.openJob(repo, run.jobId);
      await repo.deleteRun(run.id);
      await repo.activity.add({ subject: 'run', subjectId: id, subjectName: run.name, jobId: run.jobId, action: 'deleted', changes: [{ path: 'run', before: runFieldsOf(run), after: null }] }, actor);
      await repo.saveRuns(renumber((await repo.runsOf(run.jobId)).filter((r) => r.id !== run.id)));
    });
  }

  /** A copy of the run placed right after it. */
  async duplicateRun(id: string, actor: ActivityActor | null = null): Promise<RunView> {
    const copy = await this.store.write(async (repo) => {
      const original = await this.runIn(repo, id);
      await this.openJob(repo, original.jobId);
      const runs = await repo.runsOf(original.jobId);
      const fields = runFieldsOf(original);
      const created = this.newRun(original.jobId, { ...fields, name: `${fields.name} (copy)`.slice(0, 120) }, 0);
      runs.splice(runs.findIndex((r) => r.id === original.id) + 1, 0, created);
      await repo.saveRuns(renumber(runs));
      await repo.activity.add({ subject: 'run', subjectId: created.id, subjectName: created.name, jobId: created.jobId, action: 'duplicated', changes: [{ path: 'from', before: null, after: original.name }] }, actor);
      return created;
    });
    return this.answer(this.results.session(), copy);
  }

  async reorderRuns(jobId: string, input: RunOrderInput, actor: ActivityActor | null = null): Promise<JobDetail> {
    await this.store.write(async (repo) => {
      const job = await this.openJob(repo, jobId);
      const runs = await repo.runsOf(jobId);
      const byId = new Map(runs.map((r) => [r.id, r]));
      const unique = new Set(input.runIds);
      if (unique.size !== input.runIds.length || input.runIds.length !== runs.length || input.runIds.some((rid) => !byId.has(rid))) {
        throw AppError.badRequest('invalid_input', 'Some values need attention.', {
          runIds: `Name each of this job's ${runs.length} runs exactly once`,
        });
      }
      const before = runs.map((r) => r.name);
      await repo.saveRuns(renumber(input.runIds.map((rid) => byId.get(rid)!)));
      const after = input.runIds.map((rid) => byId.get(rid)!.name);
      if (JSON.stringify(before) !== JSON.stringify(after)) {
        await repo.activity.add({ subject: 'job', subjectId: jobId, subjectName: job.name, jobId, action: 'reordered', changes: [{ path: 'runs', before, after }] }, actor);
      }
    });
    return this.detail(jobId);
  }
}

function applyFields(run: JobRun, fields: RunFields, now: Date): JobRun {
  return Object.assign(run, {
    name: fields.name,
    alloyId: fields.alloyId,
    odMm: fields.tube.odMm,
    wallMm: fields.tube.wallMm,
    installTempC: fields.installTempC,
    segments: fields.segments.map((s) => ({ lengthMm: s.lengthMm, startTempC: s.startTempC, endTempC: s.endTempC })),
    startFixing: fields.startFixing,
    endFixing: fields.endFixing,
    startFlangeAlloyId: fields.startFlangeAlloyId,
    endFlangeAlloyId: fields.endFlangeAlloyId,
    joint: fields.joint,
    supports: fields.supports,
    nearby: fields.nearby,
    notes: fields.notes,
    updatedAt: run.updatedAt ? laterThan(run.updatedAt) : now,
  });
}
