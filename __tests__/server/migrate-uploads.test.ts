import { createHash } from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { openObjectStore } from '../../server/storage/object-store';
import { copyUploads, folderStore, objectStoreFiles } from '../../scripts/lib/migrate-uploads';
import { startS3Fake, type S3Fake } from './storage-fake';

let fake: S3Fake;
let dir: string;
beforeAll(async () => {
  fake = await startS3Fake();
});
afterAll(() => fake.close());
beforeEach(() => {
  dir = fs.mkdtempSync(path.join(os.tmpdir(), 'dilato-move-'));
});
afterEach(() => fs.rmSync(dir, { recursive: true, force: true }));

const sha = (b: Buffer) => createHash('sha256').update(b).digest('hex');

describe('moving data sheets into an S3-compatible bucket', () => {
  it('when the folder holds data sheets, then each lands in the bucket with the same bytes, and a second copy into the filled bucket is refused', async () => {
    const sheets = { 'a1.pdf': Buffer.from('%PDF-1.4\nfirst sheet\n'), 'b2.pdf': Buffer.concat([Buffer.from('%PDF-1.7\n'), Buffer.alloc(6 * 1024 * 1024, 7)]) };
    for (const [name, bytes] of Object.entries(sheets)) fs.writeFileSync(path.join(dir, name), bytes);
    const store = openObjectStore(fake.config('moved'));
    try {
      const report = await copyUploads(folderStore(dir), objectStoreFiles(store, 's3://dilato-test/moved'));
      expect(report).toEqual({ files: 2, bytes: sheets['a1.pdf'].length + sheets['b2.pdf'].length });
      // Read back with a plain SDK client, not through the store that wrote them.
      expect((await fake.list('moved')).sort()).toEqual(['a1.pdf', 'b2.pdf']);
      expect(sha(await fake.read('moved/b2.pdf'))).toBe(sha(sheets['b2.pdf']));
      await expect(copyUploads(folderStore(dir), objectStoreFiles(store, 's3://dilato-test/moved'))).rejects.toThrow(/already hold 2 files/);
    } finally {
      store.close();
    }
  });
});
