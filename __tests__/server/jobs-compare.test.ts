import type { CompareRow, CompareView, RunView } from '../../shared/schemas/jobs';
import { createTestApp, expectErrorShape, signedIn, type TestApp } from './test-app';
import { alloyId, newJob, newRun, runBody } from './jobs-helpers';

let t: TestApp;
let s304: string;
let s321: string;
let s409: string;
let n625: string;
beforeAll(async () => {
  t = await createTestApp();
  [s304, s321, s409, n625] = await Promise.all(['S30400', 'S32100', 'S40910', 'N06625'].map((uns) => alloyId(t, uns)));
});
afterAll(() => t.close());

async function runAt(tempC: number, alloy = s304): Promise<RunView> {
  const fab = await signedIn(t.app, 'fabricator');
  return newRun(fab, (await newJob(fab)).id, runBody(alloy, tempC, { joint: { type: 'flex' } }));
}

describe('GET /api/runs/:id/compare', () => {
  it('when three alloys are compared for a 600 °C run of Type 304, then each row’s figures and its difference from 304 agree', async () => {
    const run = await runAt(600);
    const sales = await signedIn(t.app, 'sales');
    const res = await sales.get(`/api/runs/${run.id}/compare`).query({ alloyIds: `${s321},${n625},${s409}` });
    expect(res.status).toBe(200);
    const view = res.body as CompareView;
    expect(view.runId).toBe(run.id);
    expect(view.current.alloy).toMatchObject({ id: s304, uns: 'S30400', version: 1 });
    expect(view.current.difference).toBeNull();
    // EN 1993-1-2 Annex C at 600 °C: 10.687 mm per metre (reference-data §5); the same as the run's own result.
    expect(view.current.figures!.growthMm).toBeCloseTo(10.687, 2);
    expect(view.current.figures!.growthMm).toBe(run.result!.growthMm);
    expect(view.current.figures).toMatchObject({ massKg: run.result!.massKg, marginC: run.result!.limit.marginC, currency: 'EUR' });

    expect(view.candidates.map((c) => c.alloy!.uns)).toEqual(['S32100', 'N06625', 'S40910']);
    const [c321, c625] = view.candidates;
    // 321 at 600 °C on EN 1993-1-2 Annex C: 10.687 mm per metre (reference-data §1.1).
    expect(c321.figures!.growthMm).toBeCloseTo(10.687, 2);
    for (const c of [c321, c625] as CompareRow[]) {
      const f = c.figures!;
      const base = view.current.figures!;
      expect(c.problem).toBeNull();
      expect(c.alloy!.version).toBe(1);
      expect(c.difference).toEqual({
        growthMm: f.growthMm - base.growthMm,
        marginC: f.marginC - base.marginC,
        massKg: f.massKg - base.massKg,
        materialCost: f.materialCost - base.materialCost,
      });
      expect(['ok', 'caution', 'over']).toContain(f.limitStatus);
      expect(typeof f.jointNeeded === 'boolean' || f.jointNeeded === null).toBe(true);
    }
    // Nickel alloy 625 grows less than the austenitic stainless at the same temperature (reference-data §1.2, 600/625 column vs 18Cr-8Ni).
    expect(c625.difference!.growthMm).toBeLessThan(0);
  });

  it('when a candidate’s data does not reach the run’s temperature, then that row has a problem and the others still compare', async () => {
    const run = await runAt(600);
    const fab = await signedIn(t.app, 'fabricator');
    const res = await fab.get(`/api/runs/${run.id}/compare`).query({ alloyIds: `${s409},${s321}` });
    expect(res.status).toBe(200);
    const [c409, c321] = (res.body as CompareView).candidates;
    // Type 409's seeded table ends at 500 °C.
    expect(c409).toMatchObject({ figures: null, difference: null, problem: { code: 'outside_data' }, alloy: { uns: 'S40910' } });
    expect(c321.figures).not.toBeNull();
  });

  it('when a candidate is adopted, then the run computes with it and matches what compare showed', async () => {
    const run = await runAt(600);
    const fab = await signedIn(t.app, 'fabricator');
    const shown = ((await fab.get(`/api/runs/${run.id}/compare`).query({ alloyIds: `${s321},${n625}` })).body as CompareView).candidates[0];
    const adopted = await fab.patch(`/api/runs/${run.id}`).send({ alloyId: s321 });
    expect(adopted.status).toBe(200);
    expect(adopted.body.run.alloy.id).toBe(s321);
    expect(adopted.body.run.result.growthMm).toBe(shown.figures!.growthMm);
    expect(adopted.body.run.result.massKg).toBe(shown.figures!.massKg);
  });

  it.each([
    ['one alloy', () => s321],
    ['five alloys', () => [s321, n625, s409, s304, s321].join(',')],
    ['the same alloy twice', () => `${s321},${s321}`],
    ['an unknown id', () => `${s321},no-such-alloy`],
    ['nothing', () => ''],
  ])('when asked with %s, then 400 names alloyIds', async (_what, ids) => {
    const run = await runAt(500);
    const fab = await signedIn(t.app, 'fabricator');
    const res = await fab.get(`/api/runs/${run.id}/compare`).query({ alloyIds: ids() });
    expect(res.status).toBe(400);
    expectErrorShape(res.body, 'invalid_query');
    expect(Object.keys(res.body.error.fields)).toEqual(['alloyIds']);
  });

  it('when a candidate has been retired, then 400 names alloyIds; when the run’s own alloy is retired, then candidates compare without differences', async () => {
    const admin = await signedIn(t.app, 'admin');
    const s439 = await alloyId(t, 'S43035');
    const run = await runAt(400, s439);
    expect((await admin.post(`/api/alloys/${s439}/retire`).send({})).status).toBe(200);
    try {
      const asCandidate = await admin.get(`/api/runs/${(await runAt(400)).id}/compare`).query({ alloyIds: `${s439},${s321}` });
      expect(asCandidate.status).toBe(400);
      expect(asCandidate.body.error.fields.alloyIds).toContain(s439);

      const own = await admin.get(`/api/runs/${run.id}/compare`).query({ alloyIds: `${s304},${s321}` });
      expect(own.status).toBe(200);
      const view = own.body as CompareView;
      expect(view.current).toMatchObject({ figures: null, problem: { code: 'alloy_retired' }, alloy: { status: 'retired' } });
      expect(view.candidates.every((c) => c.figures !== null && c.difference === null)).toBe(true);
    } finally {
      await admin.post(`/api/alloys/${s439}/restore`).send({});
    }
  });

  it('when the run does not exist, then 404', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const res = await fab.get('/api/runs/nope/compare').query({ alloyIds: `${s304},${s321}` });
    expect(res.status).toBe(404);
  });
});
