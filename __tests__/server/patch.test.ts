import { createTestApp, signedIn, type TestApp } from './test-app';
import { draftQuote } from './quote-helpers';

let t: TestApp;
beforeEach(async () => {
  t = await createTestApp();
});
afterEach(() => t.close());

describe('a PATCH changes only the fields it names', () => {
  it('when an inactive flex part gets a new price, then it stays inactive and keeps its other fields', async () => {
    const admin = await signedIn(t.app, 'admin');
    const part = (await admin.get('/api/flex-parts')).body.items[0];
    expect((await admin.patch(`/api/flex-parts/${part.id}`).send({ active: false })).body.flexPart.active).toBe(false);
    const res = await admin.patch(`/api/flex-parts/${part.id}`).send({ price: 12 });
    expect(res.status).toBe(200);
    expect(res.body.flexPart).toEqual({ ...part, active: false, price: 12 });
  });

  it('when a draft quote gets a new customer name, then its company and message stay', async () => {
    const sales = await signedIn(t.app, 'sales');
    const quote = await draftQuote(t.app, sales);
    const res = await sales.patch(`/api/quotes/${quote.id}`).send({ customerName: 'Oda K.' });
    expect(res.status).toBe(200);
    expect(res.body.quote).toMatchObject({ customerName: 'Oda K.', customerCompany: 'Kallstrom Track Days', message: 'As discussed at the bench.' });
    expect(res.body.quote.options).toEqual(quote.options);
  });

  it('when a job gets a new name, then its notes and status stay', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const job = (await fab.post('/api/jobs').send({ name: 'Patch job', customer: 'C', application: 'A', notes: 'Keep me' })).body.job;
    await fab.patch(`/api/jobs/${job.id}`).send({ status: 'archived' });
    const res = await fab.patch(`/api/jobs/${job.id}`).send({ name: 'Renamed job' });
    expect(res.body.job).toMatchObject({ name: 'Renamed job', notes: 'Keep me', status: 'archived', customer: 'C', application: 'A' });
  });

  it('when a user gets a new name, then the role and the active flag stay', async () => {
    const admin = await signedIn(t.app, 'admin');
    const user = (await admin.post('/api/users').send({ email: 'keep@example.test', name: 'Keep', role: 'sales', password: 'long-enough-password' })).body.user;
    await admin.patch(`/api/users/${user.id}`).send({ active: false });
    const res = await admin.patch(`/api/users/${user.id}`).send({ name: 'Kept' });
    expect(res.body.user).toMatchObject({ name: 'Kept', role: 'sales', active: false });
  });
});
