import type { Browser, Page } from 'playwright-core';
import { BASE_URL, DESKTOP, launchBrowser, newPage, pageErrors, PHONE, screenshot, signIn } from './browser';

jest.setTimeout(240_000);

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser.close();
});

/** The unit choice is stored per user on the server; each test starts (and leaves) the fabricator on metric. */
async function setUnits(page: Page, unitSystem: 'metric' | 'imperial') {
  const res = await page.request.put('/api/me/preferences', { data: { unitSystem }, headers: { Origin: BASE_URL } });
  expect(res.status()).toBe(200);
}

interface RunToAdd {
  name: string;
  lengthMm: string;
  startC: string;
  endC: string;
}

const RUNS: RunToAdd[] = [
  { name: 'Downpipe', lengthMm: '600', startC: '820', endC: '700' },
  { name: 'Mid-pipe', lengthMm: '900', startC: '640', endC: '520' },
  { name: 'Tailpipe', lengthMm: '1100', startC: '420', endC: '260' },
];

async function addRun(page: Page, jobName: string, run: RunToAdd, position: number) {
  await page.getByRole('button', { name: 'Add run', exact: true }).click();
  await page.getByRole('heading', { name: 'New run', level: 1 }).waitFor();
  // Added straight after the last save, the new run still starts from the job as it is now.
  expect(await page.getByLabel('Run name', { exact: true }).inputValue()).toBe(`Run ${position}`);
  const chooseAlloy = position === 1;
  await page.getByLabel('Run name', { exact: true }).fill(run.name);
  if (chooseAlloy) {
    await page.getByLabel('Search alloys', { exact: true }).fill('S32100');
    await page.getByRole('radio', { name: 'Type 321', exact: true }).click();
  }
  const segment = page.getByRole('group', { name: 'Segment 1', exact: true });
  await segment.getByLabel('Length (mm)', { exact: true }).fill(run.lengthMm);
  await segment.getByLabel('Start temperature (°C)', { exact: true }).fill(run.startC);
  await segment.getByLabel('End temperature (°C)', { exact: true }).fill(run.endC);
  // The live result shows before anything is saved.
  await page.getByRole('region', { name: 'Results' }).getByRole('group', { name: 'Growth', exact: true }).waitFor();
  await page.getByRole('button', { name: 'Save run', exact: true }).click();
  await page.getByRole('heading', { name: run.name, level: 1 }).waitFor();
  await page.getByRole('link', { name: 'Back to the job', exact: true }).click();
  await page.getByRole('heading', { name: jobName, level: 1 }).waitFor();
}

async function growthText(page: Page): Promise<string> {
  return (await page.getByRole('region', { name: 'Results' }).getByRole('group', { name: 'Growth', exact: true }).innerText()).replace('Growth', '').trim();
}

async function chartState(page: Page): Promise<{ label: string; paths: string; text: string }> {
  const chart = page.getByRole('img', { name: /^Growth along the run\./ });
  await chart.locator('path').first().waitFor();
  const label = (await chart.getAttribute('aria-label')) ?? '';
  const paths = (await chart.locator('path').evaluateAll((els) => els.map((e) => e.getAttribute('d') ?? ''))).join('|');
  const text = (await chart.locator('text').allTextContents()).join(' ');
  return { label, paths, text };
}

