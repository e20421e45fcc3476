import { createApp } from '../../server/app';
import { laterThan } from '../../server/jobs/revision-time';
import { Mailer } from '../../server/mail/mailer';
import { DEMO_PASSWORD } from '../../server/seed/demo-users';
import type { JobDetail } from '../../shared/schemas/jobs';
import { alloyId, newJob, newRun, runBody } from './jobs-helpers';
import { client, createTestApp, demoEmail, signedIn, type TestApp } from './test-app';

// The job answer is kept as JSON text between requests; these check that everything it rests on
// still reaches it at once, on this instance and on another one over the same database.

let t: TestApp;
beforeEach(async () => {
  t = await createTestApp();
});
afterEach(() => t.close());

type Client = Awaited<ReturnType<typeof signedIn>>;

const answer = async (c: Client, id: string) => {
  const res = await c.get(`/api/jobs/${id}`);
  expect(res.status).toBe(200);
  return { text: res.text, job: res.body.job as JobDetail };
};

async function jobWithRun(fab: Client) {
  const job = await newJob(fab, 'Answer cache job');
  const run = await newRun(fab, job.id, runBody(await alloyId(t, 'S32100'), 600));
  return { job, run };
}

describe('the job answer kept between requests', () => {
  it('when read twice with nothing changed, then the two answers are the same text', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const { job } = await jobWithRun(fab);
    const first = await answer(fab, job.id);
    expect((await answer(fab, job.id)).text).toBe(first.text);
    expect(first.job.runs).toHaveLength(1);
  });

  it('when a run is edited twice in a row, then the answer shows the second edit', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const { job, run } = await jobWithRun(fab);
    const before = (await answer(fab, job.id)).job.runs[0].result!.growthMm;
    const to = (tempC: number) => fab.patch(`/api/runs/${run.id}`).send({ segments: [{ lengthMm: 1000, startTempC: tempC, endTempC: tempC }] });
    // Two saves close together: the second must not share the first one's revision.
    const [a, b] = [await to(700), await to(800)];
    expect([a.status, b.status]).toEqual([200, 200]);
    const after = (await answer(fab, job.id)).job.runs[0];
    expect(after.segments[0].endTempC).toBe(800);
    expect(after.result!.growthMm).toBe(b.body.run.result.growthMm);
    expect(after.result!.growthMm).toBeGreaterThan(before);
  });

  it('when the shop changes its currency and an admin sets the rate, then the material cost follows in the new currency', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const admin = await signedIn(t.app, 'admin');
    const { job } = await jobWithRun(fab);
    const before = (await answer(fab, job.id)).job.runs[0];
    expect(before.currency).toBe('EUR');
    const settings = (await admin.get('/api/settings')).body.settings;
    expect((await admin.put('/api/settings').send({ ...settings, currency: 'USD' })).status).toBe(200);
    // No EUR → USD rate yet: the cost stays in the alloy's own currency.
    expect((await answer(fab, job.id)).job.runs[0].currency).toBe('EUR');
    expect((await admin.put('/api/currency-rates/EUR').send({ rate: 1.25 })).status).toBe(200);
    const converted = (await answer(fab, job.id)).job.runs[0];
    expect(converted.currency).toBe('USD');
    expect(converted.result!.materialCost).toBeCloseTo(before.result!.materialCost * 1.25, 9);
    expect((await admin.delete('/api/currency-rates/EUR')).status).toBe(200);
    expect((await answer(fab, job.id)).job.runs[0].currency).toBe('EUR');
  });

  it('when the job’s creator is renamed, then the answer names them by the new name', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const admin = await signedIn(t.app, 'admin');
    const { job } = await jobWithRun(fab);
    const creator = (await answer(fab, job.id)).job.createdBy!;
    expect((await admin.patch(`/api/users/${creator.id}`).send({ name: 'Renamed Fabricator' })).status).toBe(200);
    expect((await answer(fab, job.id)).job.createdBy).toEqual({ id: creator.id, name: 'Renamed Fabricator' });
  });

  it('when another instance edits the run or sets a rate, then this instance’s next answer has it', async () => {
    const mailer = new Mailer('smtp://127.0.0.1:9');
    try {
      const other = createApp(t.dataSource, { uploadsDir: t.uploadsDir, mailer });
      const signIn = async (app: typeof other, role: 'fabricator' | 'admin') => {
        const c = client(app);
        expect((await c.post('/api/auth/sign-in').send({ email: demoEmail(role), password: DEMO_PASSWORD })).status).toBe(200);
        return c;
      };
      const here = await signedIn(t.app, 'fabricator');
      const there = await signIn(other, 'fabricator');
      const { job, run } = await jobWithRun(here);
      const before = (await answer(here, job.id)).job.runs[0].result!.growthMm;
      expect((await there.patch(`/api/runs/${run.id}`).send({ segments: [{ lengthMm: 2000, startTempC: 600, endTempC: 600 }] })).status).toBe(200);
      // Twice the length at the same temperature grows twice as much.
      expect((await answer(here, job.id)).job.runs[0].result!.growthMm).toBeCloseTo(2 * before, 9);

      const adminThere = await signIn(other, 'admin');
      const settings = (await adminThere.get('/api/settings')).body.settings;
      expect((await adminThere.put('/api/settings').send({ ...settings, currency: 'GBP' })).status).toBe(200);
      expect((await adminThere.put('/api/currency-rates/EUR').send({ rate: 0.5 })).status).toBe(200);
      expect((await answer(here, job.id)).job.runs[0].currency).toBe('GBP');
    } finally {
      mailer.close();
    }
  });
});

