import type { WeldPlan, WeldView } from '../../shared/welds/weld-plan';
import type { WeldRuleRevisionView, WeldRuleView } from '../../shared/schemas/weld-rules';
import { alloyId, newJob, newRun, runBody, TUBE_3IN } from './jobs-helpers';
import { createTestApp, expectErrorShape, signedIn, type TestApp } from './test-app';

let t: TestApp;
let s321: string;
let carbon: string;
let ti2: string;
let a718: string;
let a625: string;
beforeAll(async () => {
  t = await createTestApp();
  [s321, carbon, ti2, a718, a625] = await Promise.all(['S32100', 'G10200', 'R50400', 'N07718', 'N06625'].map((u) => alloyId(t, u)));
}, 60_000);
afterAll(() => t.close());

type Client = Awaited<ReturnType<typeof signedIn>>;
const planOf = async (c: Client, jobId: string): Promise<WeldPlan> => {
  const res = await c.get(`/api/jobs/${jobId}/weld-plan`);
  expect(res.status).toBe(200);
  return res.body.plan;
};
const welds = (plan: WeldPlan): WeldView[] => plan.runs.flatMap((r) => r.welds);

describe('the weld plan of a job', () => {
  it('when a Type 321 downpipe is welded to a carbon-steel turbo flange, then that weld takes ER309L and the 321 butt welds take ER347', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const part = (await fab.get('/api/flex-parts')).body.items.find((p: { code: string }) => p.code === 'DL-FX-76-250');
    const job = await newJob(fab, '321 downpipe');
    await newRun(
      fab,
      job.id,
      runBody(s321, 780, {
        tube: TUBE_3IN,
        segments: [{ lengthMm: 600, startTempC: 800, endTempC: 700 }],
        startFixing: 'turbo_outlet',
        endFixing: 'v_band',
        startFlangeAlloyId: carbon,
        joint: { type: 'flex', atMm: 300, partId: part.id },
      }),
    );
    const plan = await planOf(fab, job.id);
    const list = welds(plan);
    expect(list.map((w) => [w.number, w.kind, w.pair, w.filler])).toEqual([
      // AWS A5.9 annex A: ER309L joins austenitic stainless to carbon steel (from memory).
      ['W1', 'tube_to_flange', 'Type 321 (S32100) to Carbon steel 1020 (G10200)', 'ER309L'],
      // AWS A5.9 annex A: ER347 for 321 and 347, the titanium of 321 does not cross the arc (from memory); the demo cuffs are 321.
      ['W2', 'tube_to_flex', 'Type 321 (S32100) to Type 321 (S32100)', 'ER347'],
      ['W3', 'tube_to_flex', 'Type 321 (S32100) to Type 321 (S32100)', 'ER347'],
      ['W4', 'tube_to_flange', 'Type 321 (S32100) to Type 321 (S32100)', 'ER347'],
    ]);
    const flange = list[0];
    expect(flange.fillerSpec).toBe('AWS A5.9');
    expect(flange.source).toMatch(/AWS A5\.9/);
    expect(flange.purge).toMatch(/Argon back-purge on the stainless or nickel side/);
    expect(flange.fumes.join(' ')).toMatch(/hexavalent chromium/);
    expect(flange.fumes.join(' ')).toMatch(/Nickel/);
    expect(plan.governs).toMatch(/qualified welding procedure specification \(WPS\) and qualified welders govern/);
    expect(plan.openCount).toBe(0);
  });

  it('when titanium is flanged to carbon steel, then that weld is refused with the reason and no filler', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const job = await newJob(fab, 'Titanium to steel');
    await newRun(fab, job.id, runBody(ti2, 300, { startFixing: 'flange', endFixing: 'free_end', startFlangeAlloyId: carbon }));
    const [w] = welds(await planOf(fab, job.id));
    expect(w.status).toBe('refused');
    expect(w.filler).toBeNull();
    expect(w.message).toMatch(/^Titanium is never fusion-welded to Carbon steel 1020 \(G10200\)/);
  });

  it('when a pair has no rule, then the weld says "no rule for this pair" and guesses nothing', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const job = await newJob(fab, 'No rule');
    // The seed table pairs Alloy 718 only with itself, stainless and carbon steel, so 718 to 625 has no rule.
    await newRun(fab, job.id, runBody(a718, 600, { startFixing: 'flange', endFixing: 'free_end', startFlangeAlloyId: a625 }));
    const plan = await planOf(fab, job.id);
    const [w] = welds(plan);
    expect(w.status).toBe('no_rule');
    expect(w.filler).toBeNull();
    expect(w.message).toMatch(/^No rule for this pair \(Alloy 718 \(N07718\) to Alloy 625 \(N06625\)\)/);
    expect(plan.openCount).toBe(1);
  });

  it('when the fitted flex part states no cuff alloy, then its cuff welds name no filler; once it states 304, they pair 321 to 304', async () => {
    const admin = await signedIn(t.app, 'admin');
    const part = (await admin.get('/api/flex-parts')).body.items.find((p: { code: string }) => p.code === 'DL-FX-63-250');
    const job = await newJob(admin, 'Cuff alloy');
    const body = runBody(s321, 700, { tube: { odMm: 63.5, wallMm: 1.651 }, startFixing: 'sliding_bracket', endFixing: 'sliding_bracket', joint: { type: 'flex', atMm: 500, partId: part.id } });
    await newRun(admin, job.id, body);
    expect((await admin.patch(`/api/flex-parts/${part.id}`).send({ cuffUns: null })).status).toBe(200);
    const unstated = welds(await planOf(admin, job.id));
    expect(unstated.map((w) => [w.status, w.filler])).toEqual([
      ['metal_unknown', null],
      ['metal_unknown', null],
    ]);
    expect(unstated[0].message).toMatch(/does not state its cuff alloy/);
    expect((await admin.patch(`/api/flex-parts/${part.id}`).send({ cuffUns: 's30400' })).body.flexPart.cuffUns).toBe('S30400');
    const stated = welds(await planOf(admin, job.id));
    // AWS A5.9 annex: ER347, the stabilised filler of the stabilised side, for 304 to 321 (from memory).
    expect(stated.map((w) => [w.pair, w.filler])).toEqual([
      ['Type 321 (S32100) to Type 304/304L (S30400)', 'ER347'],
      ['Type 304/304L (S30400) to Type 321 (S32100)', 'ER347'],
    ]);
    // Back to the seed's cuff, so the demo job's plan below sees the part as seeded.
    expect((await admin.patch(`/api/flex-parts/${part.id}`).send({ cuffUns: 'S32100' })).status).toBe(200);
  });

  it('when a run names a flange alloy that is not in the catalogue, then the run is refused with the field named', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const job = await newJob(fab, 'Bad flange');
    const res = await fab.post(`/api/jobs/${job.id}/runs`).send(runBody(s321, 600, { endFlangeAlloyId: 'no-such-alloy' }));
    expect(res.status).toBe(400);
    expectErrorShape(res.body, 'invalid_input');
    expect(res.body.error.fields.endFlangeAlloyId).toBe('No published alloy with this id');
  });

  it('when a job does not exist, then its weld plan is 404', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const res = await fab.get('/api/jobs/nope/weld-plan');
    expect(res.status).toBe(404);
    expectErrorShape(res.body, 'not_found');
  });
});

