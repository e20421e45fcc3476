import { client, createTestApp, expectErrorShape, signedIn, type TestApp } from './test-app';
import { ROLES } from '../../shared/schemas/auth';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe('/api/me/preferences', () => {
  it('when nobody is signed in, then reading and writing are 401', async () => {
    const anon = client(t.app);
    const get = await anon.get('/api/me/preferences');
    expect(get.status).toBe(401);
    expectErrorShape(get.body, 'signed_out');
    expect((await anon.put('/api/me/preferences').send({ unitSystem: 'imperial' })).status).toBe(401);
  });

  it.each(ROLES)('when a %s who never chose reads, then metric; after choosing imperial, then imperial', async (role) => {
    const c = await signedIn(t.app, role);
    const before = await c.get('/api/me/preferences');
    expect(before.status).toBe(200);
    expect(before.body).toEqual({ preferences: { unitSystem: 'metric' } });
    const put = await c.put('/api/me/preferences').send({ unitSystem: 'imperial' });
    expect(put.status).toBe(200);
    expect(put.body).toEqual({ preferences: { unitSystem: 'imperial' } });
    expect((await c.get('/api/me/preferences')).body.preferences.unitSystem).toBe('imperial');
    await c.put('/api/me/preferences').send({ unitSystem: 'metric' });
    expect((await c.get('/api/me/preferences')).body.preferences.unitSystem).toBe('metric');
  });

  it('when one user chooses imperial, then another user still reads their own choice', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const eng = await signedIn(t.app, 'engineer');
    await fab.put('/api/me/preferences').send({ unitSystem: 'imperial' });
    await eng.put('/api/me/preferences').send({ unitSystem: 'metric' });
    expect((await fab.get('/api/me/preferences')).body.preferences.unitSystem).toBe('imperial');
    expect((await eng.get('/api/me/preferences')).body.preferences.unitSystem).toBe('metric');
    const again = await signedIn(t.app, 'fabricator');
    expect((await again.get('/api/me/preferences')).body.preferences.unitSystem).toBe('imperial');
  });

  it('when the unit system is not metric or imperial, then 400 names unitSystem and nothing changes', async () => {
    const c = await signedIn(t.app, 'sales');
    await c.put('/api/me/preferences').send({ unitSystem: 'imperial' });
    for (const body of [{ unitSystem: 'cubits' }, {}, { unitSystem: 1 }]) {
      const res = await c.put('/api/me/preferences').send(body);
      expect(res.status).toBe(400);
      expectErrorShape(res.body, 'invalid_input');
      expect(Object.keys(res.body.error.fields)).toEqual(['unitSystem']);
    }
    expect((await c.get('/api/me/preferences')).body.preferences.unitSystem).toBe('imperial');
  });
});
