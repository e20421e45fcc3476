import type { AlloyDetail } from '../../shared/schemas/alloy';
import type { JobSummary, RunView } from '../../shared/schemas/jobs';
import { seed } from '../../server/seed/seed';
import { DEMO_JOBS } from '../../server/seed/demo-jobs';
import { expectErrorShape, createTestApp, signedIn, type TestApp } from './test-app';
import { alloyId, jobDetail, newJob, newRun, runBody, TUBE_3IN } from './jobs-helpers';

let t: TestApp;
let s304: string;
let s321: string;
let s409: string;
beforeAll(async () => {
  t = await createTestApp();
  [s304, s321, s409] = await Promise.all(['S30400', 'S32100', 'S40910'].map((uns) => alloyId(t, uns)));
});
afterAll(() => t.close());

describe('jobs', () => {
  it('when a fabricator creates a job, then it answers 201 with an empty job, its creator and zero totals', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const res = await fab.post('/api/jobs').send({ name: '  Bench job  ', customer: 'Quay Street Garage', application: 'Downpipe' });
    expect(res.status).toBe(201);
    expect(res.body.job).toMatchObject({
      name: 'Bench job',
      customer: 'Quay Street Garage',
      application: 'Downpipe',
      notes: '',
      status: 'active',
      createdBy: { name: 'Rhea Castellano' },
      runs: [],
      totals: { growthMm: 0, massKg: 0, lengthMm: 0, runCount: 0, peakTempC: null, runsWithProblems: 0 },
    });
    expect(Date.parse(res.body.job.createdAt)).not.toBeNaN();
  });

  it('when a job body misses its name or customer, then 400 names those fields', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const res = await fab.post('/api/jobs').send({ name: ' ', application: 'Duct' });
    expect(res.status).toBe(400);
    expectErrorShape(res.body, 'invalid_input');
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['customer', 'name']);
  });

  it('when the demo shop is seeded, then its three jobs list with run counts and the sums of their runs', async () => {
    const sales = await signedIn(t.app, 'sales');
    const res = await sales.get('/api/jobs').query({ search: 'hill-climb' });
    expect(res.status).toBe(200);
    const hill = (res.body.items as JobSummary[]).find((j) => j.name === 'Hill-climb special: turbo exhaust')!;
    expect(hill.runCount).toBe(4);
    const detail = await jobDetail(sales, hill.id);
    expect(detail.runs.map((r) => r.alloy!.uns)).toEqual(['N06625', 'S32100', 'S30400', 'S40910']);
    expect(detail.createdBy!.name).toBe('Rhea Castellano');
    expect(detail.runs.every((r) => r.result !== null && r.problem === null)).toBe(true);
    const sum = (pick: (r: RunView) => number) => detail.runs.reduce((s, r) => s + pick(r), 0);
    expect(hill.totalGrowthMm).toBeCloseTo(sum((r) => r.result!.growthMm), 9);
    expect(hill.totalMassKg).toBeCloseTo(sum((r) => r.result!.massKg), 9);
    expect(detail.totals.materialCost).toBeCloseTo(sum((r) => r.result!.materialCost), 9);
    expect(detail.totals.lengthMm).toBe(sum((r) => r.segments.reduce((s, seg) => s + seg.lengthMm, 0)));
    expect(hill.peakTempC).toBe(Math.max(...detail.runs.map((r) => r.result!.peakTempC)));
    const all = (await sales.get('/api/jobs')).body;
    expect(all.items.map((j: JobSummary) => j.name)).toEqual(
      expect.arrayContaining(['Hill-climb special: turbo exhaust', 'Road car downpipe', 'Dryer hot-air duct']),
    );
  });

  it('when the demo seed runs again, then no demo job is added twice', async () => {
    const report = await seed(t.dataSource, { demo: true });
    expect(report.demoJobs).toBe(0);
    const sales = await signedIn(t.app, 'sales');
    const names = ((await sales.get('/api/jobs').query({ status: 'all' })).body.items as JobSummary[]).map((j) => j.name);
    for (const demo of DEMO_JOBS) expect(names.filter((n) => n === demo.name)).toHaveLength(1);
  });

  it('when a job is archived, then the default list hides it, status=archived shows it, and its runs cannot change until unarchived', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const job = await newJob(fab, 'Archive me');
    const run = await newRun(fab, job.id, runBody(s304));
    const archived = await fab.patch(`/api/jobs/${job.id}`).send({ status: 'archived', name: 'Archived job' });
    expect(archived.status).toBe(200);
    expect(archived.body.job).toMatchObject({ status: 'archived', name: 'Archived job' });
    const ids = async (q: Record<string, string>) => ((await fab.get('/api/jobs').query(q)).body.items as JobSummary[]).map((j) => j.id);
    expect(await ids({})).not.toContain(job.id);
    expect(await ids({ status: 'archived' })).toContain(job.id);
    expect(await ids({ status: 'all' })).toContain(job.id);

    const blocked = await fab.patch(`/api/runs/${run.id}`).send({ name: 'Changed' });
    expect(blocked.status).toBe(409);
    expectErrorShape(blocked.body, 'job_archived');
    expect((await fab.post(`/api/jobs/${job.id}/runs`).send(runBody(s304))).status).toBe(409);

    expect((await fab.patch(`/api/jobs/${job.id}`).send({ status: 'active' })).status).toBe(200);
    expect((await fab.patch(`/api/runs/${run.id}`).send({ name: 'Changed' })).body.run.name).toBe('Changed');
  });

  it('when the list is searched, then only jobs whose name, customer or application match come back', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const job = await newJob(fab, 'Zebrafinch 100%_special');
    const found = (await fab.get('/api/jobs').query({ search: 'zebrafinch 100%_' })).body.items as JobSummary[];
    expect(found.map((j) => j.id)).toEqual([job.id]);
    expect((await fab.get('/api/jobs').query({ search: '100%x' })).body.items).toEqual([]);
    expect((await fab.get('/api/jobs').query({ search: 'grain' })).body.items.map((j: JobSummary) => j.name)).toEqual(['Dryer hot-air duct']);
  });

  it('when the list filter or a job id is bad, then 400 or 404 in the one error shape', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const bad = await fab.get('/api/jobs').query({ status: 'lost' });
    expect(bad.status).toBe(400);
    expectErrorShape(bad.body, 'invalid_query');
    expect(bad.body.error.fields).toHaveProperty('status');
    const missing = await fab.get('/api/jobs/nope');
    expect(missing.status).toBe(404);
    expectErrorShape(missing.body, 'not_found');
    expect((await fab.patch('/api/jobs/nope').send({ name: 'x' })).status).toBe(404);
    expect((await fab.patch(`/api/jobs/${(await newJob(fab)).id}`).send({})).status).toBe(400);
  });
});

