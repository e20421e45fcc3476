import { createApp } from '../../server/app';
import { AlloyVersion } from '../../server/catalogue/catalogue.entities';
import { CatalogueStore } from '../../server/catalogue/catalogue.repository';
import { CatalogueService } from '../../server/catalogue/catalogue.service';
import { Mailer } from '../../server/mail/mailer';
import type { AlloySummary } from '../../shared/schemas/alloy';
import type { JobDetail, JobSummary } from '../../shared/schemas/jobs';
import { alloyId, newJob, newRun, runBody } from './jobs-helpers';
import { client, createTestApp, demoEmail, expectErrorShape, signedIn, type TestApp } from './test-app';
import { DEMO_PASSWORD } from '../../server/seed/demo-users';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

type Client = Awaited<ReturnType<typeof signedIn>>;

/** Intl's numeric collation: the order a reader expects ("Type 304" before "Type 2205"). */
const byName = new Intl.Collator('en', { numeric: true, sensitivity: 'base' });

async function allPages(c: Client, query: Record<string, string | number>, pageSize: number): Promise<{ pages: AlloySummary[][]; totals: number[] }> {
  const pages: AlloySummary[][] = [];
  const totals: number[] = [];
  for (let page = 1; page < 100; page++) {
    const res = await c.get('/api/alloys').query({ ...query, page, pageSize });
    expect(res.status).toBe(200);
    totals.push(res.body.total);
    if (res.body.items.length === 0) break;
    pages.push(res.body.items);
  }
  return { pages, totals };
}

