import Papa from 'papaparse';
import { bigImportCsv } from '../../scripts/lib/csv-fixture';
import { MAX_IMPORT_BYTES } from '../../shared/catalogue/catalogue-csv';
import { createTestApp, expectErrorShape, signedIn, type TestApp } from './test-app';
import { importCsv, waitForImport } from './import-helpers';
import { testingOnPostgres } from './test-database';

// Every alloy is a few round trips to PostgreSQL where SQLite writes in-process: a larger time budget there
// (not an assertion on speed; `npm run bench` has the figures).
const bigImportBudget = (ms: number) => (testingOnPostgres() ? ms * 4 : ms);

let t: TestApp;
beforeEach(async () => {
  t = await createTestApp();
});
afterEach(() => t.close());

const exportOf = async () => (await (await signedIn(t.app, 'fabricator')).get('/api/alloys/export.csv')).text;

describe('large CSV imports', () => {
  it('when a 5 MB file of 7,273 rows is imported, then the server answers health checks all the while and every alloy arrives', async () => {
    const { csv, alloys } = bigImportCsv(await exportOf(), { rows: 7273, targetBytes: 5 * 1024 * 1024, rowsPerAlloy: 2 });
    expect(csv.length).toBeGreaterThan(5_000_000);
    const eng = await signedIn(t.app, 'engineer');
    const started = await eng.post('/api/alloys/import').set('Content-Type', 'text/csv').send(csv);
    expect(started.status).toBe(202);
    expect(started.headers.location).toBe(`/api/alloys/imports/${started.body.import.id}`);

    let answeredWhileRunning = 0;
    const fractions: number[] = [];
    const job = await waitForImport(eng, started.body.import.id, async (running) => {
      fractions.push(running.fraction);
      const health = await eng.get('/api/health');
      if (health.status === 200) answeredWhileRunning += 1;
    });
    expect(job.phase).toBe('done');
    expect(answeredWhileRunning).toBeGreaterThanOrEqual(3);
    expect(fractions).toEqual([...fractions].sort((a, b) => a - b));
    // Every alloy but perhaps the last (cut off at the row count) is created; each one is a draft for editors only.
    expect(job.report!.created.length).toBeGreaterThanOrEqual(alloys - 1);
    const list = (await eng.get('/api/alloys').query({ includeDrafts: 'true', search: 'Z0', pageSize: 1 })).body;
    expect(list.total).toBe(job.report!.created.length);
  }, bigImportBudget(60_000));

  it('when a file is larger than the cap, then 413 says how large a file may be and nothing starts', async () => {
    const eng = await signedIn(t.app, 'engineer');
    const header = (await exportOf()).split('\n')[0];
    const res = await eng.post('/api/alloys/import').set('Content-Type', 'text/csv').send(`${header}\n${'x'.repeat(MAX_IMPORT_BYTES + 10)}`);
    expect(res.status).toBe(413);
    expectErrorShape(res.body, 'too_large');
    expect(res.body.error.message).toMatch(/at most 8\.0 MB; this file is 8\.0 MB/);
  });

  it('when an import is running, then a second one is refused with 409 and the first finishes', async () => {
    const { csv } = bigImportCsv(await exportOf(), { rows: 2000, rowsPerAlloy: 2 });
    const eng = await signedIn(t.app, 'engineer');
    const first = await eng.post('/api/alloys/import').set('Content-Type', 'text/csv').send(csv);
    const second = await eng.post('/api/alloys/import').set('Content-Type', 'text/csv').send(csv);
    expect(second.status).toBe(409);
    expectErrorShape(second.body, 'import_running');
    expect((await waitForImport(eng, first.body.import.id)).phase).toBe('done');
    expect((await importCsv(eng, csv)).report!.unchanged.length).toBe(1000);
  }, bigImportBudget(30_000));

  it('when someone else asks for an import, then only editors see it', async () => {
    const eng = await signedIn(t.app, 'engineer');
    const job = await importCsv(eng, await exportOf());
    expect((await (await signedIn(t.app, 'sales')).get(`/api/alloys/imports/${job.id}`)).status).toBe(403);
    expect((await eng.get('/api/alloys/imports/no-such-import')).status).toBe(404);
  });
});

describe('CSV formula injection', () => {
  it('when a text cell starts like a formula, then the export quotes it, numbers stay numbers, and the file imports back unchanged', async () => {
    const eng = await signedIn(t.app, 'engineer');
    const admin = await signedIn(t.app, 'admin');
    const rows = Papa.parse<Record<string, string>>(await exportOf(), { header: true, skipEmptyLines: true }).data;
    const id = (await eng.get('/api/alloys').query({ search: 'S30400' })).body.items[0].id;
    const detail = (await eng.get(`/api/alloys/${id}`)).body.alloy.published;
    const cte = [{ tempC: -100, meanUmPerMK: 14.7, sourceId: detail.cte[0].sourceId }, ...detail.cte];
    const evil = ['=HYPERLINK("http://evil.test","x")', '+SUM(1,2)', '-2+3', '@cmd', '\tTab lead', '＝FULLWIDTH'];
    for (const [i, designation] of evil.entries()) {
      const created = await eng.post('/api/alloys').send({ ...detail, uns: `S9990${i}`, designation, cte });
      expect(created.status).toBe(201);
      expect((await admin.post(`/api/alloys/${created.body.alloy.id}/publish`).send({ note: 'Checked' })).status).toBe(200);
    }
    const text = await exportOf();
    const lines = text.split('\r\n');
    const exported = Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true }).data;
    const designationOf = (uns: string) => exported.find((r) => r.uns === uns)?.designation;
    // The designation is stored trimmed, so the tab-led one no longer starts with a tab.
    expect(evil.map((_, i) => designationOf(`S9990${i}`))).toEqual([
      `'=HYPERLINK("http://evil.test","x")`,
      "'+SUM(1,2)",
      "'-2+3",
      "'@cmd",
      'Tab lead',
      "'＝FULLWIDTH",
    ]);
    // No cell of the file begins with a formula character unless it is a number.
    const cells = Papa.parse<string[]>(text, { skipEmptyLines: true }).data.flat();
    expect(cells.filter((c) => /^[=+\-@\t\r＝]/.test(c) && !Number.isFinite(Number(c)))).toEqual([]);
    expect(cells).toContain('-100');
    expect(lines.find((l) => l.startsWith('S99900'))).toMatch(/,-100,14\.7,/);
    expect(rows.length).toBeGreaterThan(0);

    const report = (await importCsv(eng, text)).report!;
    expect(report.refused).toEqual([]);
    expect(report.updated).toEqual([]);
    expect(report.unchanged).toEqual(expect.arrayContaining(['S99900', 'S99905']));
  });
});
