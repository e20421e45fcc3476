import type { AlloyDetail, AlloySummary } from '../../shared/schemas/alloy';
import { enStainlessElongation, meanCteTable } from '../shared/published';
import { client, createTestApp, expectErrorShape, signedIn, type TestApp } from './test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

// EN 1993-1-2 Annex C, austenitic stainless: a mean-CTE table generated from the closed form (20 °C basis).
const EN_304 = {
  referenceTempC: 20,
  cte: meanCteTable(enStainlessElongation, [100, 200, 300, 400, 500, 600, 700, 800, 900, 1000]),
  modulus: [{ tempC: 20, gpa: 193 }],
  yield: [{ tempC: 20, mpa: 205 }],
  densityKgM3: 8000,
  maxContinuousC: 925,
  maxIntermittentC: 870,
  pricePerKg: 5.2,
};

const body = (over: Record<string, unknown> = {}) => ({
  alloy: EN_304,
  tube: { odMm: 76.2, wallMm: 1.651 },
  installTempC: 20,
  segments: [{ lengthMm: 1000, startTempC: 800, endTempC: 800 }],
  ...over,
});

async function publishedId(uns: string): Promise<string> {
  const fab = await signedIn(t.app, 'fabricator');
  return (await fab.get('/api/alloys').query({ search: uns })).body.items.find((a: AlloySummary) => a.uns === uns).id;
}

