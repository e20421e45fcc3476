import type { Browser } from 'playwright-core';
import { BASE_URL, DESKTOP, launchBrowser, newPage, pageErrors, PHONE, screenshot, signIn } from './browser';

jest.setTimeout(240_000);

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser.close();
});

// The demo hill-climb job: manifold collector, turbo downpipe with a flex, mid-pipe with a slip joint, tailpipe.
const FIXINGS = ['Manifold flange → Turbo inlet flange', 'Turbo outlet → V-band clamp', 'V-band clamp → Slip joint', 'Slip joint → Free end'];

async function systemOfDemoJob(size: 'phone' | 'desktop', viewport: { width: number; height: number }) {
  const { page, context } = await newPage(browser, viewport);
  await signIn(page, 'fabricator@dilato.test');
  await page.getByRole('heading', { name: / home$/ }).waitFor();
  expect((await page.request.put('/api/me/preferences', { data: { unitSystem: 'metric' }, headers: { Origin: BASE_URL } })).status()).toBe(200);
  await page.goto('/jobs');
  await page.getByRole('link', { name: 'Hill-climb special: turbo exhaust', exact: true }).click();
  await page.getByRole('heading', { name: 'Hill-climb special: turbo exhaust', level: 1 }).waitFor();

  const drawing = page.getByRole('img', { name: /^System drawing of Hill-climb special: turbo exhaust:/ });
  await drawing.scrollIntoViewIfNeeded();
  expect(await drawing.getAttribute('aria-label')).toMatch(/4 runs in build order, 2 joints, \d+ supports and fixings, 4 nearby items, 1 too close\. Not to scale\./);
  const text = (await drawing.locator('text').allTextContents()).join(' | ');
  for (const f of FIXINGS) expect(text).toContain(f);
  // The hot movement is marked at both joints and at the supports.
  expect((text.match(/↔ \d+\.\d+ mm/g) ?? []).length).toBe(2);
  expect(text).toMatch(/→ \d+\.\d+ mm/);
  expect(text).toContain('Pipe temperature');
  // The drawing fits the screen: no sideways scroll at 390 px.
  const box = await drawing.boundingBox();
  expect(box!.width).toBeLessThanOrEqual(viewport.width);
  await screenshot(page, `system-${size}-1-drawing`);

  const checks = page.getByRole('list', { name: 'System checks' });
  expect(await checks.innerText()).toMatch(/Manifold collector\) the pipe is held at both ends with no joint/);
  expect(await checks.innerText()).toMatch(/Rear brake line \(brake line\) at 200\.0 mm keeps only .* fit a heat shield or reroute it/);
  const plan = page.getByRole('list', { name: 'Support plan' });
  expect(await plan.innerText()).toMatch(/Sliding support, Turbo downpipe at 180\.0 mm: Let it slide \d+\.\d+ mm towards the run’s end/);
  await checks.scrollIntoViewIfNeeded();
  await screenshot(page, `system-${size}-2-checks`);

  // The same drawing prints on the job sheet.
  await page.getByRole('link', { name: 'Open the job sheet', exact: true }).click();
  await page.getByText('Dilato job sheet', { exact: true }).waitFor();
  await page.getByRole('img', { name: /^System drawing of Hill-climb special/ }).waitFor();
  await page.emulateMedia({ media: 'print' });
  expect(await page.getByRole('img', { name: /^System drawing of Hill-climb special/ }).isVisible()).toBe(true);
  await screenshot(page, `system-${size}-3-job-sheet`);

  expect(pageErrors(page)).toEqual([]);
  await context.close();
}

describe('the system drawing and checks', () => {
  it('when a fabricator opens the demo hill-climb job on a phone, then the drawing shows every fixing and joint, and the checks flag the held collector and the brake line', async () => {
    await systemOfDemoJob('phone', PHONE);
  });

  it('when the same job is opened on a desktop, then the drawing and checks show as well', async () => {
    await systemOfDemoJob('desktop', DESKTOP);
  });
});