describe('run results', () => {
  it('when 1 m of Type 321 runs at 600 °C, then it grows 10.687 mm with the published version named (EN 1993-1-2 Annex C, reference-data §1.1)', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const job = await newJob(fab);
    const run = await newRun(fab, job.id, runBody(s321, 600));
    // 321 on EN 1993-1-2 Annex C: Δl/l from 20 to 600 °C = 10.68738e-3 (reference-data §1.1): 10.687 mm.
    expect(run.result!.growthMm).toBeCloseTo(10.687, 2);
    expect(run.alloy).toEqual({ id: s321, designation: 'Type 321', uns: 'S32100', version: 1, status: 'published' });
    expect(run.problem).toBeNull();
    expect(run.currency).toBe('EUR');
    expect(run.position).toBe(1);
    expect(run).toMatchObject({ startFixing: 'flange', endFixing: 'sliding_bracket', joint: { type: 'none' }, notes: '' });
  });

  it('when 1 m of 3 in × 16 ga Type 304 is at 800 °C, then growth and mass match EN 1993-1-2 Annex C and ρπ(OD−t)t', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const job = await newJob(fab);
    const run = await newRun(fab, job.id, runBody(s304, 800));
    // EN 1993-1-2 Annex C at 800 °C: Δl/l = 14.84845e-3 (reference-data §1.1).
    expect(run.result!.growthMm).toBeCloseTo(14.848, 2);
    // 8000 · π · (76.2 − 1.651) · 1.651e-6 = 3.0933 kg/m (reference-data §6).
    expect(run.result!.massKg).toBeCloseTo(3.0933, 3);
  });

  it('when a run’s temperature changes, then its growth follows on the next read and the job’s totals with it', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const job = await newJob(fab);
    const run = await newRun(fab, job.id, runBody(s321, 600));
    const patched = await fab.patch(`/api/runs/${run.id}`).send({ segments: [{ lengthMm: 1000, startTempC: 1000, endTempC: 1000 }] });
    expect(patched.status).toBe(200);
    // 321 from 20 to 1000 °C on EN 1993-1-2 Annex C: Δl/l = 19.15606e-3 (reference-data §1.1): 19.156 mm.
    expect(patched.body.run.result.growthMm).toBeCloseTo(19.156, 2);
    const read = (await fab.get(`/api/runs/${run.id}`)).body.run as RunView;
    expect(read.result!.growthMm).toBe(patched.body.run.result.growthMm);
    expect((await jobDetail(fab, job.id)).totals.growthMm).toBe(read.result!.growthMm);
  });

  it('when new data for the run’s alloy is published, then the run’s result and data version follow; a draft alone changes nothing', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const admin = await signedIn(t.app, 'admin');
    const s347 = await alloyId(t, 'S34700');
    const job = await newJob(fab);
    const run = await newRun(fab, job.id, runBody(s347, 600));
    expect(run.alloy!.version).toBe(1);

    const detail = (await admin.get(`/api/alloys/${s347}`)).body.alloy as AlloyDetail;
    const cte = detail.published!.cte.map((p) => (p.tempC === 600 ? { ...p, meanUmPerMK: p.meanUmPerMK + 1 } : p));
    expect((await admin.patch(`/api/alloys/${s347}`).send({ cte })).status).toBe(200);
    const draftOnly = (await fab.get(`/api/runs/${run.id}`)).body.run as RunView;
    expect(draftOnly.result!.growthMm).toBe(run.result!.growthMm);
    expect(draftOnly.alloy!.version).toBe(1);

    expect((await admin.post(`/api/alloys/${s347}/publish`).send({ note: 'Checked' })).status).toBe(200);
    const after = (await fab.get(`/api/runs/${run.id}`)).body.run as RunView;
    expect(after.alloy!.version).toBe(2);
    // One more µm/(m·K) over 580 K adds 0.58 mm per metre.
    expect(after.result!.growthMm - run.result!.growthMm).toBeCloseTo(0.58, 6);
  });

  it('when the run’s alloy is retired, then the run and its job still read, with a problem instead of a result', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const admin = await signedIn(t.app, 'admin');
    const s430 = await alloyId(t, 'S43000');
    const job = await newJob(fab);
    const kept = await newRun(fab, job.id, runBody(s304, 400));
    const doomed = await newRun(fab, job.id, runBody(s430, 400));
    expect(doomed.result).not.toBeNull();
    expect((await admin.post(`/api/alloys/${s430}/retire`).send({})).status).toBe(200);
    try {
      const res = await fab.get(`/api/jobs/${job.id}`);
      expect(res.status).toBe(200);
      const [first, second] = res.body.job.runs as RunView[];
      expect(first.result!.growthMm).toBe(kept.result!.growthMm);
      expect(second.result).toBeNull();
      expect(second.problem).toMatchObject({ code: 'alloy_retired', fields: { alloyId: expect.any(String) } });
      expect(second.problem!.message).toMatch(/Type 430/);
      expect(second.alloy).toMatchObject({ id: s430, uns: 'S43000', status: 'retired' });
      expect(res.body.job.totals).toMatchObject({ growthMm: kept.result!.growthMm, runsWithProblems: 1, runCount: 2 });

      const renamed = await fab.patch(`/api/runs/${doomed.id}`).send({ name: 'Still here' });
      expect(renamed.status).toBe(200);
      expect(renamed.body.run.problem.code).toBe('alloy_retired');
      const chooseRetired = await fab.patch(`/api/runs/${kept.id}`).send({ alloyId: s430 });
      expect(chooseRetired.status).toBe(400);
      expect(chooseRetired.body.error.fields).toEqual({ alloyId: 'No published alloy with this id' });
      const adopt = await fab.patch(`/api/runs/${doomed.id}`).send({ alloyId: s304 });
      expect(adopt.body.run.problem).toBeNull();
      expect(adopt.body.run.result.growthMm).toBe(kept.result!.growthMm);
    } finally {
      await admin.post(`/api/alloys/${s430}/restore`).send({});
    }
  });

  it('when a run goes above its alloy’s data, then it saves and reads with an outside_data problem naming the segment', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const job = await newJob(fab);
    // Type 409's seeded expansion table ends at 500 °C.
    const res = await fab.post(`/api/jobs/${job.id}/runs`).send(
      runBody(s409, 450, { segments: [{ lengthMm: 500, startTempC: 450, endTempC: 450 }, { lengthMm: 500, startTempC: 800, endTempC: 480 }] }),
    );
    expect(res.status).toBe(201);
    const run = res.body.run as RunView;
    expect(run.result).toBeNull();
    expect(run.problem!.code).toBe('outside_data');
    expect(Object.keys(run.problem!.fields!)).toEqual(['segments.1.startTempC']);
    expect(run.problem!.message).toMatch(/Type 409.*version 1/);
    expect(run.alloy!.uns).toBe('S40910');
    expect((await fab.get(`/api/jobs/${job.id}`)).status).toBe(200);
  });

  it('when a run has a flex section, then the result sizes it from the catalogue’s flex parts with the shop’s basis', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const job = await newJob(fab);
    const run = await newRun(fab, job.id, runBody(s321, 700, { joint: { type: 'flex', atMm: 400, lateralOffsetMm: 1, heatCycles: 5000 } }));
    expect(run.joint).toEqual({ type: 'flex', atMm: 400, lateralOffsetMm: 1, heatCycles: 5000 });
    const flex = run.result!.flex!;
    // Demo shop settings: 70 % of rated travel, coldest start −20 °C (common practice defaults).
    expect(flex.travelShare).toBe(0.7);
    expect(flex.coldestAmbientC).toBe(-20);
    expect(flex.tempBasis).toBe('location');
    expect(flex.states.find((s) => s.state === 'hot')!.lateralMm).toBe(1);
    expect(flex.chosen).not.toBeNull();
    expect(flex.chosen!.fits).toBe(true);
    expect(flex.chosen!.worstUse).toBeLessThanOrEqual(0.7 + 1e-9);
  });

  it('when the fabricator picks a flex part, then the run keeps it and says whether it fits', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const job = await newJob(fab);
    const parts = (await fab.get('/api/flex-parts')).body.items as { id: string; code: string }[];
    const decoupler = parts.find((p) => p.code === 'DL-VD-76-100')!;
    const run = await newRun(fab, job.id, runBody(s321, 500, { segments: [{ lengthMm: 200, startTempC: 500, endTempC: 450 }], joint: { type: 'flex', partId: decoupler.id } }));
    expect(run.result!.flex!.chosenBy).toBe('fabricator');
    expect(run.result!.flex!.chosen!.id).toBe(decoupler.id);
    expect(run.result!.warnings.map((w: { code: string }) => w.code)).toContain('FLEX_NOT_FOR_GROWTH');
  });

  it('when a run has a slip joint, then the result judges the fit with its allowances and a member alloy may come from the catalogue', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const job = await newJob(fab);
    const slip = (coldClearanceMm: number) => ({
      type: 'slip',
      inner: { tempC: 850 },
      outer: { tempC: 700, alloyId: s304 },
      coldClearanceMm,
      coldEngagementMm: 80,
      coldAxialGapMm: 25,
      toleranceMm: 0.02,
    });
    const body = runBody(s304, 850, { tube: { odMm: 63.5, wallMm: 1.651 }, segments: [{ lengthMm: 600, startTempC: 850, endTempC: 700 }] });
    // Differential growth 63.5 × (ε(850) − ε(700)) ≈ 0.201 mm, EN Annex C (reference-data §4.2).
    const tight = await newRun(fab, job.id, { ...body, joint: slip(0.25) });
    const fitted = await newRun(fab, job.id, { ...body, joint: slip(0.45) });
    const hot = tight.result!.slip!.states.find((s: { state: string }) => s.state === 'hot')!;
    expect(hot.differentialGrowthMm).toBeCloseTo(0.201, 2);
    expect(tight.result!.slip!.verdict).toBe('fails');
    expect(tight.result!.slip!.checks.find((c: { code: string }) => c.code === 'hot_min_clearance')!.ok).toBe(false);
    expect(fitted.result!.slip!.checks.filter((c: { ok: boolean }) => !c.ok).map((c: { code: string }) => c.code)).toEqual([]);
  });
});