describe('the alloy list, paged in the database', () => {
  it('when paged through 7 at a time, then the pages join into the whole list in name order with one total', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const whole = (await fab.get('/api/alloys').query({ pageSize: 200 })).body;
    const { pages, totals } = await allPages(fab, {}, 7);
    expect(new Set(totals)).toEqual(new Set([whole.total]));
    expect(pages.slice(0, -1).every((p) => p.length === 7)).toBe(true);
    expect(pages.at(-1)!.length).toBe(whole.total - 7 * (pages.length - 1));
    const joined = pages.flat().map((a) => a.id);
    expect(joined).toEqual(whole.items.map((a: AlloySummary) => a.id));
    expect(new Set(joined).size).toBe(joined.length);
    const names = pages.flat().map((a) => a.designation);
    expect(names).toEqual([...names].sort(byName.compare));
  });

  it('when sorted by price and paged, then the order holds across page boundaries', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const prices = (await allPages(fab, { sort: 'price' }, 4)).pages.flat().map((a) => a.pricePerKg);
    expect(prices).toEqual([...prices].sort((a, b) => a - b));
  });

  it('when filtered by family and paged, then the total counts only that family and every page keeps to it', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const whole = (await fab.get('/api/alloys').query({ pageSize: 200 })).body.items as AlloySummary[];
    const expected = whole.filter((a) => a.family === 'austenitic_stainless').map((a) => a.id);
    const { pages, totals } = await allPages(fab, { family: 'austenitic_stainless' }, 3);
    expect(totals[0]).toBe(expected.length);
    expect(pages.flat().map((a) => a.id)).toEqual(expected);
  });

  it('when a searched or filtered alloy is retired, then the total leaves it out for readers and counts it for an admin who asks, as the pages do', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const admin = await signedIn(t.app, 'admin');
    const answer = async (c: Client, query: Record<string, string | number>) => (await c.get('/api/alloys').query({ pageSize: 200, ...query })).body as { items: AlloySummary[]; total: number };
    const h = (await answer(fab, { search: 'S32109' })).items.find((a) => a.uns === 'S32109')!;
    const before = await answer(fab, { search: 'type 321' });
    const hotBefore = await answer(fab, { minServiceC: 800 });
    expect(before.total).toBe(2);
    expect((await admin.post(`/api/alloys/${h.id}/retire`).send({ note: 'Count check' })).status).toBe(200);
    try {
      for (const [query, was] of [[{ search: 'type 321' }, before], [{ minServiceC: 800 }, hotBefore]] as const) {
        const reader = await answer(fab, query);
        expect(reader.total).toBe(was.total - 1);
        expect(reader.items.length).toBe(reader.total);
        expect(reader.items.map((a) => a.id)).not.toContain(h.id);
        const asked = await answer(admin, { ...query, includeRetired: 'true' });
        expect(asked.total).toBe(was.total);
        expect(asked.items.length).toBe(asked.total);
      }
    } finally {
      expect((await admin.post(`/api/alloys/${h.id}/restore`).send({ note: 'Count check done' })).status).toBe(200);
    }
    expect((await answer(fab, { search: 'type 321' })).total).toBe(2);
  });

  it('when searching in another case, with spaces or hyphens, then the same alloys match; a LIKE wildcard matches only itself', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const ids = async (search: string) => ((await fab.get('/api/alloys').query({ search })).body.items as AlloySummary[]).map((a) => a.designation);
    expect(await ids('TYPE 321')).toEqual(['Type 321', 'Type 321H']);
    expect(await ids('type-321')).toEqual(['Type 321', 'Type 321H']);
    expect(await ids('%')).toEqual([]);
    expect(await ids('_')).toEqual([]);
  });

  it('when versions from before the list columns are filled in on start, then they sort and search again', async () => {
    const versions = t.dataSource.getRepository(AlloyVersion);
    await versions.createQueryBuilder().update().set({ designationKey: '', searchText: '' }).where('uns = :uns', { uns: 'S32100' }).execute();
    const fab = await signedIn(t.app, 'fabricator');
    expect((await fab.get('/api/alloys').query({ search: 's32100' })).body.items).toEqual([]);
    expect(await new CatalogueService(new CatalogueStore(t.dataSource)).fillListKeys()).toBeGreaterThanOrEqual(1);
    expect((await fab.get('/api/alloys').query({ search: 's32100' })).body.items.map((a: AlloySummary) => a.designation)).toEqual(['Type 321']);
  });

  it('when a draft’s expansion table is edited, then the editors’ list shows the new reach of its data', async () => {
    const eng = await signedIn(t.app, 'engineer');
    const src = (await eng.get('/api/sources')).body.items[0].id;
    const table = (topC: number) => [100, topC].map((tempC) => ({ tempC, meanUmPerMK: 12, sourceId: src }));
    const created = await eng.post('/api/alloys').send({
      designation: 'Draft reach alloy', uns: 'N97532', family: 'nickel_chromium', densityKgM3: 8300, densitySourceId: src, maxContinuousC: 600,
      maxIntermittentC: 650, limitsSourceId: src, pricePerKg: 30, currency: 'EUR', priceSetOn: '2026-11-20', referenceTempC: 20, cte: table(700), modulus: [], yield: [],
    });
    expect(created.status).toBe(201);
    const reach = async () => ((await eng.get('/api/alloys').query({ search: 'N97532', includeDrafts: 'true' })).body.items as AlloySummary[])[0].maxDataC;
    expect(await reach()).toBe(700);
    expect((await eng.patch(`/api/alloys/${created.body.alloy.id}`).send({ cte: table(900) })).status).toBe(200);
    expect(await reach()).toBe(900);
  });

  it('when a page lies past the end, then it is empty and the total still counts every match', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const res = await fab.get('/api/alloys').query({ page: 99, pageSize: 50 });
    expect(res.body.items).toEqual([]);
    expect(res.body.total).toBeGreaterThanOrEqual(15);
  });
});

