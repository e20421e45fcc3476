import { DEMO_SHOP_SETTINGS } from '../../shared/schemas/shop-settings';
import { alloyId, jobDetail, newJob, newRun, runBody } from './jobs-helpers';
import { createTestApp, expectErrorShape, signedIn, type TestApp } from './test-app';
import { wordPhrase } from '../../shared/units';

let t: TestApp;
let s321: string;
beforeAll(async () => {
  t = await createTestApp();
  s321 = await alloyId(t, 'S32100');
});
afterAll(() => t.close());

const codes = (job: { system: { findings: { code: string }[] } }) => job.system.findings.map((f) => f.code);

describe('the job as a system', () => {
  it('when a run is held by two anchors with no joint, then the job detail flags the stretch', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const job = await newJob(fab, 'Two anchors');
    await newRun(fab, job.id, runBody(s321, 600, { startFixing: 'anchor_bracket', endFixing: 'flange' }));
    const detail = await jobDetail(fab, job.id);
    const f = detail.system.findings.find((x) => x.code === 'STRETCH_WITHOUT_JOINT');
    expect(f?.severity).toBe('danger');
    expect(wordPhrase(f?.message ?? '', 'metric')).toMatch(/held at both ends with no joint/);
  });

  it('when a fuel line sits 20 mm from the hot end of a downpipe, then it is flagged as too close with the fire caution', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const job = await newJob(fab, 'Fuel line');
    const run = await newRun(
      fab,
      job.id,
      runBody(s321, 850, {
        startFixing: 'turbo_outlet',
        endFixing: 'free_end',
        segments: [{ lengthMm: 600, startTempC: 850, endTempC: 700 }],
        supports: [{ kind: 'hanger', atMm: 200 }],
        nearby: [{ kind: 'fuel_line', label: 'Feed line', atMm: 10, coldGapMm: 20, direction: 'beside' }],
      }),
    );
    expect(run.nearby).toEqual([{ kind: 'fuel_line', label: 'Feed line', atMm: 10, coldGapMm: 20, direction: 'beside' }]);
    const detail = await jobDetail(fab, job.id);
    expect(codes(detail)).toContain('NEARBY_TOO_CLOSE');
    const item = detail.system.nearby[0];
    // Default minimum 150 mm for a fuel line (common practice, no published source); the pipe only swells by a fraction of a mm.
    expect(item.minimumMm).toBe(150);
    expect(item.hotGapMm).toBeLessThan(20);
    expect(item.hotGapMm).toBeGreaterThan(19);
    expect(wordPhrase(detail.system.findings.find((x) => x.code === 'NEARBY_TOO_CLOSE')?.message ?? '', 'metric')).toMatch(/fire risk/);
  });

  it('when the shop lowers its fuel-line gap, then the same item passes', async () => {
    const admin = await signedIn(t.app, 'admin');
    const put = await admin.put('/api/settings').send({ ...DEMO_SHOP_SETTINGS, nearbyMinimumsMm: { ...DEMO_SHOP_SETTINGS.nearbyMinimumsMm, fuel_line: 10 } });
    expect(put.status).toBe(200);
    const fab = await signedIn(t.app, 'fabricator');
    const job = await newJob(fab, 'Fuel line, shielded shop rule');
    await newRun(fab, job.id, runBody(s321, 850, { startFixing: 'turbo_outlet', endFixing: 'free_end', supports: [{ kind: 'hanger', atMm: 200 }], nearby: [{ kind: 'fuel_line', label: '', atMm: 10, coldGapMm: 20, direction: 'beside' }] }));
    expect(codes(await jobDetail(fab, job.id))).not.toContain('NEARBY_TOO_CLOSE');
    await admin.put('/api/settings').send(DEMO_SHOP_SETTINGS);
  });

  it('when a support or item lies beyond the run, then it is refused with its path and nothing is saved', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const job = await newJob(fab, 'Out of the run');
    const res = await fab.post(`/api/jobs/${job.id}/runs`).send(runBody(s321, 600, { supports: [{ kind: 'sliding', atMm: 1500 }], nearby: [{ kind: 'wiring', label: '', atMm: 2000, coldGapMm: 50, direction: 'beside' }] }));
    expect(res.status).toBe(400);
    expectErrorShape(res.body, 'invalid_input');
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['nearby.0.atMm', 'supports.0.atMm']);
    expect((await jobDetail(fab, job.id)).runs).toHaveLength(0);
  });

  it('when the demo jobs are read, then they carry supports and nearby items, the plan says what each support allows, and the brake line is flagged', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const jobs = (await fab.get('/api/jobs')).body.items as { id: string; name: string }[];
    const hill = jobs.find((j) => j.name.startsWith('Hill-climb'))!;
    const detail = await jobDetail(fab, hill.id);
    expect(detail.runs.some((r) => r.supports.length > 0)).toBe(true);
    expect(detail.runs.some((r) => r.nearby.length > 0)).toBe(true);
    expect(detail.system.supports.some((s) => s.role === 'slide' && s.movementMm > 0)).toBe(true);
    expect(detail.system.findings.some((f) => f.code === 'NEARBY_TOO_CLOSE' && /Rear brake line/.test(wordPhrase(f.message, 'metric')))).toBe(true);
    for (const j of jobs) expect((await jobDetail(fab, j.id)).runs.every((r) => Array.isArray(r.supports) && Array.isArray(r.nearby))).toBe(true);
  });
});