describe('the job list kept between requests', () => {
  const page = async (c: Client) => {
    const res = await c.get('/api/jobs').query({ status: 'all', pageSize: 100 });
    expect(res.status).toBe(200);
    return { text: res.text, items: res.body.items as { id: string; name: string; totalGrowthMm: number; runCount: number }[] };
  };

  it('when nothing changed, then the same text; a run edit, a rename and a job made on another instance each show at once', async () => {
    const mailer = new Mailer('smtp://127.0.0.1:9');
    try {
      const fab = await signedIn(t.app, 'fabricator');
      const { job, run } = await jobWithRun(fab);
      const first = await page(fab);
      expect((await page(fab)).text).toBe(first.text);
      const before = first.items.find((j) => j.id === job.id)!;
      expect(before.runCount).toBe(1);

      expect((await fab.patch(`/api/runs/${run.id}`).send({ segments: [{ lengthMm: 3000, startTempC: 600, endTempC: 600 }] })).status).toBe(200);
      // Three times the length at the same temperature grows three times as much.
      expect((await page(fab)).items.find((j) => j.id === job.id)!.totalGrowthMm).toBeCloseTo(3 * before.totalGrowthMm, 9);

      expect((await fab.patch(`/api/jobs/${job.id}`).send({ name: 'Renamed answer cache job' })).status).toBe(200);
      expect((await page(fab)).items.find((j) => j.id === job.id)!.name).toBe('Renamed answer cache job');

      const other = createApp(t.dataSource, { uploadsDir: t.uploadsDir, mailer });
      const there = client(other);
      expect((await there.post('/api/auth/sign-in').send({ email: demoEmail('fabricator'), password: DEMO_PASSWORD })).status).toBe(200);
      const made = await newJob(there, 'Made on the other instance');
      expect((await page(fab)).items.map((j) => j.id)).toContain(made.id);
    } finally {
      mailer.close();
    }
  });
});

describe('revision times', () => {
  it('when the last save is stamped later than the clock (same millisecond or a clock step back), then the next is 1 ms after it', () => {
    const ahead = new Date(Date.now() + 60_000);
    expect(laterThan(ahead).getTime()).toBe(ahead.getTime() + 1);
    const past = new Date(Date.now() - 60_000);
    expect(laterThan(past).getTime()).toBeGreaterThanOrEqual(Date.now() - 5);
    expect(laterThan(null).getTime()).toBeGreaterThanOrEqual(Date.now() - 5);
  });
});