describe('the job list, paged', () => {
  it('when paged 3 at a time, then newest change comes first, pages do not overlap and the total holds', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    for (let i = 0; i < 7; i++) await newJob(fab, `Paged job ${i}`);
    const seen: JobSummary[] = [];
    for (let page = 1; page <= 4; page++) {
      const res = await fab.get('/api/jobs').query({ search: 'paged job', page, pageSize: 3 });
      expect(res.status).toBe(200);
      expect(res.body.total).toBe(7);
      seen.push(...res.body.items);
    }
    expect(seen.map((j) => j.name)).toEqual([6, 5, 4, 3, 2, 1, 0].map((i) => `Paged job ${i}`));
  });

  it('when the page size is out of bounds, then 400 names it', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const res = await fab.get('/api/jobs').query({ pageSize: 1000, page: 0 });
    expect(res.status).toBe(400);
    expectErrorShape(res.body, 'invalid_query');
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['page', 'pageSize']);
  });

  it('when a run changes or its alloy is retired, then the list totals follow at once', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const admin = await signedIn(t.app, 'admin');
    const job = await newJob(fab, 'Totals follow job');
    const s321 = await alloyId(t, 'S32100');
    const run = await newRun(fab, job.id, runBody(s321, 600));
    const summary = async () => ((await fab.get('/api/jobs').query({ search: 'Totals follow job' })).body.items as JobSummary[])[0];
    const before = await summary();
    expect(before.totalGrowthMm).toBeCloseTo(run.result!.growthMm, 9);
    const longer = await fab.patch(`/api/runs/${run.id}`).send({ segments: [{ lengthMm: 2000, startTempC: 600, endTempC: 600 }] });
    expect(longer.status).toBe(200);
    // Twice the length at one temperature grows twice as much (growth = L·Δε).
    expect((await summary()).totalGrowthMm).toBeCloseTo(2 * before.totalGrowthMm, 6);
    expect((await summary()).runsWithProblems).toBe(0);
    expect((await admin.post(`/api/alloys/${s321}/retire`).send({ note: 'test' })).status).toBe(200);
    try {
      expect((await summary()).runsWithProblems).toBe(1);
    } finally {
      await admin.post(`/api/alloys/${s321}/restore`).send({ note: 'test' });
    }
    expect((await summary()).runsWithProblems).toBe(0);
  });
});

describe('the job answer', () => {
  it('when read plainly, then each result carries the drawing curve but no growth-per-metre curve or flex candidates; include=curves gives them', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const job = await newJob(fab, 'Heavy answer job');
    const s321 = await alloyId(t, 'S32100');
    await newRun(fab, job.id, runBody(s321, 700, { joint: { type: 'flex' }, endFixing: 'flange' }));
    const brief = (await fab.get(`/api/jobs/${job.id}`)).body.job as JobDetail;
    const full = (await fab.get(`/api/jobs/${job.id}`).query({ include: 'curves' })).body.job as JobDetail;
    expect(brief.resultDetail).toBe('brief');
    expect(full.resultDetail).toBe('full');
    const b = brief.runs[0].result!;
    const f = full.runs[0].result!;
    expect(b.growthPerMetreCurve).toEqual([]);
    expect(f.growthPerMetreCurve.length).toBeGreaterThan(10);
    expect(b.flex!.candidates).toEqual([]);
    expect(f.flex!.candidates.length).toBeGreaterThan(0);
    expect(b.flex!.chosen?.name).toBe(f.flex!.chosen?.name);
    expect(b.curve.length).toBeLessThan(f.curve.length);
    expect(b.curve.at(-1)!.growthMm).toBeCloseTo(f.growthMm, 3);
    expect(b.growthMm).toBe(f.growthMm);
    expect(brief.totals).toEqual(full.totals);
  });

  it('when include names something else, then 400', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const job = await newJob(fab, 'Bad include job');
    const res = await fab.get(`/api/jobs/${job.id}`).query({ include: 'everything' });
    expect(res.status).toBe(400);
    expectErrorShape(res.body, 'invalid_query');
  });
});

