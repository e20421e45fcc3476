import type { AlloyDetail, AlloySummary } from '../../shared/schemas/alloy';
import { ROLES, type Role } from '../../shared/schemas/auth';
import { client, createTestApp, expectErrorShape, signedIn, type TestApp } from './test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

async function alloyByUns(uns: string): Promise<AlloySummary> {
  const admin = await signedIn(t.app, 'admin');
  const res = await admin.get('/api/alloys').query({ search: uns, includeDrafts: 'true', includeRetired: 'true' });
  const found = res.body.items.find((a: AlloySummary) => a.uns === uns);
  if (!found) throw new Error(`no alloy ${uns}`);
  return found;
}

async function sourceId(): Promise<string> {
  const eng = await signedIn(t.app, 'engineer');
  return (await eng.get('/api/sources')).body.items[0].id;
}

async function newAlloyBody(uns: string) {
  const src = await sourceId();
  return {
    designation: `Alloy ${uns.slice(1, 4)}`,
    uns,
    family: 'nickel_chromium',
    densityKgM3: 8300,
    densitySourceId: src,
    maxContinuousC: 1000,
    maxIntermittentC: 950,
    limitsSourceId: src,
    pricePerKg: 30,
    currency: 'EUR',
    priceSetOn: '2026-11-20',
    priceIsDemo: true,
    referenceTempC: 20,
    notes: 'Test alloy made by this test.',
    warningRanges: [],
    cte: [
      { tempC: 100, meanUmPerMK: 13, sourceId: src },
      { tempC: 1000, meanUmPerMK: 16, sourceId: src },
    ],
    modulus: [{ tempC: 20, gpa: 205, sourceId: src }],
    yield: [{ tempC: 20, mpa: 300, sourceId: src }],
  };
}

describe('reading the catalogue', () => {
  it('when a fabricator lists alloys, then the seeded published catalogue comes back with a total', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const res = await fab.get('/api/alloys');
    expect(res.status).toBe(200);
    expect(res.body.total).toBeGreaterThanOrEqual(15);
    expect(res.body.items.every((a: AlloySummary) => a.status === 'published' && a.version === 1)).toBe(true);
  });

  it('when searching by UNS or designation, then only matches come back', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const byUns = await fab.get('/api/alloys').query({ search: 's32100' });
    expect(byUns.body.items.map((a: AlloySummary) => a.uns)).toEqual(['S32100']);
    const byName = await fab.get('/api/alloys').query({ search: 'type 321' });
    expect(byName.body.items.map((a: AlloySummary) => a.designation)).toEqual(['Type 321', 'Type 321H']);
  });

  it('when filtered by family and minimum service temperature, then every item meets both', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const res = await fab.get('/api/alloys').query({ family: 'austenitic_stainless', minServiceC: 900 });
    expect(res.body.items.length).toBeGreaterThan(0);
    for (const a of res.body.items as AlloySummary[]) {
      expect(a.family).toBe('austenitic_stainless');
      expect(a.maxContinuousC).toBeGreaterThanOrEqual(900);
    }
  });

  it('when sorted by limit, expansion or price, then the order follows that value', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const limit = (await fab.get('/api/alloys').query({ sort: 'limit' })).body.items as AlloySummary[];
    expect(limit.map((a) => a.maxContinuousC)).toEqual([...limit.map((a) => a.maxContinuousC)].sort((a, b) => b - a));
    const price = (await fab.get('/api/alloys').query({ sort: 'price' })).body.items as AlloySummary[];
    expect(price.map((a) => a.pricePerKg)).toEqual([...price.map((a) => a.pricePerKg)].sort((a, b) => a - b));
    const exp = (await fab.get('/api/alloys').query({ sort: 'expansion', atC: 500 })).body.items as AlloySummary[];
    const known = exp.filter((a) => a.growthAtMmPerM !== null).map((a) => a.growthAtMmPerM as number);
    expect(known).toEqual([...known].sort((a, b) => a - b));
    // Carbon steel grows less than austenitic stainless at 500 °C (EN 1993-1-2: 6.76 vs 8.68 mm/m).
    const carbon = exp.find((a) => a.family === 'carbon_steel')!;
    const s304 = exp.find((a) => a.uns === 'S30400')!;
    expect(carbon.growthAtMmPerM!).toBeLessThan(s304.growthAtMmPerM!);
  });

  it('when paged, then pages do not overlap and total stays the same', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const p1 = await fab.get('/api/alloys').query({ pageSize: 5, page: 1 });
    const p2 = await fab.get('/api/alloys').query({ pageSize: 5, page: 2 });
    expect(p1.body.items).toHaveLength(5);
    expect(p1.body.total).toBe(p2.body.total);
    const ids1 = p1.body.items.map((a: AlloySummary) => a.id);
    expect(p2.body.items.some((a: AlloySummary) => ids1.includes(a.id))).toBe(false);
  });

  it('when a filter is malformed, then 400 names it', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const res = await fab.get('/api/alloys').query({ family: 'unobtanium', sort: 'colour' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['family', 'sort']);
  });

  it('when an alloy is opened, then its tables come with the sources they cite', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const s321 = await alloyByUns('S32100');
    const res = await fab.get(`/api/alloys/${s321.id}`);
    expect(res.status).toBe(200);
    const alloy = res.body.alloy as AlloyDetail;
    expect(alloy.draft).toBeNull();
    expect(alloy.published!.cte.length).toBeGreaterThanOrEqual(3);
    const sourceIds = new Set(alloy.sources.map((s) => s.id));
    for (const p of [...alloy.published!.cte, ...alloy.published!.modulus, ...alloy.published!.yield]) {
      expect(sourceIds.has(p.sourceId)).toBe(true);
    }
  });

  it('when an unknown alloy is opened, then 404 in the error shape', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const res = await fab.get('/api/alloys/nope');
    expect(res.status).toBe(404);
    expectErrorShape(res.body, 'not_found');
  });
});

