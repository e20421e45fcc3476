import { jobTotals } from '../../shared/jobs/job-totals';
import type { JobListQuery, JobSummary, RunView } from '../../shared/schemas/jobs';
import { BoundedMap } from '../cache/bounded-map';
import type { Job } from './job.entities';
import type { JobsRepository, JobsStore } from './jobs.repository';
import { jobSummary, runFieldsOf, runView } from './jobs.views';
import type { ResultSession, RunResults } from './run-results';

export type JobPage = { items: JobSummary[]; total: number; page: number; pageSize: number };

/** The job list: pages with each job's totals, and `GET /api/jobs`'s answers as JSON text. */
export class JobList {
  private readonly answers = new BoundedMap<string>(200);

  constructor(
    private readonly store: JobsStore,
    private readonly results: RunResults,
  ) {}

  /** One page of jobs; only runs of the page's jobs are read, and only for jobs whose totals are not cached for this revision. */
  async list(query: JobListQuery): Promise<JobPage> {
    return this.listIn(this.store.read(), this.results.session(), query);
  }

  /** `GET /api/jobs`'s answer as JSON text, kept while the `jobs` stamp and what the totals rest on stand. */
  async json(query: JobListQuery): Promise<string> {
    const repo = this.store.read();
    const session = this.results.session();
    const [stamp, basis] = await Promise.all([repo.stamps.read('jobs'), session.answerBasis()]);
    const key = `${stamp}|${basis}|${JSON.stringify(query)}`;
    return this.answers.getOr(key, async () => JSON.stringify(await this.listIn(repo, session, query)));
  }

  private async listIn(repo: JobsRepository, session: ResultSession, query: JobListQuery): Promise<JobPage> {
    const [jobs, total] = await repo.listJobs(query);
    const basis = await session.basisKey();
    const keyOf = (job: Job) => `${job.id}@${new Date(job.updatedAt).getTime()}|${basis}`;
    const missing = jobs.filter((job) => this.results.jobTotals.get(keyOf(job)) === undefined);
    // Computed without keeping each full result: the totals are what the list keeps.
    const runs = await repo.runsOfJobs(missing.map((j) => j.id));
    const views = await Promise.all(runs.map(async (run) => runView(run, await session.compute(runFieldsOf(run)))));
    const byJob = new Map<string, RunView[]>(missing.map((j) => [j.id, []]));
    for (const view of views) byJob.get(view.jobId)!.push(view);
    for (const job of missing) this.results.jobTotals.set(keyOf(job), jobTotals(byJob.get(job.id)!));
    const items = jobs.map((job) => jobSummary(job, this.results.jobTotals.get(keyOf(job))!));
    return { items, total, page: query.page, pageSize: query.pageSize };
  }
}
