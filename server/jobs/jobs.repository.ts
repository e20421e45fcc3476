import { CacheStamps } from '../cache/cache-stamps.repository';
import { rawRows } from '../db/raw-sql';
import { In, type DataSource, type EntityManager } from 'typeorm';
import type { JobListQuery } from '../../shared/schemas/jobs';
import { Job, JobRun } from './job.entities';
import { build, Store } from '../db/store';
import { ActivityRows } from '../activity/activity.repository';

const likePattern = (text: string) => `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;

/** The only place job and run rows are read and written. Bind it to a transaction's manager to write atomically. */
export class JobsRepository {
  /** Who changed what, written in the same transaction as the change. */
  readonly activity: ActivityRows;
  readonly stamps: CacheStamps;

  constructor(private readonly m: EntityManager) {
    this.activity = new ActivityRows(m);
    this.stamps = new CacheStamps(m);
  }

  /** One page of jobs, newest change first, and how many match in all. */
  listJobs(query: JobListQuery): Promise<[Job[], number]> {
    const qb = this.m.createQueryBuilder(Job, 'j');
    if (query.status !== 'all') qb.andWhere('j.status = :status', { status: query.status });
    if (query.search) {
      const like = (column: string) => `LOWER(${column}) LIKE LOWER(:like) ESCAPE '\\'`;
      qb.andWhere(`(${like('j.name')} OR ${like('j.customer')} OR ${like('j.application')})`, { like: likePattern(query.search) });
    }
    return qb
      .orderBy('j.updated_at', 'DESC')
      .addOrderBy('j.name', 'ASC')
      .addOrderBy('j.id', 'ASC')
      .skip((query.page - 1) * query.pageSize)
      .take(query.pageSize)
      .getManyAndCount();
  }
  findJob(id: string) {
    return this.m.findOneBy(Job, { id });
  }
  findJobByName(name: string) {
    return this.m.findOneBy(Job, { name });
  }
  /** Every job write, and every run change through its job, moves the `jobs` stamp in the same transaction (job list answers are kept by it). */
  async saveJob(job: Job) {
    const saved = await this.m.save(Job, job);
    await this.stamps.bump('jobs');
    return saved;
  }

  runsOf(jobId: string) {
    return this.m.find(JobRun, { where: { jobId }, order: { position: 'ASC' } });
  }
  runsOfJobs(jobIds: string[]) {
    return jobIds.length === 0 ? Promise.resolve([]) : this.m.find(JobRun, { where: { jobId: In(jobIds) }, order: { position: 'ASC' } });
  }
  findRun(id: string) {
    return this.m.findOneBy(JobRun, { id });
  }
  saveRuns(runs: JobRun[]) {
    return this.m.save(JobRun, runs);
  }
  async deleteRun(id: string) {
    await this.m.delete(JobRun, { id });
  }

  async userNames(ids: string[]): Promise<Map<string, string>> {
    if (ids.length === 0) return new Map();
    const users = await rawRows<{ id: string; name: string }>(this.m, `SELECT id, name FROM app_user WHERE id IN (${ids.map(() => '?').join(', ')})`, ids);
    return new Map(users.map((u) => [u.id, u.name]));
  }

  create<T extends object>(entity: new () => T, fields: Partial<T>): T {
    return build(entity, fields);
  }
}

export class JobsStore extends Store<JobsRepository> {
  constructor(dataSource: DataSource) {
    super(dataSource, (m) => new JobsRepository(m));
  }
}
