import { createTestApp, expectErrorShape, signedIn, type TestApp } from './test-app';

let t: TestApp;
beforeEach(async () => {
  t = await createTestApp();
});
afterEach(() => t.close());

describe('bad input answers 4xx, never 5xx', () => {
  it.each([
    ['a number', 5],
    ['an object', { a: 1 }],
    ['501 characters', 'x'.repeat(501)],
    ['null', null],
    ['a list', ['a']],
  ])('when a new alloy carries a note that is %s, then 400 names the note', async (_what, note) => {
    const eng = await signedIn(t.app, 'engineer');
    const id = (await eng.get('/api/alloys').query({ search: 'S30400' })).body.items[0].id;
    const detail = (await eng.get(`/api/alloys/${id}`)).body.alloy.published;
    const res = await eng.post('/api/alloys').send({ ...detail, uns: 'S99999', note });
    expect(res.status).toBe(400);
    expectErrorShape(res.body, 'invalid_input');
    expect(Object.keys(res.body.error.fields)).toEqual(['note']);
  });

  it('when 8 admins create a user with one e-mail at once, then one answers 201 and seven 409 email_taken', async () => {
    const admin = await signedIn(t.app, 'admin');
    const body = { email: 'Twin@Example.test', name: 'Twin', role: 'fabricator', password: 'long-enough-password' };
    const answers = await Promise.all(Array.from({ length: 8 }, (_, i) => admin.post('/api/users').send({ ...body, email: i % 2 ? body.email : body.email.toLowerCase() })));
    expect(answers.map((a) => a.status).sort()).toEqual([201, 409, 409, 409, 409, 409, 409, 409]);
    for (const a of answers.filter((x) => x.status === 409)) {
      expectErrorShape(a.body, 'email_taken');
      expect(a.body.error.fields).toEqual({ email: 'A user with this e-mail already exists' });
    }
    const users = (await admin.get('/api/users')).body.items.filter((u: { email: string }) => u.email === 'twin@example.test');
    expect(users).toHaveLength(1);
  });
});
