import fs from 'node:fs';
import type { AlloyDetail, AlloySummary, AlloyVersionSummary, ReviewQueueItem, RevisionView } from '../../shared/schemas/alloy';
import { createTestApp, expectErrorShape, signedIn, type TestApp } from './test-app';

let t: TestApp;
beforeEach(async () => {
  t = await createTestApp();
});
afterEach(() => t.close());

async function alloyId(uns: string): Promise<string> {
  const fab = await signedIn(t.app, 'fabricator');
  return (await fab.get('/api/alloys').query({ search: uns })).body.items.find((a: AlloySummary) => a.uns === uns).id;
}

const PDF = Buffer.from('%PDF-1.4\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n');

describe('the catalogue review step', () => {
  it('when an engineer submits a draft, then the admin’s queue counts it; sending back with a note takes it off and the engineer reads the note', async () => {
    const eng = await signedIn(t.app, 'engineer');
    const admin = await signedIn(t.app, 'admin');
    const id = await alloyId('S34700');
    expect((await admin.get('/api/alloys/review-queue')).body).toEqual({ items: [], count: 0 });

    // Submitting needs a draft.
    const none = await eng.post(`/api/alloys/${id}/submit`).send({});
    expect(none.status).toBe(409);
    expectErrorShape(none.body, 'no_draft');

    await eng.patch(`/api/alloys/${id}`).send({ densityKgM3: 8010, note: 'Mill sheet density' });
    const submitted = await eng.post(`/api/alloys/${id}/submit`).send({ note: 'Density from the mill sheet, please check' });
    expect(submitted.status).toBe(200);
    expect((submitted.body.alloy as AlloyDetail).review).toMatchObject({ step: 'submitted', by: 'Tomas Lindqvist-Oyelaran', note: 'Density from the mill sheet, please check' });
    expect((await eng.post(`/api/alloys/${id}/submit`).send({})).status).toBe(409);

    const queue = (await admin.get('/api/alloys/review-queue')).body as { items: ReviewQueueItem[]; count: number };
    expect(queue.count).toBe(1);
    expect(queue.items[0]).toMatchObject({ alloyId: id, designation: 'Type 347', uns: 'S34700', isNew: false, submittedBy: 'Tomas Lindqvist-Oyelaran', note: 'Density from the mill sheet, please check' });

    const noNote = await admin.post(`/api/alloys/${id}/send-back`).send({ note: '  ' });
    expect(noNote.status).toBe(400);
    expect(noNote.body.error.fields.note).toBe('Write a note for the history');
    const back = await admin.post(`/api/alloys/${id}/send-back`).send({ note: 'Cite the mill sheet as a source first' });
    expect(back.status).toBe(200);
    expect((await admin.get('/api/alloys/review-queue')).body.count).toBe(0);
    const seen = (await eng.get(`/api/alloys/${id}`)).body.alloy as AlloyDetail;
    expect(seen.review).toMatchObject({ step: 'sent_back', note: 'Cite the mill sheet as a source first', by: 'Ines Varga' });
    expect(seen.draft).not.toBeNull();

    const steps = ((await eng.get(`/api/alloys/${id}/revisions`)).body.items as RevisionView[]).map((r) => [r.action, r.note]);
    expect(steps.slice(0, 2)).toEqual([
      ['sent_back', 'Cite the mill sheet as a source first'],
      ['submitted', 'Density from the mill sheet, please check'],
    ]);
  });

  it('when an admin publishes, then a note is required; publishing empties the review and the queue', async () => {
    const eng = await signedIn(t.app, 'engineer');
    const admin = await signedIn(t.app, 'admin');
    const id = await alloyId('S34700');
    await eng.patch(`/api/alloys/${id}`).send({ densityKgM3: 8010 });
    await eng.post(`/api/alloys/${id}/submit`).send({});
    for (const body of [{}, { note: '' }, { note: '   ' }]) {
      const res = await admin.post(`/api/alloys/${id}/publish`).send(body);
      expect(res.status).toBe(400);
    }
    const published = await admin.post(`/api/alloys/${id}/publish`).send({ note: 'Checked against the mill sheet' });
    expect(published.status).toBe(200);
    expect(published.body.alloy.review).toBeNull();
    expect(published.body.alloy.draft).toBeNull();
    expect((await admin.get('/api/alloys/review-queue')).body.count).toBe(0);
    // The next draft starts outside review.
    await eng.patch(`/api/alloys/${id}`).send({ densityKgM3: 8020 });
    expect((await eng.get(`/api/alloys/${id}`)).body.alloy.review).toBeNull();
  });

  it('when engineers, fabricators or sales ask for the queue or send back, then 403; fabricators and sales cannot submit', async () => {
    const id = await alloyId('S34700');
    await (await signedIn(t.app, 'engineer')).patch(`/api/alloys/${id}`).send({ densityKgM3: 8010 });
    for (const role of ['engineer', 'fabricator', 'sales'] as const) {
      const c = await signedIn(t.app, role);
      expect((await c.get('/api/alloys/review-queue')).status).toBe(403);
      expect((await c.post(`/api/alloys/${id}/send-back`).send({ note: 'x' })).status).toBe(403);
    }
    for (const role of ['fabricator', 'sales'] as const) expect((await (await signedIn(t.app, role)).post(`/api/alloys/${id}/submit`).send({})).status).toBe(403);
  });
});

