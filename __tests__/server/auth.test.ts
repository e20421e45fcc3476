import { DEMO_PASSWORD } from '../../server/seed/demo-users';
import { client, createTestApp, demoEmail, expectErrorShape, HOST, signedIn, type TestApp } from './test-app';
import request from 'supertest';

let t: TestApp;
beforeEach(async () => {
  t = await createTestApp();
});
afterEach(() => t.close());

describe('health and the error shape', () => {
  it('when health is asked, then it answers ok', async () => {
    const res = await client(t.app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: 'ok' });
  });

  it('when an unknown API route is asked, then 404 comes in the error shape', async () => {
    const res = await client(t.app).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expectErrorShape(res.body, 'not_found');
  });

  it('when the body is not JSON, then 400 invalid_json without a stack', async () => {
    const res = await client(t.app).post('/api/auth/sign-in').set('Content-Type', 'application/json').send('{"email":');
    expect(res.status).toBe(400);
    expectErrorShape(res.body, 'invalid_json');
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.ts|node_modules/);
  });

  it('when the sign-in body is invalid, then 400 names each bad field', async () => {
    const res = await client(t.app).post('/api/auth/sign-in').send({ email: 'not-an-address' });
    expect(res.status).toBe(400);
    expectErrorShape(res.body, 'invalid_input');
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['email', 'password']);
  });
});

describe('sign-in, me and sign-out', () => {
  it('when the demo fabricator signs in, then the user comes back with an HttpOnly Lax session cookie', async () => {
    const res = await client(t.app)
      .post('/api/auth/sign-in')
      .send({ email: 'Fabricator@Dilato.test ', password: DEMO_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({
      user: { id: expect.any(String), email: 'fabricator@dilato.test', name: expect.any(String), role: 'fabricator' },
    });
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/dilato_session=\w+/);
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);
    expect(cookie).not.toMatch(/Secure/);
  });

  it('when served over HTTPS behind a trusted proxy, then the cookie is Secure', async () => {
    const secure = await createTestApp({ trustProxy: 1 });
    const res = await client(secure.app)
      .post('/api/auth/sign-in')
      .set('X-Forwarded-Proto', 'https')
      .set('Origin', `https://${HOST}`)
      .send({ email: demoEmail('sales'), password: DEMO_PASSWORD });
    expect(res.status).toBe(200);
    expect(String(res.headers['set-cookie'])).toMatch(/Secure/);
    await secure.close();
  });

  it('when the password is wrong or the e-mail unknown, then both get the same generic 401', async () => {
    const wrong = await client(t.app).post('/api/auth/sign-in').send({ email: demoEmail('admin'), password: 'nope-nope' });
    const unknown = await client(t.app).post('/api/auth/sign-in').send({ email: 'nobody@dilato.test', password: 'nope-nope' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expectErrorShape(wrong.body, 'invalid_credentials');
    expect(wrong.body).toEqual(unknown.body);
    expect(wrong.headers['set-cookie']).toBeUndefined();
  });

  it('when signed in, then me answers the user; after sign-out, me answers 200 with no user', async () => {
    const c = await signedIn(t.app, 'engineer');
    const me = await c.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body.user).toMatchObject({ email: 'engineer@dilato.test', role: 'engineer' });

    const out = await c.post('/api/auth/sign-out');
    expect(out.status).toBe(204);
    const after = await c.get('/api/auth/me');
    expect(after.status).toBe(200);
    expect(after.body).toEqual({ user: null });
    // Routes that need a user still answer 401.
    expectErrorShape((await c.get('/api/jobs')).body, 'signed_out');
  });

  it('when a signed-out session cookie is replayed, then it no longer works', async () => {
    const c = await signedIn(t.app, 'sales');
    const cookie = (await c.get('/api/auth/me')).request.getHeader?.('cookie');
    await c.post('/api/auth/sign-out');
    const replay = await request(t.app).get('/api/auth/me').set('Host', HOST).set('Cookie', String(cookie));
    expect(replay.body).toEqual({ user: null });
    expect((await request(t.app).get('/api/jobs').set('Host', HOST).set('Cookie', String(cookie))).status).toBe(401);
  });
});

describe('the same-origin rule for state-changing requests', () => {
  it('when a POST has no Origin header, then 403', async () => {
    const res = await request(t.app)
      .post('/api/auth/sign-in')
      .set('Host', HOST)
      .send({ email: demoEmail('admin'), password: DEMO_PASSWORD });
    expect(res.status).toBe(403);
    expectErrorShape(res.body, 'foreign_origin');
  });

  it('when a POST comes from a foreign origin, then 403 and no session', async () => {
    const res = await request(t.app)
      .post('/api/auth/sign-in')
      .set('Host', HOST)
      .set('Origin', 'http://evil.example')
      .send({ email: demoEmail('admin'), password: DEMO_PASSWORD });
    expect(res.status).toBe(403);
    expect(res.headers['set-cookie']).toBeUndefined();
  });

  it('when a GET has no Origin, then it is served', async () => {
    const res = await request(t.app).get('/api/health').set('Host', HOST);
    expect(res.status).toBe(200);
  });
});
