import path from 'node:path';
import type { APIRequestContext, Browser, Page } from 'playwright-core';
import { BASE_URL, DESKTOP, launchBrowser, newPage, OUTPUT_DIR, pageErrors, PHONE, screenshot, signIn } from './browser';

jest.setTimeout(240_000);

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser.close();
});

const headers = { Origin: BASE_URL };
// °F = °C × 9/5 + 32; a difference scales by 9/5 alone (NIST SP 811 §4.2.1.1).
const toF = (c: number) => Math.round((c * 9) / 5 + 32);

async function setUnits(api: APIRequestContext, unitSystem: 'metric' | 'imperial') {
  expect((await api.put('/api/me/preferences', { data: { unitSystem }, headers })).status()).toBe(200);
}

interface Alloy321 {
  id: string;
  maxContinuousC: number;
  maxIntermittentC: number;
  maxDataC: number;
}

async function type321(api: APIRequestContext): Promise<Alloy321> {
  const list = (await (await api.get('/api/alloys?search=S32100')).json()) as { items: (Alloy321 & { uns: string })[] };
  return list.items.find((a) => a.uns === 'S32100')!;
}

/** A job with one run of Type 321 running just under its governing limit, made through the API as the fabricator. */
async function nearLimitRun(api: APIRequestContext, name: string) {
  const alloy = await type321(api);
  const governingC = Math.min(alloy.maxContinuousC, alloy.maxIntermittentC);
  const peakC = Math.min(governingC - 20, alloy.maxDataC);
  const job = await api.post('/api/jobs', { headers, data: { name, customer: 'Invented test customer', application: 'Browser test pipework' } });
  expect(job.status()).toBe(201);
  const jobId = ((await job.json()) as { job: { id: string } }).job.id;
  const run = await api.post(`/api/jobs/${jobId}/runs`, {
    headers,
    data: {
      name: 'Hot downpipe',
      alloyId: alloy.id,
      tube: { odMm: 63.5, wallMm: 1.651 },
      installTempC: 20,
      segments: [{ lengthMm: 600, startTempC: peakC, endTempC: peakC - 100 }],
    },
  });
  expect(run.status()).toBe(201);
  const runId = ((await run.json()) as { run: { id: string } }).run.id;
  return { jobId, runId, peakC, governingC, governedBy: alloy.maxIntermittentC <= alloy.maxContinuousC ? 'intermittent' : 'continuous', alloy };
}

/** Nothing on the page reaches past the right edge of the window. */
async function fitsWidth(page: Page): Promise<boolean> {
  return page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth);
}

async function rightEdges(page: Page, selector: string): Promise<number[]> {
  return page.locator(selector).evaluateAll((els) => els.map((e) => e.getBoundingClientRect().right));
}