describe('removing a data sheet', () => {
  it('when an engineer removes a data sheet, then the row and the file are gone and the history says so; a second removal is 404', async () => {
    const eng = await signedIn(t.app, 'engineer');
    const id = await alloyId('S32100');
    const up = await eng.post(`/api/alloys/${id}/datasheets`).attach('file', PDF, { filename: '321 sheet.pdf', contentType: 'application/pdf' });
    expect(fs.readdirSync(t.uploadsDir)).toHaveLength(1);
    const sheet = up.body.datasheet.id as string;

    for (const role of ['fabricator', 'sales'] as const) expect((await (await signedIn(t.app, role)).delete(`/api/datasheets/${sheet}`)).status).toBe(403);
    const res = await eng.delete(`/api/datasheets/${sheet}`);
    expect(res.status).toBe(200);
    expect(fs.readdirSync(t.uploadsDir)).toHaveLength(0);
    expect(Number((await t.dataSource.query('SELECT count(*) AS n FROM datasheet'))[0].n)).toBe(0);
    expect((await eng.get(`/api/alloys/${id}`)).body.alloy.datasheets).toEqual([]);
    const [latest] = (await eng.get(`/api/alloys/${id}/revisions`)).body.items as RevisionView[];
    expect(latest).toMatchObject({ action: 'datasheet_removed', note: '321 sheet.pdf', by: 'Tomas Lindqvist-Oyelaran' });
    expect((await eng.get(`/api/datasheets/${sheet}`)).status).toBe(404);
    const again = await (await signedIn(t.app, 'admin')).delete(`/api/datasheets/${sheet}`);
    expect(again.status).toBe(404);
  });
});

describe('the version list', () => {
  it('when an alloy has been published twice and has a draft, then readers list the two published versions and editors the draft too', async () => {
    const eng = await signedIn(t.app, 'engineer');
    const admin = await signedIn(t.app, 'admin');
    const id = await alloyId('S34700');
    const start = (await eng.get(`/api/alloys/${id}`)).body.alloy.published.version as number;
    await eng.patch(`/api/alloys/${id}`).send({ densityKgM3: 8010 });
    await admin.post(`/api/alloys/${id}/publish`).send({ note: 'Mill sheet' });
    await eng.patch(`/api/alloys/${id}`).send({ densityKgM3: 8020 });

    const fab = await signedIn(t.app, 'fabricator');
    const seen = (await fab.get(`/api/alloys/${id}/versions`)).body.items as AlloyVersionSummary[];
    expect(seen.map((v) => [v.version, v.state])).toEqual([
      [start + 1, 'published'],
      ...Array.from({ length: start }, (_, i) => [start - i, 'superseded']),
    ]);
    const editors = (await eng.get(`/api/alloys/${id}/versions`)).body.items as AlloyVersionSummary[];
    expect(editors[0]).toMatchObject({ version: start + 2, state: 'draft', publishedAt: null });
    const old = (await fab.get(`/api/alloys/${id}/versions/${start}`)).body.version;
    expect(old.densityKgM3).not.toBe(8010);
  });
});