async function fabricatorWorkspace(size: 'phone' | 'desktop', viewport: { width: number; height: number }) {
  const { page, context } = await newPage(browser, viewport);
  await signIn(page, 'fabricator@dilato.test');
  await page.getByRole('heading', { name: / home$/ }).waitFor();
  await setUnits(page, 'metric');
  const jobName = `Browser ${size} turbo system ${Date.now()}`;
  const shot = (step: string) => screenshot(page, `jobs-${size}-${step}`);

  // --- a job with three runs ---
  await page.getByRole('link', { name: 'Jobs', exact: true }).first().click();
  await page.getByRole('heading', { name: 'Jobs', level: 1 }).waitFor();
  await page.getByRole('button', { name: 'New job', exact: true }).click();
  await page.getByLabel('Job name', { exact: true }).fill(jobName);
  await page.getByLabel('Customer', { exact: true }).fill('Invented test customer');
  await page.getByLabel('Application', { exact: true }).fill('Turbo exhaust for an invented test car');
  await shot('1-new-job');
  await page.getByRole('button', { name: 'Create job', exact: true }).click();
  await page.getByRole('heading', { name: jobName, level: 1 }).waitFor();
  await page.getByText('No runs yet', { exact: true }).waitFor();

  for (const [i, run] of RUNS.entries()) await addRun(page, jobName, run, i + 1);
  const runs = page.getByRole('list', { name: 'Runs' }).getByRole('article');
  // The job page may first show its cached answer from before the last save, then the fresh one.
  await runs.nth(2).waitFor();
  expect(await runs.count()).toBe(3);
  expect(await runs.nth(0).innerText()).toContain('Type 321 (S32100)');
  expect(await runs.nth(2).innerText()).toContain('Tailpipe');
  await page.getByRole('group', { name: 'System totals' }).getByText(/^\d+\.\d\d mm$/).first().waitFor();
  await runs.nth(0).scrollIntoViewIfNeeded();
  await shot('2-three-runs');

  // --- the chart follows a temperature change ---
  await page.getByRole('link', { name: 'Open Downpipe', exact: true }).click();
  await page.getByRole('heading', { name: 'Downpipe', level: 1 }).waitFor();
  const growthBefore = await growthText(page);
  const chartBefore = await chartState(page);
  expect(growthBefore).toMatch(/^\d+\.\d\d mm$/);
  expect(chartBefore.label).toContain(`grows ${growthBefore}`);
  await page.getByRole('group', { name: 'Segment 1', exact: true }).getByLabel('End temperature (°C)', { exact: true }).fill('900');
  await page.waitForFunction(
    (before) => {
      const group = document.querySelector('[role="region"][aria-label="Results"] [role="group"][aria-label="Growth"]');
      return group !== null && !group.textContent?.includes(before);
    },
    growthBefore,
  );
  const growthAfter = await growthText(page);
  const chartAfter = await chartState(page);
  // Hotter tube, more growth: the figure, the chart's description and its drawn lines all move.
  expect(parseFloat(growthAfter)).toBeGreaterThan(parseFloat(growthBefore));
  expect(chartAfter.label).toContain(`grows ${growthAfter}`);
  expect(chartAfter.label).toContain('peak 900 °C');
  expect(chartAfter.paths).not.toBe(chartBefore.paths);
  expect(chartAfter.text).not.toBe(chartBefore.text);
  await page.getByRole('img', { name: /^Growth along the run\./ }).scrollIntoViewIfNeeded();
  await shot('3-chart-after-temperature-change');
  await page.getByRole('button', { name: 'Save changes', exact: true }).click();
  await page.getByText(/^Saved\./).waitFor();

  // --- imperial ---
  await page.getByRole('radio', { name: 'Imperial (in, °F)', exact: true }).click();
  await page.getByLabel('Install temperature (°F)', { exact: true }).waitFor();
  expect(await page.getByLabel('Install temperature (°F)', { exact: true }).inputValue()).toBe('68');
  expect(await page.getByLabel('Outside diameter (in)', { exact: true }).inputValue()).toBe('2.5');
  const segment = page.getByRole('group', { name: 'Segment 1', exact: true });
  expect(await segment.getByLabel('End temperature (°F)', { exact: true }).inputValue()).toBe('1652');
  expect(await growthText(page)).toMatch(/^\d+\.\d\d\d in$/);
  const imperialChart = await chartState(page);
  expect(imperialChart.text).toContain('Temperature (°F)');
  expect(imperialChart.text).toContain('Distance from the start (in)');
  expect(imperialChart.label).toContain('peak 1652 °F');
  await page.getByRole('img', { name: /^Growth along the run\./ }).scrollIntoViewIfNeeded();
  await shot('4-imperial');

  // --- compare three alloys and adopt one (Alloy 601: its data reach this downpipe's 900 °C) ---
  await page.getByRole('link', { name: 'Compare alloys for this run', exact: true }).click();
  await page.getByRole('heading', { name: 'Compare alloys for Downpipe', level: 1 }).waitFor();
  for (const designation of ['Type 304/304L', 'Alloy 601', 'Alloy 625']) {
    await page.getByRole('checkbox', { name: `Compare ${designation}`, exact: true }).click();
  }
  const compared = page.getByRole(size === 'phone' ? 'list' : 'table', { name: 'Alloys compared' });
  await compared.getByText('Alloy 601 (N06601)', { exact: true }).waitFor();
  await compared.getByText('Current alloy', { exact: true }).waitFor();
  expect(await compared.innerText()).toContain(' in');
  await compared.scrollIntoViewIfNeeded();
  await shot('5-compare');
  await page.getByRole('button', { name: 'Use Alloy 601', exact: true }).click();
  await page.getByText('Alloy 601 is now the alloy of Downpipe.', { exact: true }).waitFor();
  // The adopted alloy is now the current row, and the old one is among the candidates.
  await page.getByRole('button', { name: 'Use Type 321', exact: true }).waitFor();
  expect(await page.getByRole('button', { name: 'Use Alloy 601', exact: true }).count()).toBe(0);
  await page.getByText('Alloy 601 is now the alloy of Downpipe.', { exact: true }).scrollIntoViewIfNeeded();
  await shot('6-adopted');

  await page.goto('/jobs');
  await page.getByRole('link', { name: jobName, exact: true }).click();
  await page.getByRole('heading', { name: jobName, level: 1 }).waitFor();
  expect(await runs.nth(0).innerText()).toContain('Alloy 601 (N06601)');

  // --- the job sheet ---
  await page.getByRole('link', { name: 'Open the job sheet', exact: true }).click();
  await page.getByText('Dilato job sheet', { exact: true }).waitFor();
  const sheetRuns = page.getByRole('article');
  expect(await sheetRuns.count()).toBe(3);
  const first = await sheetRuns.nth(0).innerText();
  expect(first).toContain('Alloy 601, UNS N06601, data version');
  expect(first).toMatch(/Growth\s+\d+\.\d\d\d in/);
  await page.getByText('Guidance only.', { exact: false }).first().waitFor();
  await shot('7-job-sheet');
  await page.evaluate(() => {
    (window as unknown as { printed: number }).printed = 0;
    window.print = () => {
      (window as unknown as { printed: number }).printed += 1;
    };
  });
  await page.getByRole('button', { name: 'Print the job sheet', exact: true }).click();
  expect(await page.evaluate(() => (window as unknown as { printed: number }).printed)).toBe(1);
  await page.emulateMedia({ media: 'print' });
  expect(await page.getByRole('navigation').first().isVisible()).toBe(false);
  expect(await page.getByRole('button', { name: 'Print the job sheet' }).isVisible()).toBe(false);
  expect(await sheetRuns.nth(2).isVisible()).toBe(true);
  await shot('8-job-sheet-print');

  await setUnits(page, 'metric');
  expect(pageErrors(page)).toEqual([]);
  await context.close();
}

describe('the fabricator’s workspace', () => {
  it('when a fabricator on a phone builds a three-run job, then the chart follows the temperatures, imperial shows inches and °F, an adopted alloy becomes the run’s, and the job sheet opens', async () => {
    await fabricatorWorkspace('phone', PHONE);
  });

  it('when a fabricator on a desktop builds a three-run job, then the chart follows the temperatures, imperial shows inches and °F, an adopted alloy becomes the run’s, and the job sheet opens', async () => {
    await fabricatorWorkspace('desktop', DESKTOP);
  });
});
