/**
 * How the exported web app and the API answers travel: gzip where it pays, long-lived caching
 * only on files named after their content (RFC 9111 §5.2.2.1 max-age; RFC 8246 immutable).
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { isContentHashed } from '../../server/web/web-app';
import { createTestApp, signedIn, type TestApp } from './test-app';
import { compressWebExport } from '../../scripts/compress-web';


let t: TestApp;
const webDir = fs.mkdtempSync(path.join(os.tmpdir(), 'dilato-web-'));
const script = '_expo/static/js/web/entry-52cf050af203c1a60fedb2747e9e0517.js';
/** A second bundle the build step compresses beforehand. */
const packed = '_expo/static/js/web/all-screens-0b4f066fc7fe9e0517a1c60fedb2747e.js';
const packedSource = `console.log(${JSON.stringify('y'.repeat(30_000))});`;

beforeAll(async () => {
  fs.mkdirSync(path.join(webDir, path.dirname(script)), { recursive: true });
  fs.writeFileSync(path.join(webDir, script), `console.log(${JSON.stringify('x'.repeat(20_000))});`);
  fs.writeFileSync(path.join(webDir, 'index.html'), '<!doctype html><title>Dilato</title>');
  fs.writeFileSync(path.join(webDir, 'metadata.json'), '{}');
  // Only `packed` is there when the build step runs; `script` is left for the compression middleware.
  fs.renameSync(path.join(webDir, script), path.join(webDir, `${script}.later`));
  fs.writeFileSync(path.join(webDir, packed), packedSource);
  expect(compressWebExport(webDir).files).toBe(1);
  fs.renameSync(path.join(webDir, `${script}.later`), path.join(webDir, script));
  t = await createTestApp({ webDir });
});
afterAll(() => t.close());

describe('web delivery', () => {
  it('when a browser asks for a hashed script with gzip, then it comes gzipped and cached for a year as immutable', async () => {
    const res = await request(t.app).get(`/${script}`).set('Accept-Encoding', 'gzip');
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('gzip');
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
  });

  it('when a bundle was compressed at build time, then brotli or gzip go out as written, typed as JavaScript and cached as immutable', async () => {
    const br = await request(t.app).get(`/${packed}`).set('Accept-Encoding', 'gzip, deflate, br');
    expect(br.headers['content-encoding']).toBe('br');
    expect(br.headers['content-type']).toMatch(/^(application|text)\/javascript/);
    expect(br.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(br.headers.vary).toMatch(/Accept-Encoding/i);
    // The bytes sent are the build's .br file (its length), and they open to the bundle.
    expect(Number(br.headers['content-length'])).toBe(fs.statSync(path.join(webDir, `${packed}.br`)).size);
    expect(br.text).toBe(packedSource);
    const gz = await request(t.app).get(`/${packed}`).set('Accept-Encoding', 'gzip');
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(gz.text).toBe(packedSource);
    const plain = await request(t.app).get(`/${packed}`).set('Accept-Encoding', 'identity');
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.text).toBe(packedSource);
  });

  it('when it asks for the page or an unhashed file, then they are revalidated rather than cached for long', async () => {
    const page = await request(t.app).get('/jobs/abc').set('Accept-Encoding', 'gzip');
    expect(page.headers['cache-control']).toBe('no-cache');
    const meta = await request(t.app).get('/metadata.json');
    expect(meta.headers['cache-control']).toBe('public, max-age=3600');
  });

  it('when a signed-in user lists the catalogue with gzip, then the JSON comes gzipped and reads the same', async () => {
    const agent = await signedIn(t.app, 'fabricator');
    const plain = await agent.get('/api/alloys').set('Accept-Encoding', 'identity');
    const zipped = await agent.get('/api/alloys').set('Accept-Encoding', 'gzip');
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(zipped.headers['content-encoding']).toBe('gzip');
    expect(zipped.body).toEqual(plain.body);
  });

  it('names only content-hashed export files as hashed', () => {
    expect(isContentHashed(script.split('/').join(path.sep))).toBe(true);
    expect(isContentHashed(['assets', 'node_modules', 'SourceSans3_400Regular.16ce2edfa19b06ae874edddba2cf7fff.ttf'].join(path.sep))).toBe(true);
    expect(isContentHashed(`${script}.br`.split('/').join(path.sep))).toBe(true);
    expect(isContentHashed('metadata.json')).toBe(false);
    expect(isContentHashed('favicon.ico')).toBe(false);
  });
});