describe('the weld rules table', () => {
  it('when an engineer edits a rule, then its version goes up, a revision records the change, and the weld plan uses the new filler', async () => {
    const eng = await signedIn(t.app, 'engineer');
    const rule: WeldRuleView = (await eng.get('/api/weld-rules')).body.items.find((r: WeldRuleView) => r.key === 'stabilised');
    expect(rule).toMatchObject({ filler: 'ER347', version: 1 });
    const res = await eng.patch(`/api/weld-rules/${rule.id}`).send({ procedureRef: 'WPS-321-07', note: 'Shop procedure qualified' });
    expect(res.status).toBe(200);
    expect(res.body.rule).toMatchObject({ procedureRef: 'WPS-321-07', version: 2, updatedBy: expect.any(String) });
    const revisions: WeldRuleRevisionView[] = (await eng.get(`/api/weld-rules/${rule.id}/revisions`)).body.items;
    expect(revisions.map((r) => [r.version, r.action])).toEqual([
      [2, 'edited'],
      [1, 'created'],
    ]);
    expect(revisions[0]).toMatchObject({ note: 'Shop procedure qualified', diff: [{ path: 'procedureRef', before: '', after: 'WPS-321-07' }] });

    const fab = await signedIn(t.app, 'fabricator');
    const job = await newJob(fab, 'Procedure reference');
    await newRun(fab, job.id, runBody(s321, 600, { startFixing: 'flange', endFixing: 'free_end' }));
    expect(welds(await planOf(fab, job.id))[0]).toMatchObject({ filler: 'ER347', procedureRef: 'WPS-321-07', rule: { id: rule.id, version: 2 } });
  });

  it('when a new rule covers a pair another rule already covers, then it is refused with 409 naming the other rule', async () => {
    const admin = await signedIn(t.app, 'admin');
    const body = { sideA: ['S32100'], sideB: ['G10200'], filler: 'ER312', fillerSpec: 'AWS A5.9', purge: 'Argon', source: 'common practice, no published source' };
    const res = await admin.post('/api/weld-rules').send(body);
    expect(res.status).toBe(409);
    expectErrorShape(res.body, 'rule_overlap');
    expect(res.body.error.message).toMatch(/ER309L already covers S32100 to G10200/);
  });

  it('when a rule would join titanium to steel, then it is refused', async () => {
    const admin = await signedIn(t.app, 'admin');
    const body = { sideA: ['R50400'], sideB: ['S30400'], filler: 'ERTi-2', fillerSpec: 'AWS A5.16', purge: 'Argon', source: 'none' };
    const res = await admin.post('/api/weld-rules').send(body);
    expect(res.status).toBe(400);
    expectErrorShape(res.body, 'never_fusion_welded');
  });

  it('when an admin adds a rule and then deletes it, then it starts at version 1, is gone after the delete, and its revisions outlive it', async () => {
    const admin = await signedIn(t.app, 'admin');
    const body = { sideA: ['N07718'], sideB: ['N06625'], filler: 'ERNiCrMo-3', fillerSpec: 'AWS A5.14', purge: 'Argon back-purge on the root side', source: 'common practice, no published source' };
    const created = await admin.post('/api/weld-rules').send(body);
    expect(created.status).toBe(201);
    expect(created.body.rule).toMatchObject({ ...body, notes: '', procedureRef: '', version: 1, key: null });
    expect((await admin.delete(`/api/weld-rules/${created.body.rule.id}`)).status).toBe(204);
    expect((await admin.get(`/api/weld-rules/${created.body.rule.id}`)).status).toBe(404);
    const revisions: WeldRuleRevisionView[] = (await admin.get(`/api/weld-rules/${created.body.rule.id}/revisions`)).body.items;
    expect(revisions.map((r) => r.action)).toEqual(['deleted', 'created']);
  });

  it('when a fabricator or a salesperson tries to change a rule, then it is forbidden; both can read the table', async () => {
    for (const role of ['fabricator', 'sales'] as const) {
      const c = await signedIn(t.app, role);
      const list = await c.get('/api/weld-rules');
      expect(list.status).toBe(200);
      expect(list.body.items.length).toBeGreaterThan(10);
      const res = await c.patch(`/api/weld-rules/${list.body.items[0].id}`).send({ filler: 'ER999' });
      expect(res.status).toBe(403);
      expectErrorShape(res.body, 'forbidden');
    }
  });
});

describe('the demo jobs', () => {
  it('when the demo road-car downpipe is planned, then its 321 run shows the carbon-steel turbo flange with ER309L and its cuffs with ER347', async () => {
    const sales = await signedIn(t.app, 'sales');
    const job = (await sales.get('/api/jobs')).body.items.find((j: { name: string }) => j.name === 'Road car downpipe');
    const plan = await planOf(sales, job.id);
    const first = plan.runs[0].welds;
    expect(first.map((w) => [w.where, w.pair, w.filler])).toEqual([
      ['Start: Turbo outlet', 'Type 321 (S32100) to Carbon steel 1020 (G10200)', 'ER309L'],
      ['Flex part, inlet cuff', 'Type 321 (S32100) to Type 321 (S32100)', 'ER347'],
      ['Flex part, outlet cuff', 'Type 321 (S32100) to Type 304/304L (S30400)', 'ER347'],
    ]);
  });
});