describe('who may change the catalogue (every role × route)', () => {
  let nextUns = 2000;
  const cells: { what: string; call: (c: Awaited<ReturnType<typeof signedIn>>, id: string) => Promise<{ status: number }>; allowed: Role[] }[] = [
    { what: 'list alloys', call: (c) => c.get('/api/alloys'), allowed: [...ROLES] },
    { what: 'read an alloy', call: (c, id) => c.get(`/api/alloys/${id}`), allowed: [...ROLES] },
    { what: 'read revisions', call: (c, id) => c.get(`/api/alloys/${id}/revisions`), allowed: [...ROLES] },
    { what: 'list sources', call: (c) => c.get('/api/sources'), allowed: [...ROLES] },
    { what: 'list flex parts', call: (c) => c.get('/api/flex-parts'), allowed: [...ROLES] },
    { what: 'create a source', call: (c) => c.post('/api/sources').send({ kind: 'handbook', title: 'A handbook for the test' }), allowed: ['engineer', 'admin'] },
    { what: 'edit an alloy', call: (c, id) => c.patch(`/api/alloys/${id}`).send({ notes: `edited ${Math.random()}` }), allowed: ['engineer', 'admin'] },
    { what: 'review a draft', call: (c, id) => c.get(`/api/alloys/${id}/review`), allowed: ['engineer', 'admin'] },
    { what: 'read an old version', call: (c, id) => c.get(`/api/alloys/${id}/versions/1`), allowed: [...ROLES] },
    { what: 'export the catalogue as CSV', call: (c) => c.get('/api/alloys/export.csv'), allowed: [...ROLES] },
    { what: 'import a CSV', call: (c) => c.post('/api/alloys/import').set('Content-Type', 'text/csv').send('uns,designation,family,density_kg_m3,density_source,max_continuous_c,max_intermittent_c,limits_source,price_per_kg,currency,price_set_on,reference_temp_c,property,temp_c,value,source\n'), allowed: ['engineer', 'admin'] },
    { what: 'create an alloy', call: async (c) => { nextUns += 1; return c.post('/api/alloys').send(await newAlloyBody(`N8${String(nextUns).padStart(4, '0')}`)); }, allowed: ['engineer', 'admin'] },
    { what: 'publish', call: (c, id) => c.post(`/api/alloys/${id}/publish`).send({ note: 'Checked' }), allowed: ['admin'] },
    { what: 'restore a retired alloy', call: async (c, id) => { await (await signedIn(t.app, 'admin')).post(`/api/alloys/${id}/retire`).send({}); return c.post(`/api/alloys/${id}/restore`).send({}); }, allowed: ['admin'] },
    { what: 'change a flex part', call: async (c) => { const parts = (await c.get('/api/flex-parts')).body.items ?? []; return c.patch(`/api/flex-parts/${parts[0]?.id ?? 'none'}`).send({ price: 91 }); }, allowed: ['admin'] },
    { what: 'retire', call: (c, id) => c.post(`/api/alloys/${id}/retire`).send({}), allowed: ['admin'] },
    { what: 'create a flex part', call: (c) => c.post('/api/flex-parts').send({ code: `T-${Math.random().toString(36).slice(2, 8)}`, name: 'Test part', boreMm: 63.5, liveLengthMm: 150, ratedAxialCompressionMm: 10, ratedAxialExtensionMm: 5, lateralOffsetMm: 3, maxTempC: 800, price: 90, currency: 'EUR' }), allowed: ['admin'] },
  ];

  for (const cell of cells) {
    it(`when anonymous tries to ${cell.what}, then 401`, async () => {
      const s316 = await alloyByUns('S31603');
      const anon = client(t.app);
      const res = await cell.call(anon as never, s316.id);
      expect(res.status).toBe(401);
    });
    for (const role of ROLES) {
      const allowed = cell.allowed.includes(role);
      it(`when a ${role} tries to ${cell.what}, then ${allowed ? 'it is allowed' : '403'}`, async () => {
        // A fresh alloy per cell, so publish and retire each have a draft or a published alloy to act on.
        const admin = await signedIn(t.app, 'admin');
        nextUns += 1;
        const uns = `N9${String(nextUns).padStart(4, '0')}`;
        const created = await admin.post('/api/alloys').send(await newAlloyBody(uns));
        const id = created.body.alloy.id as string;
        await admin.post(`/api/alloys/${id}/publish`).send({ note: 'Checked' });
        await admin.patch(`/api/alloys/${id}`).send({ notes: 'an open draft' });
        const res = await cell.call(await signedIn(t.app, role), id);
        if (allowed) expect(res.status).toBeLessThan(300);
        else expect(res.status).toBe(403);
      });
    }
  }

  it('when an engineer creates an alloy, then only engineers and admins can see the unpublished draft', async () => {
    const eng = await signedIn(t.app, 'engineer');
    const created = await eng.post('/api/alloys').send(await newAlloyBody('N91111'));
    expect(created.status).toBe(201);
    const id = created.body.alloy.id;
    expect(created.body.alloy.status).toBe('draft');
    for (const role of ['fabricator', 'sales'] as const) {
      const c = await signedIn(t.app, role);
      expect((await c.get(`/api/alloys/${id}`)).status).toBe(404);
      const list = await c.get('/api/alloys').query({ includeDrafts: 'true', search: 'N91111' });
      expect(list.body.total).toBe(0);
    }
    const list = await eng.get('/api/alloys').query({ includeDrafts: 'true', search: 'N91111' });
    expect(list.body.total).toBe(1);
  });
});

