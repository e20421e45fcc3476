import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { Readable } from 'node:stream';
import { ConfigError, loadConfig, type StorageConfig } from '../../server/config';
import { openObjectStore, type ObjectStore } from '../../server/storage/object-store';
import { startS3Fake, type S3Fake } from './storage-fake';

describe('storage configuration', () => {
  it('when STORAGE_URL is unset, then data sheets stay in the uploads folder under DATA_DIR', () => {
    expect(loadConfig({ DATA_DIR: '/srv/dilato' }).storage).toEqual({ kind: 'folder', dir: path.resolve('/srv/dilato/uploads') });
  });

  it('when STORAGE_URL names a bucket and prefix with an endpoint and keys, then those are used, with the bucket in the path', () => {
    const c = loadConfig({
      STORAGE_URL: 's3://shop-files/dilato/sheets/',
      STORAGE_ENDPOINT: 'http://minio.internal:9000',
      AWS_REGION: 'eu-central-1',
      AWS_ACCESS_KEY_ID: 'AKIDEXAMPLE',
      AWS_SECRET_ACCESS_KEY: 'secret',
    });
    expect(c.storage).toEqual({
      kind: 's3',
      bucket: 'shop-files',
      prefix: 'dilato/sheets/',
      region: 'eu-central-1',
      endpoint: 'http://minio.internal:9000',
      forcePathStyle: true,
      credentials: { accessKeyId: 'AKIDEXAMPLE', secretAccessKey: 'secret' },
    });
  });

  it('when only a bucket is named and no endpoint, then AWS itself with the SDK’s own credentials and no prefix; AWS_ENDPOINT_URL also names an endpoint', () => {
    expect(loadConfig({ STORAGE_URL: 's3://shop-files' }).storage).toEqual({
      kind: 's3', bucket: 'shop-files', prefix: '', region: 'us-east-1', endpoint: undefined, forcePathStyle: false, credentials: undefined,
    });
    const viaAws = loadConfig({ STORAGE_URL: 's3://shop-files', AWS_ENDPOINT_URL: 'https://s3.example.net', STORAGE_PATH_STYLE: 'false' }).storage;
    expect(viaAws).toMatchObject({ endpoint: 'https://s3.example.net', forcePathStyle: false });
  });

  it('when STORAGE_URL is not an s3:// URL, or only one of the two keys is set, then start-up stops naming them', () => {
    expect(() => loadConfig({ STORAGE_URL: 'https://shop-files.s3.amazonaws.com' })).toThrow(/STORAGE_URL: must be s3:\/\/bucket/);
    expect(() => loadConfig({ STORAGE_URL: 's3://Shop_Files' })).toThrow(/STORAGE_URL/);
    expect(() => loadConfig({ STORAGE_URL: 's3://shop-files', AWS_ACCESS_KEY_ID: 'AKIDEXAMPLE' })).toThrow(ConfigError);
    expect(() => loadConfig({ STORAGE_URL: 's3://shop-files', AWS_ACCESS_KEY_ID: 'AKIDEXAMPLE' })).toThrow(/AWS_ACCESS_KEY_ID, AWS_SECRET_ACCESS_KEY: set both/);
  });
});

function failingAfter(bytes: Buffer): Readable {
  return new Readable({
    read() {
      this.push(bytes);
      this.destroy(new Error('the sender went away'));
    },
  });
}

describe.each(['folder', 's3'] as const)('the %s object store', (kind) => {
  let fake: S3Fake | undefined;
  let dir: string;
  let store: ObjectStore;
  let run = 0;
  beforeAll(async () => {
    if (kind === 's3') fake = await startS3Fake();
  });
  afterAll(async () => {
    await fake?.close();
  });
  beforeEach(() => {
    dir = fs.mkdtempSync(path.join(os.tmpdir(), 'dilato-store-'));
    const config: StorageConfig = fake ? fake.config(`store-${++run}`) : { kind: 'folder', dir };
    store = openObjectStore(config);
  });
  afterEach(() => {
    store.close();
    fs.rmSync(dir, { recursive: true, force: true });
  });

  it('when an object is put, then get returns its bytes and size, list finds it by prefix, and remove deletes it', async () => {
    const bytes = Buffer.from('%PDF-1.4\nsome bytes\n');
    await store.put('a1.pdf', Readable.from([bytes]));
    await store.put('b2.pdf', Readable.from([bytes]));
    const got = await store.get('a1.pdf');
    expect(got?.sizeBytes).toBe(bytes.length);
    expect(Buffer.concat(await got!.body.toArray()).equals(bytes)).toBe(true);
    expect((await store.list()).sort()).toEqual(['a1.pdf', 'b2.pdf']);
    expect(await store.list('a')).toEqual(['a1.pdf']);
    await store.remove('a1.pdf');
    expect(await store.get('a1.pdf')).toBeNull();
    expect(await store.list()).toEqual(['b2.pdf']);
    await expect(store.remove('a1.pdf')).resolves.toBeUndefined();
  });

  it('when the stream breaks part-way, then put fails and nothing is left under the key', async () => {
    await expect(store.put('broken.pdf', failingAfter(Buffer.alloc(64 * 1024, 0x41)))).rejects.toThrow();
    expect(await store.list()).toEqual([]);
    expect(fake?.pendingUploads() ?? []).toEqual([]);
  });

  it('when a key holds a path, then the store refuses it before touching anything', async () => {
    await expect(store.put('../escape.pdf', Readable.from([Buffer.from('x')]))).rejects.toThrow(/Not a storage key/);
    await expect(store.get('sub/dir.pdf')).rejects.toThrow(/Not a storage key/);
  });
});

describe('the folder object store only', () => {
  it('when a key is already taken, then put is refused and the file already there is left as it was', async () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'dilato-store-'));
    const store = openObjectStore({ kind: 'folder', dir });
    await store.put('same.pdf', Readable.from([Buffer.from('first')]));
    await expect(store.put('same.pdf', Readable.from([Buffer.from('second')]))).rejects.toThrow(/EEXIST/);
    expect(fs.readFileSync(path.join(dir, 'same.pdf'), 'utf8')).toBe('first');
    fs.rmSync(dir, { recursive: true, force: true });
  });
});
