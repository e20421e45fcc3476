import { createHash } from 'node:crypto';
import fs from 'node:fs';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { Datasheet } from '../../server/catalogue/catalogue.entities';
import type { AlloySummary } from '../../shared/schemas/alloy';
import { ROLES } from '../../shared/schemas/auth';
import { createApp } from '../../server/app';
import { Mailer } from '../../server/mail/mailer';
import { openObjectStore } from '../../server/storage/object-store';
import { startS3Fake, type S3Fake } from './storage-fake';
import { client, createTestApp, expectErrorShape, HOST, ORIGIN, signedIn, type TestApp } from './test-app';

/** A small but well-formed PDF: the header is what the server checks. */
const PDF = Buffer.from('%PDF-1.4\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n');

/** Waits (up to 5 s) for something the server finishes after the response, such as clean-up after a cut-off upload. */
async function settled(done: () => Promise<boolean>) {
  for (let i = 0; i < 100 && !(await done()); i++) await new Promise((r) => setTimeout(r, 50));
}

describe.each(['folder', 's3'] as const)('data sheets kept in the %s store', (kind) => {
  let fake: S3Fake | undefined;
  let t: TestApp;
  let prefix = '';
  let run = 0;
  beforeAll(async () => {
    if (kind === 's3') fake = await startS3Fake();
  });
  afterAll(async () => {
    await fake?.close();
  });
  beforeEach(async () => {
    prefix = `run-${++run}`;
    t = await createTestApp(fake ? { objectStore: openObjectStore(fake.config(prefix)) } : {});
  });
  afterEach(() => t.close());

  const storedBytes = (name: string) => (fake ? fake.read(`${prefix}/${name}`) : fs.promises.readFile(path.join(t.uploadsDir, name)));

  async function alloyId(uns = 'S32100'): Promise<string> {
    const fab = await signedIn(t.app, 'fabricator');
    return (await fab.get('/api/alloys').query({ search: uns })).body.items.find((a: AlloySummary) => a.uns === uns).id;
  }

  /** The stored files' names, looked up beside the store under test (the folder, or the fake's own listing). */
  const storedFiles = () => (fake ? fake.list(prefix) : fs.promises.readdir(t.uploadsDir));
  async function datasheetRows(): Promise<number> {
    return t.dataSource.getRepository(Datasheet).count();
  }

  describe('uploading a data sheet', () => {
    it('when an engineer uploads a PDF, then it is stored under a random name with its sha256, and anyone signed in can download it', async () => {
      const eng = await signedIn(t.app, 'engineer');
      const id = await alloyId();
      const res = await eng.post(`/api/alloys/${id}/datasheets`).attach('file', PDF, { filename: '../../etc/321 data sheet.pdf', contentType: 'application/pdf' });
      expect(res.status).toBe(201);
      const sheet = res.body.datasheet;
      expect(sheet.originalName).toBe('321 data sheet.pdf');
      expect(sheet.sizeBytes).toBe(PDF.length);
      expect(sheet.sha256).toBe(createHash('sha256').update(PDF).digest('hex'));

      const files = await storedFiles();
      expect(files).toHaveLength(1);
      expect(files[0]).toMatch(/^[0-9a-f]{32}\.pdf$/);
      expect((await storedBytes(files[0])).equals(PDF)).toBe(true);

      const fab = await signedIn(t.app, 'fabricator');
      const download = await fab.get(`/api/datasheets/${sheet.id}`).buffer(true).parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      });
      expect(download.status).toBe(200);
      expect(download.headers['content-type']).toBe('application/pdf');
      expect(download.headers['content-disposition']).toBe('attachment; filename="321 data sheet.pdf"');
      expect((download.body as Buffer).equals(PDF)).toBe(true);

      const detail = (await fab.get(`/api/alloys/${id}`)).body.alloy;
      expect(detail.datasheets.map((d: { id: string }) => d.id)).toEqual([sheet.id]);
      const revisions = (await fab.get(`/api/alloys/${id}/revisions`)).body.items;
      expect(revisions[0]).toMatchObject({ action: 'datasheet_added', note: '321 data sheet.pdf' });
    });

    it('when a name holds quotes or non-Latin letters, then the download header stays safe', async () => {
      const eng = await signedIn(t.app, 'engineer');
      const res = await eng.post(`/api/alloys/${await alloyId()}/datasheets`).attach('file', PDF, { filename: 'Prüfbericht "321".pdf' });
      const download = await eng.get(`/api/datasheets/${res.body.datasheet.id}`);
      const header = String(download.headers['content-disposition']);
      expect(header).toMatch(/^attachment; filename="Pr\?fbericht \\"321\\".pdf"; filename\*=UTF-8''Pr%C3%BCfbericht%20%22321%22.pdf$/);
    });

    it('when the file is not a PDF by content, even if named and typed as one, then 415 and nothing is kept', async () => {
      const eng = await signedIn(t.app, 'engineer');
      const res = await eng
        .post(`/api/alloys/${await alloyId()}/datasheets`)
        .attach('file', Buffer.from('MZ\x90\x00 this is a program, not a data sheet'), { filename: 'sheet.pdf', contentType: 'application/pdf' });
      expect(res.status).toBe(415);
      expectErrorShape(res.body, 'not_a_pdf');
      expect(await storedFiles()).toEqual([]);
      expect(await datasheetRows()).toBe(0);
    });

    it('when the file is empty or shorter than the PDF header, then it is refused', async () => {
      const eng = await signedIn(t.app, 'engineer');
      const res = await eng.post(`/api/alloys/${await alloyId()}/datasheets`).attach('file', Buffer.from('%PD'), { filename: 'tiny.pdf' });
      expect(res.status).toBe(415);
      expect(await storedFiles()).toEqual([]);
    });

    it('when the file is over 25 MB, then 413 in the error shape and nothing is kept', async () => {
      const eng = await signedIn(t.app, 'engineer');
      const big = Buffer.concat([Buffer.from('%PDF-1.7\n'), Buffer.alloc(25 * 1024 * 1024 + 10, 0x20)]);
      const res = await eng.post(`/api/alloys/${await alloyId()}/datasheets`).attach('file', big, { filename: 'huge.pdf' });
      expect(res.status).toBe(413);
      expectErrorShape(res.body, 'too_large');
      expect(await storedFiles()).toEqual([]);
      // Five 5 MB parts had gone up before the cap was reached: the multipart upload is aborted, its parts dropped.
      expect(fake?.pendingUploads() ?? []).toEqual([]);
      expect(await datasheetRows()).toBe(0);
    });

    it('when the field is not "file" or no file is sent, then 400', async () => {
      const eng = await signedIn(t.app, 'engineer');
      const id = await alloyId();
      const wrongField = await eng.post(`/api/alloys/${id}/datasheets`).attach('document', PDF, { filename: 'a.pdf' });
      expect(wrongField.status).toBe(400);
      expectErrorShape(wrongField.body, 'invalid_upload');
      const none = await eng.post(`/api/alloys/${id}/datasheets`).field('note', 'no file');
      expect(none.status).toBe(400);
      expect(await storedFiles()).toEqual([]);
    });

    it('when the alloy does not exist, then 404 and the stored file is removed again', async () => {
      const eng = await signedIn(t.app, 'engineer');
      const res = await eng.post('/api/alloys/no-such-alloy/datasheets').attach('file', PDF, { filename: 'a.pdf' });
      expect(res.status).toBe(404);
      expect(await storedFiles()).toEqual([]);
      expect(await datasheetRows()).toBe(0);
    });

    it('when the upload is cut off part-way, then no file and no row are left', async () => {
      const eng = await signedIn(t.app, 'engineer');
      const cookie = (await eng.get('/api/auth/me')).request.getHeader?.('cookie') as string | undefined;
      const id = await alloyId();
      const server = http.createServer(t.app).listen(0);
      const { port } = server.address() as AddressInfo;
      const boundary = 'dilatoBoundary';
      await new Promise<void>((resolve) => {
        const req = http.request({
          port,
          method: 'POST',
          path: `/api/alloys/${id}/datasheets`,
          headers: {
            Host: HOST,
            Origin: ORIGIN,
            Cookie: String(cookie),
            'Content-Type': `multipart/form-data; boundary=${boundary}`,
            'Content-Length': String(10 * 1024 * 1024),
          },
        });
        req.on('error', () => resolve());
        req.write(`--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="cut.pdf"\r\nContent-Type: application/pdf\r\n\r\n`);
        req.write(Buffer.concat([Buffer.from('%PDF-1.4\n'), Buffer.alloc(256 * 1024, 0x41)]));
        setTimeout(() => {
          req.destroy();
          resolve();
        }, 200);
      });
      server.close();
      // The server finds out about the cut on its own time; the clean-up (an S3 abort) follows that.
      await settled(async () => (await storedFiles()).length === 0 && (await datasheetRows()) === 0);
      expect(await storedFiles()).toEqual([]);
      expect(await datasheetRows()).toBe(0);
      expect(fake?.pendingUploads() ?? []).toEqual([]);
    });
  });

  describe('who may upload and download', () => {
    for (const role of ROLES) {
      const allowed = role === 'engineer' || role === 'admin';
      it(`when a ${role} uploads, then ${allowed ? '201' : '403 and nothing is stored'}`, async () => {
        const c = await signedIn(t.app, role);
        const res = await c.post(`/api/alloys/${await alloyId()}/datasheets`).attach('file', PDF, { filename: 'a.pdf' });
        expect(res.status).toBe(allowed ? 201 : 403);
        expect(await storedFiles()).toHaveLength(allowed ? 1 : 0);
      });
    }

    it('when anonymous uploads or downloads, then 401', async () => {
      const eng = await signedIn(t.app, 'engineer');
      const sheet = (await eng.post(`/api/alloys/${await alloyId()}/datasheets`).attach('file', PDF, { filename: 'a.pdf' })).body.datasheet;
      const anon = client(t.app);
      expect((await anon.get(`/api/datasheets/${sheet.id}`)).status).toBe(401);
      expect((await anon.post(`/api/alloys/${await alloyId()}/datasheets`).attach('file', PDF, { filename: 'a.pdf' })).status).toBe(401);
    });

    it('when the alloy was never published, then only engineers and admins can download its data sheet', async () => {
      const eng = await signedIn(t.app, 'engineer');
      const src = (await eng.get('/api/sources')).body.items[0].id;
      const draft = await eng.post('/api/alloys').send({
        designation: 'Alloy 999', uns: 'N09999', family: 'nickel_chromium', densityKgM3: 8300, densitySourceId: src,
        maxContinuousC: 1000, maxIntermittentC: 950, limitsSourceId: src, pricePerKg: 30, currency: 'EUR', priceSetOn: '2026-11-20',
        referenceTempC: 20, cte: [{ tempC: 100, meanUmPerMK: 13, sourceId: src }, { tempC: 900, meanUmPerMK: 16, sourceId: src }], modulus: [], yield: [],
      });
      expect(draft.status).toBe(201);
      const sheet = (await eng.post(`/api/alloys/${draft.body.alloy.id}/datasheets`).attach('file', PDF, { filename: 'draft.pdf' })).body.datasheet;
      expect((await eng.get(`/api/datasheets/${sheet.id}`)).status).toBe(200);
      const fab = await signedIn(t.app, 'fabricator');
      expect((await fab.get(`/api/datasheets/${sheet.id}`)).status).toBe(404);
    });
  });

  describe('download type and name', () => {
    it.each([
      ['sheet.html', 'sheet.pdf'],
      ['drawing.svg', 'drawing.pdf'],
      ['report', 'report.pdf'],
      ['invoice\u202Efdp.exe', 'invoicefdp.pdf'],
      ['\u2066spec\u2069 \u200Fsheet\uFEFF.PDF', 'spec sheet.pdf'],
    ])('when a PDF is uploaded as %j, then it downloads as application/pdf named %j', async (uploadedAs, expected) => {
      const eng = await signedIn(t.app, 'engineer');
      const up = await eng.post(`/api/alloys/${await alloyId()}/datasheets`).attach('file', PDF, { filename: uploadedAs, contentType: 'text/html' });
      expect(up.status).toBe(201);
      expect(up.body.datasheet.originalName).toBe(expected);
      const download = await (await signedIn(t.app, 'sales')).get(`/api/datasheets/${up.body.datasheet.id}`).buffer(true);
      expect(download.headers['content-type']).toBe('application/pdf');
      expect(download.headers['content-disposition'].replace(/"/g, '')).toBe(`attachment; filename=${expected}`);
      expect(download.headers['x-content-type-options']).toBe('nosniff');
    });

    it('when a row stored before names its file .html, then the download is still a PDF named .pdf', async () => {
      const eng = await signedIn(t.app, 'engineer');
      const up = await eng.post(`/api/alloys/${await alloyId()}/datasheets`).attach('file', PDF, { filename: 'old.pdf', contentType: 'application/pdf' });
      await t.dataSource.getRepository(Datasheet).update({ id: up.body.datasheet.id }, { originalName: 'old\u202Elmth.html' });
      const download = await eng.get(`/api/datasheets/${up.body.datasheet.id}`).buffer(true);
      expect(download.headers['content-type']).toBe('application/pdf');
      expect(download.headers['content-disposition'].replace(/"/g, '')).toBe('attachment; filename=oldlmth.pdf');
    });
  });

  describe('when storage fails', () => {
    it('when the store cannot be written (no such bucket; the folder is under a plain file), then 503 in the error shape and no row', async () => {
      const blocker = path.join(t.uploadsDir, 'not-a-folder');
      fs.writeFileSync(blocker, '');
      const unwritable = fake ? openObjectStore({ ...fake.config(prefix), bucket: 'no-such-bucket' }) : openObjectStore({ kind: 'folder', dir: path.join(blocker, 'uploads') });
      // A second app on the same database, keeping its files where nothing can be written.
      const mailer = new Mailer('smtp://127.0.0.1:9');
      const broken = createApp(t.dataSource, { uploadsDir: t.uploadsDir, objectStore: unwritable, mailer });
      try {
        const eng = await signedIn(broken, 'engineer');
        const res = await eng.post(`/api/alloys/${await alloyId()}/datasheets`).attach('file', PDF, { filename: 'a.pdf' });
        expect(res.status).toBe(503);
        expectErrorShape(res.body, 'storage_unavailable');
        expect(await datasheetRows()).toBe(0);
      } finally {
        unwritable.close();
        mailer.close();
      }
    });
  });

  describe('removing and large files', () => {
    it('when an editor removes a data sheet, then the stored file is deleted and the download answers 404', async () => {
      const eng = await signedIn(t.app, 'engineer');
      const sheet = (await eng.post(`/api/alloys/${await alloyId()}/datasheets`).attach('file', PDF, { filename: 'a.pdf' })).body.datasheet;
      expect(await storedFiles()).toHaveLength(1);
      expect((await eng.delete(`/api/datasheets/${sheet.id}`)).status).toBe(200);
      expect(await storedFiles()).toEqual([]);
      expect((await eng.get(`/api/datasheets/${sheet.id}`)).status).toBe(404);
    });

    it('when a 12 MB PDF is uploaded (more than two 5 MB upload parts), then the stored file and the download are exactly its bytes', async () => {
      const eng = await signedIn(t.app, 'engineer');
      const big = Buffer.concat([Buffer.from('%PDF-1.7\n'), Buffer.alloc(12 * 1024 * 1024, 0x41), Buffer.from('\n%%EOF\n')]);
      const res = await eng.post(`/api/alloys/${await alloyId()}/datasheets`).attach('file', big, { filename: 'big.pdf' });
      expect(res.status).toBe(201);
      expect(res.body.datasheet.sha256).toBe(createHash('sha256').update(big).digest('hex'));
      const [name] = await storedFiles();
      expect((await storedBytes(name)).equals(big)).toBe(true);
      const download = await eng.get(`/api/datasheets/${res.body.datasheet.id}`).buffer(true).parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      });
      expect(download.headers['content-length']).toBe(String(big.length));
      expect((download.body as Buffer).equals(big)).toBe(true);
      expect(fake?.pendingUploads() ?? []).toEqual([]);
    });

    it('when the stored file has gone missing, then the download answers 404 in the error shape', async () => {
      const eng = await signedIn(t.app, 'engineer');
      const sheet = (await eng.post(`/api/alloys/${await alloyId()}/datasheets`).attach('file', PDF, { filename: 'a.pdf' })).body.datasheet;
      const [name] = await storedFiles();
      await t.objectStore.remove(name);
      const res = await eng.get(`/api/datasheets/${sheet.id}`);
      expect(res.status).toBe(404);
      expectErrorShape(res.body, 'not_found');
    });
  });
});
