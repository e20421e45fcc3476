import { ROLES, type Role } from '../../shared/schemas/auth';
import { client, createTestApp, expectErrorShape, signedIn, type TestApp } from './test-app';

let t: TestApp;
beforeEach(async () => {
  t = await createTestApp();
});
afterEach(() => t.close());

const newUser = { email: 'welder@dilato.test', name: 'Ada Brennholt', role: 'fabricator', password: 'long-enough-1' };

describe('user management is for admins only', () => {
  const routes: [string, 'get' | 'post' | 'patch', string, object?][] = [
    ['list users', 'get', '/api/users'],
    ['create a user', 'post', '/api/users', newUser],
    ['change a user', 'patch', '/api/users/some-id', { role: 'sales' }],
  ];

  for (const [what, method, url, body] of routes) {
    it(`when anonymous asks to ${what}, then 401`, async () => {
      const res = await client(t.app)[method](url).send(body);
      expect(res.status).toBe(401);
      expectErrorShape(res.body, 'signed_out');
    });
    for (const role of ROLES.filter((r) => r !== 'admin') as Role[]) {
      it(`when a ${role} asks to ${what}, then 403`, async () => {
        const c = await signedIn(t.app, role);
        const res = await c[method](url).send(body);
        expect(res.status).toBe(403);
        expectErrorShape(res.body, 'forbidden');
      });
    }
  }
});

describe('an admin manages users', () => {
  it('when the admin lists users, then the four demo users show with role and active flag', async () => {
    const admin = await signedIn(t.app, 'admin');
    const res = await admin.get('/api/users');
    expect(res.status).toBe(200);
    expect(res.body.items).toHaveLength(4);
    expect(res.body.items.map((u: { role: string }) => u.role).sort()).toEqual([...ROLES].sort());
    expect(res.body.items.every((u: { active: boolean }) => u.active)).toBe(true);
    expect(JSON.stringify(res.body)).not.toMatch(/argon2|password/i);
  });

  it('when the admin creates a user, then that user can sign in with the role given', async () => {
    const admin = await signedIn(t.app, 'admin');
    const created = await admin.post('/api/users').send(newUser);
    expect(created.status).toBe(201);
    expect(created.body.user).toMatchObject({ email: newUser.email, role: 'fabricator', active: true });

    const res = await client(t.app).post('/api/auth/sign-in').send({ email: newUser.email, password: newUser.password });
    expect(res.status).toBe(200);
    expect(res.body.user.role).toBe('fabricator');
  });

  it('when the e-mail is taken, then 409 names the email field', async () => {
    const admin = await signedIn(t.app, 'admin');
    const res = await admin.post('/api/users').send({ ...newUser, email: 'SALES@dilato.test' });
    expect(res.status).toBe(409);
    expectErrorShape(res.body, 'email_taken');
    expect(res.body.error.fields).toHaveProperty('email');
  });

  it('when the new user is invalid, then 400 names each field', async () => {
    const admin = await signedIn(t.app, 'admin');
    const res = await admin.post('/api/users').send({ email: 'x', name: '', role: 'boss', password: 'short' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['email', 'name', 'password', 'role']);
  });

  it('when the admin deactivates a signed-in user, then that user is signed out at once and cannot sign in', async () => {
    const admin = await signedIn(t.app, 'admin');
    const sales = await signedIn(t.app, 'sales');
    expect((await sales.get('/api/auth/me')).status).toBe(200);

    const list = await admin.get('/api/users');
    const salesId = list.body.items.find((u: { role: string }) => u.role === 'sales').id;
    const res = await admin.patch(`/api/users/${salesId}`).send({ active: false });
    expect(res.status).toBe(200);
    expect(res.body.user.active).toBe(false);

    expect((await sales.get('/api/auth/me')).body).toEqual({ user: null });
    const again = await client(t.app).post('/api/auth/sign-in').send({ email: 'sales@dilato.test', password: 'dilato-demo' });
    expect(again.status).toBe(403);
    expectErrorShape(again.body, 'account_inactive');
    expect(again.body.error.message).toMatch(/switched off.*Ask your shop's Dilato admin \(.+\)/);
    // A wrong password says nothing about the account.
    const wrong = await client(t.app).post('/api/auth/sign-in').send({ email: 'sales@dilato.test', password: 'not-the-password' });
    expect(wrong.status).toBe(401);
    expectErrorShape(wrong.body, 'invalid_credentials');
  });

  it('when the admin changes a role, then the user signs in again and has the new role', async () => {
    const admin = await signedIn(t.app, 'admin');
    const list = await admin.get('/api/users');
    const id = list.body.items.find((u: { role: string }) => u.role === 'fabricator').id;
    const res = await admin.patch(`/api/users/${id}`).send({ role: 'engineer' });
    expect(res.status).toBe(200);
    const fab = await signedIn(t.app, 'engineer'); // demo engineer is unchanged
    expect((await fab.get('/api/auth/me')).body.user.role).toBe('engineer');
    const moved = await client(t.app).post('/api/auth/sign-in').send({ email: 'fabricator@dilato.test', password: 'dilato-demo' });
    expect(moved.body.user.role).toBe('engineer');
  });

  it('when the only admin would demote themself, then 400 last_admin and nothing changes', async () => {
    const admin = await signedIn(t.app, 'admin');
    const me = (await admin.get('/api/auth/me')).body.user;
    const res = await admin.patch(`/api/users/${me.id}`).send({ role: 'sales' });
    expect(res.status).toBe(400);
    expectErrorShape(res.body, 'last_admin');
    expect((await admin.get('/api/auth/me')).body.user.role).toBe('admin');
  });

  it('when the user does not exist, then 404', async () => {
    const admin = await signedIn(t.app, 'admin');
    const res = await admin.patch('/api/users/no-such-user').send({ name: 'X' });
    expect(res.status).toBe(404);
    expectErrorShape(res.body, 'not_found');
  });
});