describe('drafts, publishing and history', () => {
  it('when an engineer edits a published alloy, then a draft opens beside it and readers still see the old value', async () => {
    const eng = await signedIn(t.app, 'engineer');
    const fab = await signedIn(t.app, 'fabricator');
    const admin = await signedIn(t.app, 'admin');
    const { id } = await alloyByUns('S34700');
    const before = (await fab.get(`/api/alloys/${id}`)).body.alloy as AlloyDetail;
    const oldDensity = before.published!.densityKgM3;

    const edit = await eng.patch(`/api/alloys/${id}`).send({ densityKgM3: oldDensity + 10, note: 'Mill certificate says so' });
    expect(edit.status).toBe(200);
    expect(edit.body.alloy.draft.densityKgM3).toBe(oldDensity + 10);
    expect(edit.body.alloy.draft.version).toBe(2);
    expect(edit.body.alloy.published.densityKgM3).toBe(oldDensity);
    expect((await fab.get(`/api/alloys/${id}`)).body.alloy.published.densityKgM3).toBe(oldDensity);

    const review = await admin.get(`/api/alloys/${id}/review`);
    expect(review.body.diff).toEqual([{ path: 'densityKgM3', before: oldDensity, after: oldDensity + 10 }]);

    const published = await admin.post(`/api/alloys/${id}/publish`).send({ note: 'Checked' });
    expect(published.status).toBe(200);
    const after = (await fab.get(`/api/alloys/${id}`)).body.alloy as AlloyDetail;
    expect(after.published!.version).toBe(2);
    expect(after.published!.densityKgM3).toBe(oldDensity + 10);

    // The old version stays readable, so a job can say which data it used.
    const v1 = await fab.get(`/api/alloys/${id}/versions/1`);
    expect(v1.status).toBe(200);
    expect(v1.body.version.densityKgM3).toBe(oldDensity);
    expect(v1.body.version.state).toBe('superseded');

    const revisions = (await fab.get(`/api/alloys/${id}/revisions`)).body.items;
    expect(revisions.map((r: { action: string }) => r.action).slice(0, 2)).toEqual(['published', 'edited']);
    expect(revisions[1]).toMatchObject({ note: 'Mill certificate says so', by: expect.any(String) });
  });

  it('when a table point changes, then the diff names the point by temperature', async () => {
    const eng = await signedIn(t.app, 'engineer');
    const { id } = await alloyByUns('S30908');
    const detail = (await eng.get(`/api/alloys/${id}`)).body.alloy as AlloyDetail;
    const cte = detail.published!.cte.map((p, i) => (i === 0 ? { ...p, meanUmPerMK: p.meanUmPerMK + 0.1 } : p));
    const res = await eng.patch(`/api/alloys/${id}`).send({ cte });
    expect(res.status).toBe(200);
    const review = await eng.get(`/api/alloys/${id}/review`);
    expect(review.body.diff).toHaveLength(1);
    expect(review.body.diff[0].path).toBe(`cte@${cte[0].tempC} °C`);
  });

  it('when an edit is invalid, then 400 names the paths and the draft is unchanged', async () => {
    const eng = await signedIn(t.app, 'engineer');
    const { id } = await alloyByUns('S31008');
    const src = await sourceId();
    const res = await eng.patch(`/api/alloys/${id}`).send({
      uns: 'X1',
      cte: [
        { tempC: 500, meanUmPerMK: 17, sourceId: src },
        { tempC: 400, meanUmPerMK: -1, sourceId: src },
      ],
    });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty('uns');
    expect(res.body.error.fields).toHaveProperty(['cte.1.meanUmPerMK']);
    expect((await eng.get(`/api/alloys/${id}`)).body.alloy.draft).toBeNull();
  });

  it('when an edit cites a source that does not exist, then 400 names the point', async () => {
    const eng = await signedIn(t.app, 'engineer');
    const { id } = await alloyByUns('S31008');
    const res = await eng.patch(`/api/alloys/${id}`).send({ densitySourceId: 'no-such-source' });
    expect(res.status).toBe(400);
    expectErrorShape(res.body, 'unknown_source');
    expect(res.body.error.fields).toEqual({ densitySourceId: 'No such source' });
  });

  it('when an edit changes nothing, then 400 no_change', async () => {
    const eng = await signedIn(t.app, 'engineer');
    const { id } = await alloyByUns('S31008');
    const detail = (await eng.get(`/api/alloys/${id}`)).body.alloy as AlloyDetail;
    const res = await eng.patch(`/api/alloys/${id}`).send({ densityKgM3: detail.published!.densityKgM3 });
    expect(res.status).toBe(400);
    expectErrorShape(res.body, 'no_change');
  });

  it('when the UNS belongs to another alloy, then 409 uns_taken', async () => {
    const eng = await signedIn(t.app, 'engineer');
    const res = await eng.post('/api/alloys').send(await newAlloyBody('S32100'));
    expect(res.status).toBe(409);
    expectErrorShape(res.body, 'uns_taken');
  });

  it('when there is no draft, then publishing answers 409 no_draft', async () => {
    const admin = await signedIn(t.app, 'admin');
    const { id } = await alloyByUns('N06625');
    const res = await admin.post(`/api/alloys/${id}/publish`).send({ note: 'Checked' });
    expect(res.status).toBe(409);
    expectErrorShape(res.body, 'no_draft');
  });

  it('when an admin retires an alloy, then readers no longer list it but can still open it; restoring brings it back', async () => {
    const admin = await signedIn(t.app, 'admin');
    const fab = await signedIn(t.app, 'fabricator');
    const { id } = await alloyByUns('S43035');
    expect((await admin.post(`/api/alloys/${id}/retire`).send({ note: 'No longer stocked' })).status).toBe(200);
    expect((await fab.get('/api/alloys').query({ search: 'S43035' })).body.total).toBe(0);
    expect((await fab.get(`/api/alloys/${id}`)).body.alloy.status).toBe('retired');
    expect((await admin.post(`/api/alloys/${id}/restore`).send({})).status).toBe(200);
    expect((await fab.get('/api/alloys').query({ search: 'S43035' })).body.total).toBe(1);
  });
});