describe('imperial everywhere, at 390 px', () => {
  it('when the fabricator works in imperial, then warnings, chart titles, typed values, the catalogue and flex parts all read in °F and inches', async () => {
    const { context, page } = await newPage(browser, PHONE);
    await signIn(page, 'fabricator@dilato.test');
    await page.getByRole('heading', { name: 'Fabricator home' }).waitFor();
    const api = context.request;
    await setUnits(api, 'imperial');
    const made = await nearLimitRun(api, `Browser imperial job ${Date.now()}`);

    await page.goto(`/jobs/${made.jobId}/runs/${made.runId}`);
    await page.getByRole('heading', { name: 'Hot downpipe', level: 1 }).waitFor();
    const warnings = page.getByRole('list', { name: 'Warnings' });
    await warnings.waitFor();
    const warningText = await warnings.innerText();
    // The caution band is 50 °C = 90 °F (a difference: no 32 °F offset).
    expect(warningText).toContain(`Peak ${toF(made.peakC)} °F is within 90 °F of the alloy's ${made.governedBy} limit of ${toF(made.governingC)} °F`);
    expect(warningText).not.toMatch(/°C/);
    await page.getByRole('img', { name: /^Growth per 100 ft against temperature/ }).waitFor();
    expect(await page.getByRole('img', { name: /per metre/ }).count()).toBe(0);
    await screenshot(page, 'units-1-run-imperial-warnings');

    // Typed in °F, saved, read back: the box shows what was typed, not a converted-back "871.111".
    const segment = page.getByRole('group', { name: 'Segment 1', exact: true });
    await segment.getByLabel('Start temperature (°F)', { exact: true }).fill('871');
    await page.getByLabel('Install temperature (°F)', { exact: true }).fill('70');
    await page.getByRole('button', { name: 'Save changes', exact: true }).click();
    await page.getByText('Saved. The server worked the results out again').waitFor();
    await page.reload();
    await page.getByRole('heading', { name: 'Hot downpipe', level: 1 }).waitFor();
    expect(await segment.getByLabel('Start temperature (°F)', { exact: true }).inputValue()).toBe('871');
    expect(await page.getByLabel('Install temperature (°F)', { exact: true }).inputValue()).toBe('70');
    const stored = (await (await api.get(`/api/runs/${made.runId}`)).json()) as { run: { installTempC: number; segments: { startTempC: number }[] } };
    // The stored value is exact: (871 − 32) × 5/9 and (70 − 32) × 5/9.
    expect(stored.run.segments[0].startTempC).toBeCloseTo(((871 - 32) * 5) / 9, 9);
    expect(stored.run.installTempC).toBeCloseTo(((70 - 32) * 5) / 9, 9);
    await page.getByRole('radio', { name: 'Metric (mm, °C)' }).click();
    await segment.getByLabel('Start temperature (°C)', { exact: true }).waitFor();
    expect(await segment.getByLabel('Start temperature (°C)', { exact: true }).inputValue()).toBe('466');
    expect(await page.getByLabel('Install temperature (°C)', { exact: true }).inputValue()).toBe('21');
    await page.getByRole('radio', { name: 'Imperial (in, °F)' }).click();
    await segment.getByLabel('Start temperature (°F)', { exact: true }).waitFor();
    await screenshot(page, 'units-2-run-typed-back');

    // The catalogue and the flex parts follow the same choice.
    await page.goto(`/alloys/${made.alloy.id}`);
    await page.getByText(`${toF(made.alloy.maxIntermittentC)} °F`).first().waitFor();
    await page.getByRole('img', { name: /^Growth per 100 ft against temperature/ }).waitFor();
    await screenshot(page, 'units-3-alloy-imperial');
    await page.goto('/flex-parts');
    await page.getByRole('heading', { name: 'Flex parts', level: 1 }).waitFor();
    const firstPart = page.getByRole('article').first();
    await firstPart.waitFor();
    // The part's name is the maker's words ("… 50.8 mm bore …"); its figures follow the user's units.
    const facts = await firstPart.innerText();
    expect(facts).toMatch(/Bore\s+\d+\.\d{2} in/);
    expect(facts).toMatch(/Live length\s+\d+\.\d{2} in/);
    expect(facts).toMatch(/Maximum temperature\s+\d+ °F/);
    expect(facts).not.toMatch(/°C|\d mm\n/);
    await screenshot(page, 'units-4-flex-parts-imperial');

    await setUnits(api, 'metric');
    expect(pageErrors(page)).toEqual([]);
    await context.close();
  });

  it('when sales quotes in imperial on a phone, then each option is a card that fits the screen, with masses in lb and margins in °F', async () => {
    const { context, page } = await newPage(browser, PHONE);
    await signIn(page, 'sales@dilato.test');
    await page.getByRole('heading', { name: 'Sales home' }).waitFor();
    await setUnits(context.request, 'imperial');
    await page.goto('/quotes/new');
    await page.getByRole('heading', { name: 'New quote' }).waitFor();
    await page.getByRole('button', { name: 'Job', exact: true }).click();
    await page.getByRole('radio', { name: 'Road car downpipe' }).click();
    await page.getByRole('button', { name: 'Add an option' }).click();
    for (const [n, alloy] of [
      [1, /^Type 321 \(S32100\)/],
      [2, /^Alloy 625 \(N06625\)/],
      [3, /^Type 304\/304L \(S30400\)/],
    ] as const) {
      await page.getByRole('button', { name: `Alloy for option ${n}`, exact: true }).click();
      await page.getByRole('radio', { name: alloy }).click();
    }
    const cards = page.getByRole('list', { name: 'Options compared' });
    await cards.waitFor();
    expect(await page.getByRole('table', { name: 'Options compared' }).count()).toBe(0);
    const items = cards.getByRole('listitem');
    expect(await items.count()).toBe(3);
    for (const right of await items.evaluateAll((els) => els.map((e) => e.getBoundingClientRect().right))) expect(right).toBeLessThanOrEqual(PHONE.width);
    const third = await items.nth(2).innerText();
    expect(third).toMatch(/Material mass\s+\d+\.\d{2} lb/);
    expect(third).toMatch(/°F in hand|over the limit by \d+ °F/);
    expect(third).not.toMatch(/ kg\b|°C/);
    await items.nth(2).scrollIntoViewIfNeeded();
    await screenshot(page, 'units-5-quote-cards-phone');
    await setUnits(context.request, 'metric');
    expect(pageErrors(page)).toEqual([]);
    await context.close();
  });
});

