import type { Browser } from 'playwright-core';
import { BASE_URL, launchBrowser, newPage, pageErrors, PHONE, screenshot, signIn } from './browser';

jest.setTimeout(240_000);

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser.close();
});

describe('the weld plan', () => {
  it('when a fabricator opens the demo road-car downpipe on a phone, then the 321 run lists ER309L to its carbon-steel turbo flange, ER347 at the flex cuffs, and the WPS caution, on the job page and the job sheet, and the run editor names the flange alloy', async () => {
    const { page, context } = await newPage(browser, PHONE);
    await signIn(page, 'fabricator@dilato.test');
    await page.getByRole('heading', { name: / home$/ }).waitFor();
    expect((await page.request.put('/api/me/preferences', { data: { unitSystem: 'metric' }, headers: { Origin: BASE_URL } })).status()).toBe(200);
    await page.goto('/jobs');
    await page.getByRole('link', { name: 'Road car downpipe', exact: true }).click();
    await page.getByRole('heading', { name: 'Road car downpipe', level: 1 }).waitFor();

    const heading = page.getByRole('heading', { name: 'Weld plan', level: 2 });
    await heading.scrollIntoViewIfNeeded();
    const welds = page.getByRole('list', { name: 'Welds of Downpipe, turbo to flex' });
    await welds.waitFor();
    const flange = welds.getByRole('listitem', { name: 'W1: Start: Turbo outlet' });
    expect(await flange.innerText()).toMatch(/Type 321 \(S32100\) to Carbon steel 1020 \(G10200\)\s+Filler ER309L \(AWS A5\.9\)/);
    expect(await flange.innerText()).toMatch(/Argon back-purge on the stainless or nickel side/);
    const cuff = welds.getByRole('listitem', { name: 'W2: Flex part, inlet cuff' });
    expect(await cuff.innerText()).toMatch(/Type 321 \(S32100\) to Type 321 \(S32100\)\s+Filler ER347 \(AWS A5\.9\)/);
    const cautions = page.getByRole('region', { name: 'Welding cautions' }).or(page.getByLabel('Welding cautions'));
    const cautionText = await cautions.first().innerText();
    expect(cautionText).toMatch(/qualified welding procedure specification \(WPS\) and qualified welders govern every weld/);
    expect(cautionText).toMatch(/hexavalent chromium/);
    // Nothing runs off the side of a 390 px screen.
    expect((await welds.boundingBox())!.width).toBeLessThanOrEqual(PHONE.width);
    await flange.scrollIntoViewIfNeeded();
    await screenshot(page, 'welds-phone-1-job');

    // The run editor names the flange's alloy under its flanged end.
    await page.getByRole('link', { name: 'Open Downpipe, turbo to flex', exact: true }).click();
    await page.getByText('Start flange alloy', { exact: true }).waitFor();
    await page.getByText('Carbon steel 1020 (G10200)', { exact: true }).waitFor();
    expect(await page.getByText('End flange alloy', { exact: true }).count()).toBe(0);
    await page.getByRole('button', { name: 'Same as the tube' }).waitFor();
    await page.goBack();
    await page.getByRole('heading', { name: 'Road car downpipe', level: 1 }).waitFor();

    await page.getByRole('link', { name: 'Open the job sheet', exact: true }).click();
    await page.getByText('Dilato job sheet', { exact: true }).waitFor();
    const sheetWelds = page.getByRole('list', { name: 'Welds of Downpipe, turbo to flex' });
    await sheetWelds.waitFor();
    expect(await sheetWelds.innerText()).toMatch(/ER309L[\s\S]*ER347/);
    await page.emulateMedia({ media: 'print' });
    expect(await sheetWelds.isVisible()).toBe(true);
    expect(await page.getByText(/qualified welders govern every weld/).first().isVisible()).toBe(true);
    await screenshot(page, 'welds-phone-2-job-sheet');

    expect(pageErrors(page)).toEqual([]);
    await context.close();
  });

  it('when an engineer opens Weld rules on a phone, then the seeded rules show with their sources and can be edited', async () => {
    const { page, context } = await newPage(browser, PHONE);
    await signIn(page, 'engineer@dilato.test');
    await page.getByRole('heading', { name: / home$/ }).waitFor();
    await page.goto('/weld-rules');
    await page.getByRole('heading', { name: 'Weld rules', level: 1 }).waitFor();
    await page.waitForFunction(() => document.title === 'Weld rules · Dilato');
    await page.getByLabel('Find a rule').fill('S32100');
    const rule = page.getByRole('article', { name: 'ER347: S32100, S32109, S34700 to S32100, S32109, S34700' });
    expect(await rule.innerText()).toMatch(/Source: AWS A5\.9/);
    await rule.getByRole('button', { name: /^Edit the rule/ }).click();
    await rule.getByLabel('Shop procedure (WPS) reference').fill('WPS-21');
    await rule.getByRole('button', { name: 'Save rule' }).click();
    await rule.getByText('Shop procedure: WPS-21').waitFor();
    await rule.getByRole('button', { name: /^History of the rule/ }).click();
    await rule.getByText(/procedureRef: \(empty\) → WPS-21/).waitFor();
    await screenshot(page, 'welds-phone-3-rules');
    expect(pageErrors(page)).toEqual([]);
    await context.close();
  });
});