describe('published data cached in each instance', () => {
  /** A second app on the same database: another server instance with its own in-memory caches. */
  let other: ReturnType<typeof createApp>;
  let mailer: Mailer;
  beforeAll(() => {
    mailer = new Mailer('smtp://127.0.0.1:9');
    other = createApp(t.dataSource, { uploadsDir: t.uploadsDir, mailer });
  });
  afterAll(() => mailer.close());

  async function otherSignedIn(role: 'engineer' | 'admin') {
    const c = client(other);
    expect((await c.post('/api/auth/sign-in').send({ email: demoEmail(role), password: DEMO_PASSWORD })).status).toBe(200);
    return c;
  }

  /** 1 m held at 520 °C, installed at 20 °C. */
  const calcBody = (id: string) => ({ alloyId: id, tube: { odMm: 76.2, wallMm: 1.651 }, installTempC: 20, segments: [{ lengthMm: 1000, startTempC: 520, endTempC: 520 }] });

  it('when an admin publishes new data through one instance, then the calculator on the other answers from it at once', async () => {
    const admin = await signedIn(t.app, 'admin');
    const src = (await admin.get('/api/sources')).body.items[0].id;
    const cte = (a: number) => [100, 1000].map((tempC) => ({ tempC, meanUmPerMK: a, sourceId: src }));
    const created = await admin.post('/api/alloys').send({
      designation: 'Cache test alloy', uns: 'N97531', family: 'nickel_chromium', densityKgM3: 8300, densitySourceId: src,
      maxContinuousC: 1000, maxIntermittentC: 950, limitsSourceId: src, pricePerKg: 30, currency: 'EUR', priceSetOn: '2026-11-20',
      referenceTempC: 20, cte: cte(10), modulus: [], yield: [],
    });
    expect(created.status).toBe(201);
    const id = created.body.alloy.id as string;
    expect((await admin.post(`/api/alloys/${id}/publish`).send({ note: 'Checked against the data sheet' })).status).toBe(200);

    const eng = await otherSignedIn('engineer');
    // A constant mean coefficient α from 20 °C: growth = α·L·ΔT = 10e-6 × 1000 mm × 500 K = 5.000 mm (ASTM E228's definition of the mean coefficient).
    const first = await eng.post('/api/calc/run').send(calcBody(id));
    expect(first.status).toBe(200);
    expect(first.body.growthMm).toBeCloseTo(5.0, 6);
    expect(first.body.alloy.version).toBe(1);

    // An open draft changes nothing readers see.
    expect((await admin.patch(`/api/alloys/${id}`).send({ cte: cte(12), note: 'new data' })).status).toBe(200);
    expect((await eng.post('/api/calc/run').send(calcBody(id))).body.growthMm).toBeCloseTo(5.0, 6);

    expect((await admin.post(`/api/alloys/${id}/publish`).send({ note: 'Price from the new supplier list' })).status).toBe(200);
    const after = await eng.post('/api/calc/run').send(calcBody(id));
    // 12e-6 × 1000 mm × 500 K = 6.000 mm.
    expect(after.body.growthMm).toBeCloseTo(6.0, 6);
    expect(after.body.alloy.version).toBe(2);

    expect((await admin.post(`/api/alloys/${id}/retire`).send({})).status).toBe(200);
    const retired = await eng.post('/api/calc/run').send(calcBody(id));
    expect(retired.status).toBe(400);
    expect(retired.body.error.fields.alloyId).toBe('No published alloy with this id');
  });

  it('when an admin adds a flex part through one instance, then flex sizing on the other offers it at once', async () => {
    const eng = await otherSignedIn('engineer');
    const s321 = await alloyId(t, 'S32100');
    const body = { ...calcBody(s321), segments: [{ lengthMm: 1500, startTempC: 700, endTempC: 700 }], flex: {} };
    const offered = async () => ((await eng.post('/api/calc/run').query({ include: 'curves' }).send(body)).body.flex.candidates as { name: string }[]).some((c) => c.name.includes('Cache test bellows'));
    expect(await offered()).toBe(false);
    const admin = await signedIn(t.app, 'admin');
    const part = await admin.post('/api/flex-parts').send({
      code: 'CACHE-TEST-76', name: 'Cache test bellows', boreMm: 76.2, liveLengthMm: 150, ratedAxialCompressionMm: 30, ratedAxialExtensionMm: 10,
      lateralOffsetMm: 3, maxTempC: 900, price: 100, currency: 'EUR',
    });
    expect(part.status).toBe(201);
    expect(await offered()).toBe(true);
    expect((await admin.patch(`/api/flex-parts/${part.body.flexPart.id}`).send({ active: false })).status).toBe(200);
    expect(await offered()).toBe(false);
  });
});