describe('phone layouts at 390 px', () => {
  it('when a job and its run have a long flex badge, then it wraps inside the screen', async () => {
    const { context, page } = await newPage(browser, PHONE);
    await signIn(page, 'fabricator@dilato.test');
    await page.getByRole('heading', { name: 'Fabricator home' }).waitFor();
    await page.getByRole('link', { name: 'Jobs', exact: true }).first().click();
    await page.getByRole('link', { name: 'Road car downpipe', exact: true }).click();
    await page.getByRole('heading', { name: 'Road car downpipe', level: 1 }).waitFor();
    const badge = page.getByText(/^Flex sized: /).first();
    await badge.waitFor();
    const box = (await badge.boundingBox())!;
    expect(box.x + box.width).toBeLessThanOrEqual(PHONE.width);
    expect(await fitsWidth(page)).toBe(true);
    await screenshot(page, 'layout-1-job-flex-badge-phone');

    const flexRun = page.getByRole('article').filter({ hasText: /Flex sized: / }).first();
    const runName = ((await flexRun.getAttribute('aria-label')) ?? '').replace(/^Run \d+: /, '');
    await flexRun.getByRole('link', { name: `Open ${runName}`, exact: true }).click();
    await page.getByRole('heading', { name: runName, level: 1 }).waitFor();
    const runBadge = page.getByRole('region', { name: 'Results' }).getByText(/^Flex sized: /).first();
    await runBadge.waitFor();
    const runBox = (await runBadge.boundingBox())!;
    expect(runBox.x + runBox.width).toBeLessThanOrEqual(PHONE.width);
    expect(Math.max(...(await rightEdges(page, '[role="group"][aria-label^="Verdict"] > div')))).toBeLessThanOrEqual(PHONE.width);
    expect(await fitsWidth(page)).toBe(true);
    // The tab title names the run and its job.
    expect(await page.title()).toMatch(new RegExp(`^Run \\d · ${runName} · Road car downpipe · Dilato$`));
    await screenshot(page, 'layout-2-run-flex-badge-phone');
    expect(pageErrors(page)).toEqual([]);
    await context.close();
  });

  it('when three alloys are compared on a phone, then every property is listed and no word breaks mid-word', async () => {
    const { context, page } = await newPage(browser, PHONE);
    await signIn(page, 'sales@dilato.test');
    await page.getByRole('heading', { name: 'Sales home' }).waitFor();
    const alloys = (await (await context.request.get('/api/alloys')).json()) as { items: { id: string; uns: string }[] };
    const ids = ['S32100', 'N06625', 'S40910'].map((uns) => alloys.items.find((a) => a.uns === uns)!.id);
    await page.goto(`/alloys/compare?ids=${ids.join(',')}`);
    await page.getByRole('heading', { name: 'Compare alloys' }).waitFor();
    const list = page.getByRole('list', { name: 'Comparison' });
    await list.waitFor();
    expect(await page.getByRole('table', { name: 'Comparison' }).count()).toBe(0);
    await list.getByText('Austenitic').first().waitFor();
    // Each family word sits on one line: a word broken mid-word would give two boxes.
    const boxesPerWord = await page.evaluate(() => {
      const out: number[] = [];
      const walker = document.createTreeWalker(document.querySelector('[aria-label="Comparison"]')!, NodeFilter.SHOW_TEXT);
      for (let node = walker.nextNode(); node; node = walker.nextNode()) {
        const text = node.textContent ?? '';
        for (const m of text.matchAll(/[A-Za-z]{6,}/g)) {
          const range = document.createRange();
          range.setStart(node, m.index!);
          range.setEnd(node, m.index! + m[0].length);
          out.push(range.getClientRects().length);
        }
      }
      return out;
    });
    expect(boxesPerWord.length).toBeGreaterThan(10);
    expect(boxesPerWord.every((n) => n === 1)).toBe(true);
    expect(await fitsWidth(page)).toBe(true);
    await list.getByText('Austenitic').first().scrollIntoViewIfNeeded();
    await screenshot(page, 'layout-3-compare-phone');
    expect(pageErrors(page)).toEqual([]);
    await context.close();
  });
});