describe('run order', () => {
  async function positions(c: Awaited<ReturnType<typeof signedIn>>, jobId: string) {
    return (await jobDetail(c, jobId)).runs.map((r) => [r.name, r.position]);
  }

  it('when runs are added, inserted, duplicated, deleted and reordered, then positions stay 1..n in the order asked', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const job = await newJob(fab);
    const a = await newRun(fab, job.id, runBody(s304, 600, { name: 'A' }));
    const c = await newRun(fab, job.id, runBody(s304, 500, { name: 'C' }));
    const b = await newRun(fab, job.id, runBody(s304, 550, { name: 'B', position: 2 }));
    expect(b.position).toBe(2);
    expect(await positions(fab, job.id)).toEqual([['A', 1], ['B', 2], ['C', 3]]);

    const dup = await fab.post(`/api/runs/${a.id}/duplicate`).send({});
    expect(dup.status).toBe(201);
    expect(dup.body.run).toMatchObject({ name: 'A (copy)', position: 2, segments: a.segments, tube: TUBE_3IN });
    expect(dup.body.run.id).not.toBe(a.id);
    expect(dup.body.run.result.growthMm).toBe(a.result!.growthMm);
    expect(await positions(fab, job.id)).toEqual([['A', 1], ['A (copy)', 2], ['B', 3], ['C', 4]]);

    const del = await fab.delete(`/api/runs/${a.id}`);
    expect(del.status).toBe(204);
    expect((await fab.get(`/api/runs/${a.id}`)).status).toBe(404);
    expect(await positions(fab, job.id)).toEqual([['A (copy)', 1], ['B', 2], ['C', 3]]);

    const order = await fab.put(`/api/jobs/${job.id}/runs/order`).send({ runIds: [c.id, dup.body.run.id, b.id] });
    expect(order.status).toBe(200);
    expect(order.body.job.runs.map((r: RunView) => [r.name, r.position])).toEqual([['C', 1], ['A (copy)', 2], ['B', 3]]);
    expect(await positions(fab, job.id)).toEqual([['C', 1], ['A (copy)', 2], ['B', 3]]);
  });

  it('when a reorder does not name exactly the job’s runs, then 400 on runIds and nothing moves', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const job = await newJob(fab);
    const other = await newJob(fab);
    const a = await newRun(fab, job.id, runBody(s304, 600, { name: 'A' }));
    const b = await newRun(fab, job.id, runBody(s304, 600, { name: 'B' }));
    const foreign = await newRun(fab, other.id, runBody(s304, 600));
    for (const runIds of [[a.id], [b.id, a.id, a.id], [b.id, foreign.id], [b.id, a.id, foreign.id], []]) {
      const res = await fab.put(`/api/jobs/${job.id}/runs/order`).send({ runIds });
      expect(res.status).toBe(400);
      expectErrorShape(res.body, 'invalid_input');
      expect(res.body.error.fields).toHaveProperty('runIds');
    }
    expect(await positions(fab, job.id)).toEqual([['A', 1], ['B', 2]]);
  });

  it('when a position lies past the end, then 400 on position', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const job = await newJob(fab);
    await newRun(fab, job.id, runBody(s304));
    const res = await fab.post(`/api/jobs/${job.id}/runs`).send(runBody(s304, 600, { position: 3 }));
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ position: 'Choose a position from 1 to 2' });
  });
});

