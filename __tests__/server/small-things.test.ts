import net from 'node:net';
import type { AddressInfo } from 'node:net';
import request from 'supertest';
import { answerClientErrors } from '../../server/http/request-guards';
import { client, createTestApp, expectErrorShape, HOST, signedIn, type TestApp } from './test-app';

let t: TestApp;
beforeEach(async () => {
  t = await createTestApp();
});
afterEach(() => t.close());

describe('small things', () => {
  it('when a POST names https:// for an http:// host, then it is a foreign origin', async () => {
    const res = await request(t.app).post('/api/auth/sign-in').set('Host', HOST).set('Origin', `https://${HOST}`).send({});
    expect(res.status).toBe(403);
    expectErrorShape(res.body, 'foreign_origin');
    expect((await client(t.app).post('/api/auth/sign-in').send({})).status).toBe(400);
  });

  it('when served over plain HTTP, then no Strict-Transport-Security; over HTTPS behind the proxy, then it is sent', async () => {
    expect((await request(t.app).get('/api/health')).headers['strict-transport-security']).toBeUndefined();
    const behindProxy = await createTestApp({ trustProxy: 1 });
    const res = await request(behindProxy.app).get('/api/health').set('X-Forwarded-Proto', 'https');
    expect(res.headers['strict-transport-security']).toMatch(/max-age=\d+/);
    await behindProxy.close();
  });

  it('when a job search holds a NUL or another control character, then 400 instead of every job', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    for (const search of ['\u0000', 'Road\u0000', '\u001b[2J']) {
      const res = await fab.get('/api/jobs').query({ search });
      expect(res.status).toBe(400);
      expectErrorShape(res.body, 'invalid_query');
    }
    expect((await fab.get('/api/jobs').query({ search: 'zzz-no-such-job' })).body.items).toEqual([]);
  });

  it('when the URL is longer than 8 KB, then 414 in the error shape', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const res = await fab.get(`/api/jobs?search=${'a'.repeat(9000)}`);
    expect(res.status).toBe(414);
    expectErrorShape(res.body, 'url_too_long');
  });

  it('when the request headers pass Node’s limit, then the real server answers 431 in the error shape', async () => {
    const server = t.app.listen(0, '127.0.0.1');
    answerClientErrors(server);
    await new Promise((r) => server.once('listening', r));
    const answer = await new Promise<string>((resolve) => {
      const socket = net.connect((server.address() as AddressInfo).port, '127.0.0.1', () => {
        socket.write(`GET /api/health?x=${'a'.repeat(20_000)} HTTP/1.1\r\nHost: ${HOST}\r\n\r\n`);
      });
      let text = '';
      socket.on('data', (c) => (text += c));
      socket.on('close', () => resolve(text));
      socket.on('error', () => resolve(text));
    });
    await new Promise((r) => server.close(r));
    expect(answer).toMatch(/^HTTP\/1\.1 431/);
    const body = JSON.parse(answer.slice(answer.indexOf('\r\n\r\n') + 4));
    expectErrorShape(body, 'headers_too_large');
  });

  it('when nobody is signed in, then GET /api/auth/me answers 200 with no user', async () => {
    const res = await request(t.app).get('/api/auth/me');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ user: null });
  });
});