describe('not losing work, at 390 px', () => {
  it('when a run has unsaved edits, then a field says what is wrong as it is left, another tab asks first, and closing the page is guarded', async () => {
    const { context, page } = await newPage(browser, PHONE);
    await signIn(page, 'fabricator@dilato.test');
    await page.getByRole('heading', { name: 'Fabricator home' }).waitFor();
    await setUnits(context.request, 'metric');
    const made = await nearLimitRun(context.request, `Browser guard job ${Date.now()}`);
    await page.goto(`/jobs/${made.jobId}/runs/${made.runId}`);
    await page.getByRole('heading', { name: 'Hot downpipe', level: 1 }).waitFor();
    const guarded = () => page.evaluate(() => !window.dispatchEvent(new Event('beforeunload', { cancelable: true })));
    expect(await guarded()).toBe(false);

    // The message shows on leaving the field, before any save.
    const segment = page.getByRole('group', { name: 'Segment 1', exact: true });
    const length = segment.getByLabel('Length (mm)', { exact: true });
    await length.fill('-5');
    await page.getByLabel('Run name', { exact: true }).focus();
    await segment.getByText(/Length must be more than 0/).waitFor();
    await length.fill('650');
    await page.getByLabel('Run name', { exact: true }).fill('Hot downpipe, edited');
    await page.getByText('Unsaved changes').waitFor();
    expect(await guarded()).toBe(true);

    // Another tab: the question comes; staying keeps the edits.
    const questions: string[] = [];
    page.once('dialog', (d) => {
      questions.push(d.message());
      void d.dismiss();
    });
    await page.getByRole('link', { name: 'Jobs', exact: true }).first().click();
    await page.getByText('Unsaved changes').waitFor();
    expect(questions).toEqual(['You have changes on this page that are not saved. Leave without saving them?']);
    expect(page.url()).toContain(`/runs/${made.runId}`);
    expect(await page.getByLabel('Run name', { exact: true }).inputValue()).toBe('Hot downpipe, edited');
    await screenshot(page, 'forms-1-unsaved-kept');

    // Saving clears the guard; leaving then asks nothing.
    await page.getByRole('button', { name: 'Save changes', exact: true }).click();
    await page.getByText('Saved. The server worked the results out again').waitFor();
    expect(await guarded()).toBe(false);
    await page.getByLabel('Run name', { exact: true }).fill('Hot downpipe, edited twice');
    page.once('dialog', (d) => void d.accept());
    await page.getByRole('link', { name: 'Jobs', exact: true }).first().click();
    await page.getByRole('heading', { name: 'Jobs', level: 1 }).waitFor();
    expect(await page.title()).toBe('Jobs · Dilato');
    expect(pageErrors(page)).toEqual([]);
    await context.close();
  });
});