describe('run validation', () => {
  let jobId: string;
  beforeAll(async () => {
    jobId = (await newJob(await signedIn(t.app, 'fabricator'))).id;
  });

  it.each([
    ['the wall is half the OD', { tube: { odMm: 50, wallMm: 25 } }, ['tube.wallMm']],
    ['there are no segments', { segments: [] }, ['segments']],
    ['a segment has no length', { segments: [{ lengthMm: 0, startTempC: 500, endTempC: 400 }] }, ['segments.0.lengthMm']],
    ['the alloy is unknown', { alloyId: 'no-such-alloy' }, ['alloyId']],
    ['a fixed point is not on the list', { startFixing: 'glue' }, ['startFixing']],
    ['the joint type is unknown', { joint: { type: 'bellows' } }, ['joint.type']],
    ['the flex lies beyond the run', { joint: { type: 'flex', atMm: 1200 } }, ['joint.atMm']],
    ['the flex lateral offset is negative', { joint: { type: 'flex', lateralOffsetMm: -1 } }, ['joint.lateralOffsetMm']],
    ['a segment runs at 5000 °C', { segments: [{ lengthMm: 300, startTempC: 5000, endTempC: 700 }] }, ['segments.0.startTempC']],
    [
      'the sleeve bore is not tube plus clearance',
      { joint: { type: 'slip', inner: { tempC: 600 }, outer: { tempC: 550, diameterMm: 80 }, coldClearanceMm: 0.3, coldEngagementMm: 80, coldAxialGapMm: 20 } },
      ['joint.outer.diameterMm'],
    ],
    ['the name is blank', { name: '' }, ['name']],
  ])('when %s, then 400 names exactly that field', async (_what, over, fields) => {
    const fab = await signedIn(t.app, 'fabricator');
    const alloy = (over as { alloyId?: string }).alloyId ?? s304;
    const res = await fab.post(`/api/jobs/${jobId}/runs`).send(runBody(alloy, 600, over));
    expect(res.status).toBe(400);
    expectErrorShape(res.body, 'invalid_input');
    expect(Object.keys(res.body.error.fields).sort()).toEqual(fields);
  });

  it('when a patch breaks a check together with the saved inputs, then 400 names it and the run is unchanged', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const run = await newRun(fab, jobId, runBody(s304, 600, { joint: { type: 'flex', atMm: 900 } }));
    const shorter = await fab.patch(`/api/runs/${run.id}`).send({ segments: [{ lengthMm: 500, startTempC: 600, endTempC: 600 }] });
    expect(shorter.status).toBe(400);
    expect(shorter.body.error.fields).toHaveProperty(['joint.atMm']);
    const thick = await fab.patch(`/api/runs/${run.id}`).send({ tube: { odMm: 76.2, wallMm: 40 } });
    expect(thick.body.error.fields).toHaveProperty(['tube.wallMm']);
    const read = (await fab.get(`/api/runs/${run.id}`)).body.run as RunView;
    expect(read.segments).toEqual(run.segments);
    expect(read.tube).toEqual(run.tube);
  });

  it('when the job or run does not exist, then 404', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    expect((await fab.post('/api/jobs/nope/runs').send(runBody(s304))).status).toBe(404);
    for (const res of [
      await fab.get('/api/runs/nope'),
      await fab.patch('/api/runs/nope').send({ name: 'x' }),
      await fab.delete('/api/runs/nope'),
      await fab.post('/api/runs/nope/duplicate').send({}),
    ]) {
      expect(res.status).toBe(404);
      expectErrorShape(res.body, 'not_found');
    }
  });
});
