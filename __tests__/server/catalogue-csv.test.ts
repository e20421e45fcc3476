import Papa from 'papaparse';
import { CSV_COLUMNS, CSV_EXPORT_ONLY_COLUMNS } from '../../shared/catalogue/catalogue-csv';
import type { AlloySummary } from '../../shared/schemas/alloy';
import { createTestApp, expectErrorShape, signedIn, type TestApp } from './test-app';
import { importCsv } from './import-helpers';

let t: TestApp;
beforeEach(async () => {
  t = await createTestApp();
});
afterEach(() => t.close());

async function exportCsv(): Promise<Record<string, string>[]> {
  const fab = await signedIn(t.app, 'fabricator');
  const res = await fab.get('/api/alloys/export.csv');
  expect(res.status).toBe(200);
  expect(res.headers['content-type']).toMatch(/^text\/csv/);
  return Papa.parse<Record<string, string>>(res.text, { header: true, skipEmptyLines: true }).data;
}

describe('catalogue CSV', () => {
  it('when exported, then every published property point is one row naming its source', async () => {
    const rows = await exportCsv();
    expect(Object.keys(rows[0])).toEqual([...CSV_COLUMNS, ...CSV_EXPORT_ONLY_COLUMNS]);
    const fab = await signedIn(t.app, 'fabricator');
    const list = (await fab.get('/api/alloys')).body.items as AlloySummary[];
    expect(new Set(rows.map((r) => r.uns)).size).toBe(list.length);
    const s321 = rows.filter((r) => r.uns === 'S32100' && r.property === 'cte_mean_um_per_m_k');
    // 321: EN 1993-1-2 Annex C every 50 °C; at 600 °C (Δl/l)/(θ − 20) = 10.68738e-3 / 580 = 18.427 µm/m·K (reference-data §1.1).
    expect(s321).toHaveLength(20);
    expect(Number(s321.find((r) => r.temp_c === '600')!.value)).toBeCloseTo(18.427, 3);
    expect(rows.every((r) => r.source.length > 0)).toBe(true);
  });

  it('when exported, then values from memory say "to be verified" on their rows, and lowered limits carry the alloy\'s cautions', async () => {
    const rows = await exportCsv();
    const of = (uns: string, property: string, temp: string) => rows.find((r) => r.uns === uns && r.property === property && r.temp_c === temp)!;
    // 304/304L: the EN 1.4307 elevated minimums are recalled (a memory source); its Annex C expansion is read from the standard.
    expect(of('S30400', 'yield_mpa', '300').to_be_verified).toBe('value');
    expect(of('S30400', 'cte_mean_um_per_m_k', '300').to_be_verified).toBe('');
    // 409: every value read from its sheet, but the service limits are from memory, on every row of the alloy.
    expect(rows.filter((r) => r.uns === 'S40910').every((r) => r.to_be_verified === 'service limits')).toBe(true);
    expect(of('S40910', 'cte_mean_um_per_m_k', '500').data_cautions).toMatch(/Usable limit lowered to 450 °C/);
  });

  it('when the export is imported unchanged, then nothing is drafted', async () => {
    const eng = await signedIn(t.app, 'engineer');
    const csv = (await (await signedIn(t.app, 'fabricator')).get('/api/alloys/export.csv')).text;
    const report = (await importCsv(eng, csv)).report!;
    expect(report.created).toEqual([]);
    expect(report.updated).toEqual([]);
    expect(report.refused).toEqual([]);
    expect(report.unchanged.length).toBeGreaterThanOrEqual(15);
  });

  it('when rows are good, bad, or contradict each other, then good alloys become drafts and each bad row is reported by line', async () => {
    const rows = await exportCsv();
    const pick = (uns: string) => rows.filter((r) => r.uns === uns).map((r) => ({ ...r }));
    const changed = pick('S34700').map((r) => (r.property === 'cte_mean_um_per_m_k' && r.temp_c === '600' ? { ...r, value: '18.5' } : r));
    const fresh = pick('S32100').map((r) => ({ ...r, uns: 'S34709', designation: 'Type 347H' }));
    const badSource = pick('S30400').map((r, i) => (i === 0 ? { ...r, source: 'no-such-source' } : r));
    const badValue = pick('S43000').map((r, i) => (i === 1 ? { ...r, value: 'hot' } : r));
    const contradicting = pick('S40910').map((r, i) => (i === 2 ? { ...r, density_kg_m3: '1' } : r));
    const all: Record<string, string>[] = [...changed, ...fresh, ...badSource, ...badValue, ...contradicting];
    const csv = Papa.unparse({ fields: [...CSV_COLUMNS], data: all.map((r) => CSV_COLUMNS.map((c) => r[c])) });

    const eng = await signedIn(t.app, 'engineer');
    const report = (await importCsv(eng, csv)).report!;
    expect(report.updated).toEqual(['S34700']);
    expect(report.created).toEqual(['S34709']);
    const refusedUns = report.refused.map((r) => r.uns);
    expect(refusedUns).toEqual(expect.arrayContaining(['S30400', 'S43000', 'S40910']));
    const sourceLine = changed.length + fresh.length + 2; // header is line 1
    expect(report.refused.find((r) => r.uns === 'S30400')).toMatchObject({ line: sourceLine, message: expect.stringMatching(/Unknown source/) });

    // The published data does not move until an admin publishes the drafts.
    const fab = await signedIn(t.app, 'fabricator');
    const s347 = (await fab.get('/api/alloys').query({ search: 'S34700' })).body.items[0];
    const detail = (await eng.get(`/api/alloys/${s347.id}`)).body.alloy;
    expect(detail.published.cte.find((p: { tempC: number }) => p.tempC === 600).meanUmPerMK).toBe(18.427);
    expect(detail.draft.cte.find((p: { tempC: number }) => p.tempC === 600).meanUmPerMK).toBe(18.5);
    expect((await fab.get('/api/alloys').query({ search: 'S34709' })).body.total).toBe(0);
  });

  it('when columns are missing, then 400 names them; fabricators may not import', async () => {
    const eng = await signedIn(t.app, 'engineer');
    const res = await eng.post('/api/alloys/import').set('Content-Type', 'text/csv').send('uns,designation\nS30400,Type 304');
    expect(res.status).toBe(400);
    expectErrorShape(res.body, 'invalid_csv');
    expect(res.body.error.message).toMatch(/family/);
    const fab = await signedIn(t.app, 'fabricator');
    expect((await fab.post('/api/alloys/import').set('Content-Type', 'text/csv').send('uns\n')).status).toBe(403);
  });
});