describe('flex parts', () => {
  it('when anyone lists flex parts, then the demo shop’s dozen come back sorted by bore', async () => {
    const sales = await signedIn(t.app, 'sales');
    const res = await sales.get('/api/flex-parts');
    expect(res.status).toBe(200);
    expect(res.body.items.length).toBeGreaterThanOrEqual(12);
    const bores = res.body.items.map((p: { boreMm: number }) => p.boreMm);
    expect(bores).toEqual([...bores].sort((a: number, b: number) => a - b));
  });

  it('when an admin deactivates a part, then it leaves the list readers see', async () => {
    const admin = await signedIn(t.app, 'admin');
    const items = (await admin.get('/api/flex-parts')).body.items;
    const res = await admin.patch(`/api/flex-parts/${items[0].id}`).send({ active: false });
    expect(res.status).toBe(200);
    const fab = await signedIn(t.app, 'fabricator');
    const after = (await fab.get('/api/flex-parts')).body.items;
    expect(after.map((p: { id: string }) => p.id)).not.toContain(items[0].id);
    await admin.patch(`/api/flex-parts/${items[0].id}`).send({ active: true });
  });

  it('when a flex part is invalid, then 400 names each field', async () => {
    const admin = await signedIn(t.app, 'admin');
    const res = await admin.post('/api/flex-parts').send({ code: 'X', boreMm: -1 });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(expect.arrayContaining(['code', 'name', 'boreMm', 'liveLengthMm']));
  });
});

