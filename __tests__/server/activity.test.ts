import type { ActivityView } from '../../shared/schemas/activity';
import { DEMO_USERS } from '../../server/seed/demo-users';
import { createTestApp, signedIn, type TestApp } from './test-app';
import { alloyId, newJob, newRun, runBody } from './jobs-helpers';
import { draftQuote } from './quote-helpers';

let t: TestApp;
beforeEach(async () => {
  t = await createTestApp();
});
afterEach(() => t.close());

const nameOf = (role: string) => DEMO_USERS.find((u) => u.role === role)!.name;

describe('activity on jobs, runs and quotes', () => {
  it('when two people change one job and its runs, then the job lists who did what, newest first, deleted runs included', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const eng = await signedIn(t.app, 'engineer');
    const job = await newJob(fab, 'Shared bench job');
    const s321 = await alloyId(t, 'S32100');
    const run = await newRun(fab, job.id, runBody(s321, 600, { name: 'Downpipe' }));
    expect((await eng.patch(`/api/runs/${run.id}`).send({ name: 'Downpipe, long' })).status).toBe(200);
    const copy = (await eng.post(`/api/runs/${run.id}/duplicate`).send({})).body.run;
    expect((await fab.put(`/api/jobs/${job.id}/runs/order`).send({ runIds: [copy.id, run.id] })).status).toBe(200);
    expect((await eng.delete(`/api/runs/${copy.id}`)).status).toBe(204);
    expect((await eng.patch(`/api/jobs/${job.id}`).send({ status: 'archived' })).status).toBe(200);

    const items = (await (await signedIn(t.app, 'sales')).get(`/api/jobs/${job.id}/activity`)).body.items as ActivityView[];
    expect(items.map((a) => [a.subject, a.action, a.by])).toEqual([
      ['job', 'archived', nameOf('engineer')],
      ['run', 'deleted', nameOf('engineer')],
      ['job', 'reordered', nameOf('fabricator')],
      ['run', 'duplicated', nameOf('engineer')],
      ['run', 'edited', nameOf('engineer')],
      ['run', 'created', nameOf('fabricator')],
      ['job', 'created', nameOf('fabricator')],
    ]);
    expect(items[4].changes).toEqual([{ path: 'name', before: 'Downpipe', after: 'Downpipe, long' }]);

    const runItems = (await fab.get(`/api/runs/${run.id}/activity`)).body.items as ActivityView[];
    expect(runItems.map((a) => a.action)).toEqual(['edited', 'created']);
  });

  it('when another salesperson edits and sends a draft quote, then the quote says so', async () => {
    const sales = await signedIn(t.app, 'sales');
    const admin = await signedIn(t.app, 'admin');
    const quote = await draftQuote(t.app, sales);
    expect((await admin.patch(`/api/quotes/${quote.id}`).send({ message: 'Changed by the admin' })).status).toBe(200);
    expect((await admin.post(`/api/quotes/${quote.id}/send`).send({})).status).toBe(200);
    const items = (await sales.get(`/api/quotes/${quote.id}/activity`)).body.items as ActivityView[];
    expect(items.map((a) => [a.action, a.by])).toEqual([
      ['sent', nameOf('admin')],
      ['edited', nameOf('admin')],
      ['created', nameOf('sales')],
    ]);
    expect(items[1].changes).toEqual([{ path: 'message', before: 'As discussed at the bench.', after: 'Changed by the admin' }]);
  });

  it('when a change changes nothing, then no entry is written', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const job = await newJob(fab, 'Same name');
    await fab.patch(`/api/jobs/${job.id}`).send({ name: 'Same name' });
    expect(((await fab.get(`/api/jobs/${job.id}/activity`)).body.items as ActivityView[]).map((a) => a.action)).toEqual(['created']);
  });
});