describe('POST /api/calc/run', () => {
  it('when nobody is signed in, then 401', async () => {
    const res = await client(t.app).post('/api/calc/run').send(body());
    expect(res.status).toBe(401);
    expectErrorShape(res.body, 'signed_out');
  });

  it.each(['admin', 'engineer', 'fabricator', 'sales'] as const)('when a %s asks, then the engine answers', async (role) => {
    const res = await (await signedIn(t.app, role)).post('/api/calc/run').send(body());
    expect(res.status).toBe(200);
  });

  it('when 1 m of 304 goes from 20 to 800 °C with inline EN data, then it grows 14.848 mm (EN 1993-1-2 Annex C)', async () => {
    const res = await (await signedIn(t.app, 'fabricator')).post('/api/calc/run').query({ include: 'curves' }).send(body());
    expect(res.status).toBe(200);
    // Check value from EN 1993-1-2 Annex C at 800 °C: Δl/l = 14.84845e-3 (reference-data §1.1).
    expect(res.body.growthMm).toBeCloseTo(14.848, 2);
    expect(res.body.curve.length).toBeGreaterThanOrEqual(50);
    expect(res.body.curve.at(-1).growthMm).toBe(res.body.growthMm);
    expect(res.body.peakTempC).toBe(800);
    expect(res.body.limit.status).toBe('ok');
    // Tube mass per metre: ρ·π·(OD − t)·t = 8000·π·(76.2 − 1.651)·1.651e-6 = 3.0933 kg (reference-data §6).
    expect(res.body.massKg).toBeCloseTo(3.0933, 3);
    expect(res.body.materialCost).toBeCloseTo(3.0933 * 5.2, 2);
    expect(res.body.alloy).toBeNull();
    expect(res.body.warnings.map((w: { code: string }) => w.code)).toEqual(expect.any(Array));
  });

  it('when asked plainly, then the answer carries the growth curve at a drawing\'s resolution, ending at the same growth, and no growth-per-metre curve or flex candidates', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const run = body({ segments: [{ lengthMm: 1000, startTempC: 800, endTempC: 300 }], flex: {} });
    const plain = await fab.post('/api/calc/run').send(run);
    const full = await fab.post('/api/calc/run').query({ include: 'curves' }).send(run);
    expect(plain.status).toBe(200);
    expect(plain.body.growthMm).toBe(full.body.growthMm);
    expect(plain.body.curve.length).toBeLessThanOrEqual(30);
    expect(plain.body.curve.length).toBeLessThan(full.body.curve.length);
    expect(plain.body.curve.at(-1).growthMm).toBeCloseTo(full.body.growthMm, 3);
    expect(plain.body.growthPerMetreCurve).toEqual([]);
    expect(full.body.growthPerMetreCurve.length).toBeGreaterThan(10);
    expect(plain.body.flex.candidates).toEqual([]);
    expect(full.body.flex.candidates.length).toBeGreaterThan(0);
    expect(plain.body.flex.chosen).toEqual(full.body.flex.chosen);
    expect(JSON.stringify(plain.body).length).toBeLessThan(JSON.stringify(full.body).length / 2);
    const bad = await fab.post('/api/calc/run').query({ include: 'everything' }).send(run);
    expect(bad.status).toBe(400);
    expectErrorShape(bad.body, 'invalid_query');
  });

  it('when the alloy comes from the catalogue, then its published table is used and its version is named', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const id = await publishedId('S32100');
    const res = await fab.post('/api/calc/run').send(body({ alloy: undefined, alloyId: id, segments: [{ lengthMm: 1000, startTempC: 600, endTempC: 600 }] }));
    expect(res.status).toBe(200);
    // 321 on EN 1993-1-2 Annex C: Δl/l from 20 to 600 °C = 10.68738e-3 (reference-data §1.1), so 1000 mm grows 10.687 mm.
    expect(res.body.growthMm).toBeCloseTo(10.687, 2);
    expect(res.body.alloy).toMatchObject({ id, uns: 'S32100', designation: 'Type 321', version: 1 });
  });

  it('when new data for the alloy is published, then the next calculation follows it and names the new version', async () => {
    const admin = await signedIn(t.app, 'admin');
    const id = await publishedId('S34700');
    const detail = (await admin.get(`/api/alloys/${id}`)).body.alloy as AlloyDetail;
    const run = body({ alloy: undefined, alloyId: id, segments: [{ lengthMm: 1000, startTempC: 600, endTempC: 600 }] });
    const before = (await admin.post('/api/calc/run').send(run)).body;
    const cte = detail.published!.cte.map((p) => (p.tempC === 600 ? { ...p, meanUmPerMK: p.meanUmPerMK + 1 } : p));
    expect((await admin.patch(`/api/alloys/${id}`).send({ cte })).status).toBe(200);
    const draftOnly = (await admin.post('/api/calc/run').send(run)).body;
    expect(draftOnly.growthMm).toBe(before.growthMm);
    await admin.post(`/api/alloys/${id}/publish`).send({ note: 'Checked' });
    const after = (await admin.post('/api/calc/run').send(run)).body;
    expect(after.alloy.version).toBe(2);
    // One more µm/m·K over 580 K adds 0.58 mm per metre.
    expect(after.growthMm - before.growthMm).toBeCloseTo(0.58, 6);
  });

  it('when flex sizing is asked without parts, then it picks from the catalogue’s flex parts that fit the bore', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const res = await fab
      .post('/api/calc/run')
      .send(body({ tube: { odMm: 63.5, wallMm: 1.651 }, segments: [{ lengthMm: 400, startTempC: 750, endTempC: 650 }], flex: {} }));
    expect(res.status).toBe(200);
    // The shop's design basis (demo settings): 70 % of rated travel, −20 °C coldest start.
    expect(res.body.flex.travelShare).toBe(0.7);
    expect(res.body.flex.coldestAmbientC).toBe(-20);
    expect(res.body.flex.chosen.presetMm).toBeLessThanOrEqual(0.7 * res.body.flex.chosen.part.ratedAxialExtensionMm);
    const parts = (await fab.get('/api/flex-parts')).body.items;
    const chosen = res.body.flex.chosen;
    expect(chosen).not.toBeNull();
    const part = parts.find((p: { id: string }) => p.id === chosen.part.id);
    expect(Math.abs(part.boreMm - 63.5)).toBeLessThanOrEqual(1);
    expect(part.maxTempC).toBeGreaterThanOrEqual(750);
  });

  it('when the input is bad, then 400 names every bad path', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const res = await fab.post('/api/calc/run').send({
      alloy: EN_304,
      tube: { odMm: 50, wallMm: 25 },
      installTempC: 'warm',
      segments: [{ lengthMm: -5, startTempC: 600, endTempC: 500 }, { lengthMm: 0, startTempC: 500, endTempC: 400 }],
    });
    expect(res.status).toBe(400);
    expectErrorShape(res.body, 'invalid_input');
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['installTempC', 'segments.0.lengthMm', 'segments.1.lengthMm', 'tube.wallMm']);
  });

  it('when there are no segments or no alloy, then 400 says so', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const res = await fab.post('/api/calc/run').send({ tube: { odMm: 50, wallMm: 1.5 }, installTempC: 20, segments: [] });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty('segments');
    expect(res.body.error.fields).toHaveProperty('alloyId');
  });

  it('when a temperature is above the alloy’s data, then 400 names that segment, never an extrapolation', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const res = await fab.post('/api/calc/run').send(body({ segments: [{ lengthMm: 500, startTempC: 700, endTempC: 700 }, { lengthMm: 500, startTempC: 1100, endTempC: 900 }] }));
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['segments.1.startTempC']);
    expect(res.body.error.fields['segments.1.startTempC']).toMatch(/1000/);
  });

  it('when the alloy id is not a published alloy, then 400 names alloyId', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const res = await fab.post('/api/calc/run').send(body({ alloy: undefined, alloyId: 'nope' }));
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ alloyId: 'No published alloy with this id' });
  });

  it('when a slip joint mixes a hot 304 spigot in a cooler sleeve, then too small a clearance seizes (reference-data §4.2)', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const slip = (clearance: number) => ({
      inner: { tempC: 850 },
      outer: { tempC: 700 },
      coldClearanceMm: clearance,
      coldEngagementMm: 80,
      coldAxialGapMm: 25,
      toleranceMm: 0.02,
    });
    const run = { tube: { odMm: 63.5, wallMm: 1.651 }, segments: [{ lengthMm: 600, startTempC: 850, endTempC: 700 }] };
    // Differential growth 63.5 × (ε(850) − ε(700)) ≈ 0.201 mm from EN Annex C (reference-data §4.2, derived).
    const tight = (await fab.post('/api/calc/run').send(body({ ...run, slip: slip(0.25) }))).body;
    const fitted = (await fab.post('/api/calc/run').send(body({ ...run, slip: slip(0.45) }))).body;
    const hot = tight.slip.states.find((s: { state: string }) => s.state === 'hot');
    expect(hot.differentialGrowthMm).toBeCloseTo(0.201, 2);
    // (0.25 − 0.201)/2 − 0.02 tolerance − 2 × 0.025 scale < 0.05 mm minimum (common practice allowances).
    expect(tight.slip.checks.find((c: { code: string }) => c.code === 'hot_min_clearance').ok).toBe(false);
    expect(fitted.slip.verdict).toBe('ok');
  });
});