describe('revisions of drafts', () => {
  it('when a published alloy has an open draft, then only engineers and admins see its edits in the history', async () => {
    const eng = await signedIn(t.app, 'engineer');
    const admin = await signedIn(t.app, 'admin');
    const { id } = await alloyByUns('S34700');
    const price = (await eng.get(`/api/alloys/${id}`)).body.alloy.published.pricePerKg as number;
    expect((await eng.patch(`/api/alloys/${id}`).send({ pricePerKg: 99.5, note: 'Unreleased price' })).status).toBe(200);

    const seen = async (role: Role) => JSON.stringify((await (await signedIn(t.app, role)).get(`/api/alloys/${id}/revisions`)).body.items);
    for (const role of ['fabricator', 'sales'] as const) {
      const text = await seen(role);
      expect(text).not.toMatch(/99\.5/);
      expect(text).not.toMatch(/Unreleased price/);
    }
    for (const role of ['engineer', 'admin'] as const) expect(await seen(role)).toMatch(/99\.5/);

    // Once published, the version's history is everyone's.
    expect((await admin.post(`/api/alloys/${id}/publish`).send({ note: 'Released' })).status).toBe(200);
    expect(await seen('sales')).toMatch(/99\.5/);
    expect(price).not.toBe(99.5);
  });
});
