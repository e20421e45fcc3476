/**
 * A large shop for the scale rows of `npm run bench`: the seeded catalogue and demo shop, then
 * 10,000 published alloys (each a renamed copy of a seeded alloy's version and property points) and
 * 2,000 jobs of 50 runs each (100,000 runs), written with bulk INSERTs in transactions.
 *
 *   SWC_NODE_PROJECT=server/tsconfig.json node -r @swc-node/register scripts/generate-big-db.ts out.sqlite
 */
import { randomUUID } from 'node:crypto';
import type { DataSource, EntityManager, ObjectLiteral } from 'typeorm';
import { designationKey, searchText } from '../shared/catalogue/designation-key';
import { Alloy, AlloyVersion, PropertyPoint } from '../server/catalogue/catalogue.entities';
import { CacheStamps } from '../server/cache/cache-stamps.repository';
import { openDatabase } from '../server/db/data-source';
import { Job, JobRun } from '../server/jobs/job.entities';
import { seed } from '../server/seed/seed';

export interface BigDbSize {
  alloys: number;
  jobs: number;
  runsPerJob: number;
}

export const BIG_DB: BigDbSize = { alloys: 10_000, jobs: 2_000, runsPerJob: 50 };

/** Rows per INSERT: under SQLite's 32,766 bound values for the widest table here. */
const CHUNK = 400;

async function insertAll<T extends ObjectLiteral>(m: EntityManager, entity: new () => T, rows: T[]) {
  for (let i = 0; i < rows.length; i += CHUNK) {
    await m.createQueryBuilder().insert().into(entity).values(rows.slice(i, i + CHUNK)).updateEntity(false).execute();
  }
}

async function addAlloys(ds: DataSource, count: number) {
  const templates = await ds.manager.find(AlloyVersion, { where: { state: 'published' } });
  const points = await ds.manager.find(PropertyPoint);
  const pointsOf = new Map<string, PropertyPoint[]>();
  for (const p of points) pointsOf.set(p.versionId, [...(pointsOf.get(p.versionId) ?? []), p]);
  const now = new Date();
  const perTransaction = 1000;
  for (let start = 0; start < count; start += perTransaction) {
    const alloys: Alloy[] = [];
    const versions: AlloyVersion[] = [];
    const rows: PropertyPoint[] = [];
    for (let i = start; i < Math.min(count, start + perTransaction); i++) {
      const t = templates[i % templates.length];
      const alloyId = randomUUID();
      const versionId = randomUUID();
      const uns = `Z${String(i).padStart(5, '0')}`;
      const designation = `${t.designation} lot ${i}`;
      alloys.push(Object.assign(new Alloy(), { id: alloyId, uns, status: 'published', publishedVersionId: versionId, draftVersionId: null, createdAt: now, updatedAt: now }));
      versions.push(Object.assign(new AlloyVersion(), { ...t, id: versionId, alloyId, version: 1, uns, designation, designationKey: designationKey(designation), searchText: searchText(designation, uns), pricePerKg: t.pricePerKg * (0.8 + (i % 40) / 100) }));
      for (const p of pointsOf.get(t.id) ?? []) rows.push(Object.assign(new PropertyPoint(), { ...p, id: randomUUID(), versionId }));
    }
    await ds.transaction(async (m) => {
      await insertAll(m, Alloy, alloys);
      await insertAll(m, AlloyVersion, versions);
      await insertAll(m, PropertyPoint, rows);
    });
  }
  await ds.transaction((m) => new CacheStamps(m).bump('catalogue'));
}

async function addJobs(ds: DataSource, jobs: number, runsPerJob: number) {
  const demoRuns = await ds.manager.find(JobRun);
  const perTransaction = 100;
  const base = Date.now() - jobs * 60_000;
  for (let start = 0; start < jobs; start += perTransaction) {
    const jobRows: Job[] = [];
    const runRows: JobRun[] = [];
    for (let j = start; j < Math.min(jobs, start + perTransaction); j++) {
      const at = new Date(base + j * 60_000);
      const jobId = randomUUID();
      jobRows.push(Object.assign(new Job(), { id: jobId, name: `Generated job ${j}`, customer: `Customer ${j % 300}`, application: 'Generated exhaust system', status: j % 10 === 0 ? 'archived' : 'active', notes: '', createdBy: null, createdAt: at, updatedAt: at }));
      for (let r = 0; r < runsPerJob; r++) {
        const t = demoRuns[(j * runsPerJob + r) % demoRuns.length];
        runRows.push(Object.assign(new JobRun(), { ...t, id: randomUUID(), jobId, position: r + 1, name: `${t.name} ${r + 1}`, createdAt: at, updatedAt: at }));
      }
    }
    await ds.transaction(async (m) => {
      await insertAll(m, Job, jobRows);
      await insertAll(m, JobRun, runRows);
    });
  }
}

/** Builds the large database at `file` (which must not exist yet) and closes it. */
export async function generateBigDb(file: string, size: BigDbSize = BIG_DB): Promise<void> {
  const ds = await openDatabase(file);
  try {
    await seed(ds, { demo: true, catalogue: true });
    await addAlloys(ds, size.alloys);
    await addJobs(ds, size.jobs, size.runsPerJob);
  } finally {
    await ds.destroy();
  }
}

if (require.main === module) {
  const file = process.argv[2];
  if (!file) throw new Error('Name the database file to write, e.g. /tmp/dilato-big.sqlite');
  const start = performance.now();
  void generateBigDb(file).then(() => console.log(`Wrote ${file} in ${((performance.now() - start) / 1000).toFixed(1)} s`));
}