describe('signing in, at 390 px', () => {
  it('when a colleague’s job link is opened signed out, then sign-in leads back to that job', async () => {
    const fab = await newPage(browser, PHONE);
    await signIn(fab.page, 'fabricator@dilato.test');
    await fab.page.getByRole('heading', { name: 'Fabricator home' }).waitFor();
    const jobs = (await (await fab.context.request.get('/api/jobs')).json()) as { items: { id: string; name: string }[] };
    const job = jobs.items.find((j) => j.name.startsWith('Hill-climb'))!;
    await fab.context.close();

    const { context, page } = await newPage(browser, PHONE);
    await page.goto(`/jobs/${job.id}`);
    await page.waitForURL(/\/sign-in\?next=/);
    await page.getByRole('button', { name: 'Sign in', exact: true }).waitFor();
    await page.waitForFunction(() => document.title === 'Sign in · Dilato');
    // The tab shows the app's own mark (assets/favicon.png, exported as favicon.ico).
    expect(await page.locator('link[rel="icon"]').getAttribute('href')).toBe('/favicon.ico');
    const icon = await context.request.get('/favicon.ico');
    expect(icon.status()).toBe(200);
    expect(icon.headers()['content-type']).toMatch(/^image\//);
    await page.getByLabel('Email', { exact: true }).fill('engineer@dilato.test');
    await page.getByLabel('Password', { exact: true }).fill('dilato-demo');
    await page.getByRole('button', { name: 'Sign in', exact: true }).click();
    await page.getByRole('heading', { name: job.name, level: 1 }).waitFor();
    expect(new URL(page.url()).pathname).toBe(`/jobs/${job.id}`);
    await screenshot(page, 'sign-in-deep-link-landed');
    expect(pageErrors(page)).toEqual([]);
    await context.close();
  });

  it('when a switched-off account signs in, then it is told so and whom to ask; a stale failure clears as the fields change', async () => {
    const admin = await newPage(browser, PHONE);
    await signIn(admin.page, 'admin@dilato.test');
    await admin.page.getByRole('heading', { name: 'Admin home' }).waitFor();
    const email = `switched-off-${Date.now()}@dilato.test`;
    const created = await admin.context.request.post('/api/users', { headers, data: { email, name: 'Invented leaver', role: 'fabricator', password: 'leaver-password-1' } });
    expect(created.status()).toBe(201);
    const userId = ((await created.json()) as { user: { id: string } }).user.id;
    expect((await admin.context.request.patch(`/api/users/${userId}`, { headers, data: { active: false } })).status()).toBe(200);
    await admin.context.close();

    const { context, page } = await newPage(browser, PHONE);
    await signIn(page, email, 'leaver-password-1');
    const alert = page.getByRole('alert');
    await alert.waitFor();
    const said = (await alert.textContent()) ?? '';
    expect(said).toMatch(/This account is switched off/);
    expect(said).toMatch(/Ask your shop's Dilato admin \(.+\) to switch it back on/);
    expect(said).not.toMatch(/password is not right/);
    await screenshot(page, 'sign-in-switched-off');

    // A wrong password for the same account says nothing about it; the failure goes as soon as a field changes.
    await page.getByLabel('Password', { exact: true }).fill('wrong-password');
    await page.getByRole('button', { name: 'Sign in', exact: true }).click();
    await page.getByText(/e-mail or password is not right/i).waitFor();
    await page.getByLabel('Email', { exact: true }).fill('not-an-address');
    await page.getByLabel('Password', { exact: true }).focus();
    await page.getByText('Enter a valid e-mail address').waitFor();
    expect(await page.getByText(/e-mail or password is not right/i).count()).toBe(0);
    await screenshot(page, 'sign-in-stale-error-cleared');
    await context.close();
  });
});

describe('the run editor at 1280 px', () => {
  it('when the form is scrolled down, then the results column stays in view beside it', async () => {
    const { context, page } = await newPage(browser, DESKTOP);
    await signIn(page, 'fabricator@dilato.test');
    await page.getByRole('heading', { name: 'Fabricator home' }).waitFor();
    await setUnits(context.request, 'metric');
    const made = await nearLimitRun(context.request, `Browser desktop job ${Date.now()}`);
    await page.goto(`/jobs/${made.jobId}/runs/${made.runId}`);
    await page.getByRole('heading', { name: 'Hot downpipe', level: 1 }).waitFor();
    const results = page.getByRole('region', { name: 'Results' });
    const growthFigure = results.getByRole('group', { name: 'Growth', exact: true });
    await growthFigure.waitFor();
    const before = (await growthFigure.boundingBox())!;
    // Down the form to its supports, past where the growth figure would have scrolled away.
    const field = page.getByRole('button', { name: 'Add support', exact: true });
    await field.scrollIntoViewIfNeeded();
    const form = (await field.boundingBox())!;
    const scrolled = await page.evaluate(() => document.querySelector('main > div')!.scrollTop);
    expect(scrolled).toBeGreaterThan(before.y + before.height);
    const growth = (await growthFigure.boundingBox())!;
    // The field being edited and the growth figure are both inside the window, side by side.
    expect(form.y).toBeGreaterThanOrEqual(0);
    expect(form.y + form.height).toBeLessThanOrEqual(DESKTOP.height);
    expect(growth.y).toBeGreaterThanOrEqual(0);
    expect(growth.y + growth.height).toBeLessThanOrEqual(DESKTOP.height);
    expect(growth.x).toBeGreaterThan(form.x + form.width);
    await screenshot(page, 'layout-4-run-editor-sticky-desktop');
    // The viewport shot shows what the person sees, not the full page.
    await page.screenshot({ path: path.join(OUTPUT_DIR, 'layout-4b-run-editor-sticky-viewport.png') });
    await page.getByRole('link', { name: 'Jobs', exact: true }).first().click();
    await page.getByRole('heading', { name: 'Jobs', level: 1 }).waitFor();
    expect(pageErrors(page)).toEqual([]);
    await context.close();
  });
});
