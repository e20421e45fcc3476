import type { APIRequestContext, Browser } from 'playwright-core';
import { BASE_URL, launchBrowser, newPage, pageErrors, PHONE, screenshot, signIn } from './browser';

jest.setTimeout(180_000);

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser.close();
});

const headers = { Origin: BASE_URL };
const LEAVE = 'You have changes on this page that are not saved. Leave without saving them?';

/** A job with one Type 321 run, made through the API as the signed-in person. */
async function jobWithRun(api: APIRequestContext, name: string) {
  const list = (await (await api.get('/api/alloys?search=S32100')).json()) as { items: { id: string; uns: string }[] };
  const alloy = list.items.find((a) => a.uns === 'S32100')!;
  const job = await api.post('/api/jobs', { headers, data: { name, customer: 'Invented test customer', application: 'Browser test pipework' } });
  const jobId = ((await job.json()) as { job: { id: string } }).job.id;
  const run = await api.post(`/api/jobs/${jobId}/runs`, {
    headers,
    data: { name: 'Back guard run', alloyId: alloy.id, tube: { odMm: 63.5, wallMm: 1.651 }, installTempC: 20, segments: [{ lengthMm: 600, startTempC: 700, endTempC: 600 }] },
  });
  expect(run.status()).toBe(201);
  return { jobId, runId: ((await run.json()) as { run: { id: string } }).run.id };
}

describe("the browser's Back button, at 390 px", () => {
  it('when a run has unsaved edits, then Back asks first: staying keeps the edits on the same screen, leaving goes back', async () => {
    const { context, page } = await newPage(browser, PHONE);
    await signIn(page, 'fabricator@dilato.test');
    await page.getByRole('heading', { name: 'Fabricator home' }).waitFor();
    const made = await jobWithRun(context.request, `Back guard job ${Date.now()}`);

    // Arrive at the run through the job page, in the app, so Back has a screen of the app to go to.
    await page.goto(`/jobs/${made.jobId}`);
    await page.getByRole('link', { name: /Back guard run/ }).first().click();
    await page.getByRole('heading', { name: 'Back guard run', level: 1 }).waitFor();
    const runUrl = page.url();

    // Without edits, Back asks nothing.
    const questions: string[] = [];
    page.on('dialog', (d) => {
      questions.push(d.message());
      void (questions.length === 1 ? d.dismiss() : d.accept());
    });
    await page.goBack();
    await page.waitForURL((url) => !url.pathname.includes('/runs/'));
    expect(questions).toEqual([]);
    await page.goForward();
    await page.getByRole('heading', { name: 'Back guard run', level: 1 }).waitFor();

    await page.getByLabel('Run name', { exact: true }).fill('Back guard run, edited');
    await page.getByText('Unsaved changes').waitFor();

    // Back with edits: the question comes; staying keeps the screen, its address and the edits.
    await page.goBack();
    await page.waitForFunction(() => window.location.pathname.includes('/runs/'));
    await page.waitForTimeout(300);
    expect(questions).toEqual([LEAVE]);
    expect(page.url()).toBe(runUrl);
    expect(await page.getByLabel('Run name', { exact: true }).inputValue()).toBe('Back guard run, edited');
    await page.getByText('Unsaved changes').waitFor();
    await screenshot(page, 'forms-2-back-kept');

    // Back again, and this time leave: the job page shows, and the edit was not saved.
    const asked = page.waitForEvent('dialog');
    await page.goBack();
    await asked;
    await page.waitForURL((url) => !url.pathname.includes('/runs/'));
    expect(questions).toEqual([LEAVE, LEAVE]);
    await page.getByRole('link', { name: /Back guard run/ }).first().waitFor();
    const run = (await (await context.request.get(`/api/runs/${made.runId}`)).json()) as { run: { name: string } };
    expect(run.run.name).toBe('Back guard run');
    expect(pageErrors(page)).toEqual([]);
    await context.close();
  });
});
