import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { DESKTOP, launchBrowser, newPage, pageErrors, PHONE, screenshot, signIn } from './browser';

// Type 347: the other browser tests neither edit it nor depend on its data; the test reads
// its current values first, so it also holds on a database that has seen earlier runs.
const UNS = 'S34700';
const DESIGNATION = 'Type 347';

let browser: Browser;
let pdfPath: string;
beforeAll(async () => {
  browser = await launchBrowser();
  // A few MB starting with the PDF magic bytes: enough for the progress bar to move.
  pdfPath = path.join(fs.mkdtempSync(path.join(os.tmpdir(), 'dilato-pdf-')), 'type-347-mill-sheet.pdf');
  const body = Buffer.alloc(4 * 1024 * 1024, 0x20);
  Buffer.from('%PDF-1.4\n').copy(body);
  Buffer.from('\n%%EOF\n').copy(body, body.length - 7);
  fs.writeFileSync(pdfPath, body);
});
afterAll(async () => {
  await browser.close();
  fs.rmSync(path.dirname(pdfPath), { recursive: true, force: true });
});

async function signedIn(email: string, viewport = DESKTOP): Promise<Page> {
  const { page } = await newPage(browser, viewport);
  await signIn(page, email);
  await page.getByRole('heading', { name: / home$/ }).waitFor();
  return page;
}

interface Published {
  id: string;
  version: number;
  densityKgM3: number;
}

async function readPublished(page: Page): Promise<Published> {
  const list = await (await page.request.get(`/api/alloys?search=${UNS}`)).json();
  const id = list.items[0].id as string;
  const { alloy } = await (await page.request.get(`/api/alloys/${id}`)).json();
  return { id, version: alloy.published.version, densityKgM3: alloy.published.densityKgM3 };
}

describe('the alloy catalogue', () => {
  it('when an engineer uploads a data sheet and drafts a new density, and an admin publishes it, then a fabricator sees the new value and version', async () => {
    // --- engineer ---
    const engineer = await signedIn('engineer@dilato.test');
    const before = await readPublished(engineer);
    const newDensity = before.densityKgM3 + 10;

    await engineer.getByRole('link', { name: 'Catalogue' }).first().click();
    await engineer.getByLabel('Search designation or UNS').fill(UNS);
    await engineer.getByRole('link', { name: DESIGNATION, exact: true }).click();
    await engineer.getByRole('heading', { name: DESIGNATION, level: 1 }).waitFor();
    await engineer.getByText(`Version ${before.version}`, { exact: true }).waitFor();
    await screenshot(engineer, 'catalogue-1-engineer-detail');
    await engineer.getByRole('img', { name: /^Growth per metre against temperature/ }).scrollIntoViewIfNeeded();
    await screenshot(engineer, 'catalogue-1b-detail-charts');

    // Slow the upload down so that the bar is seen moving, as on a shop's connection.
    const cdp = await engineer.context().newCDPSession(engineer);
    await cdp.send('Network.emulateNetworkConditions', {
      offline: false,
      latency: 20,
      downloadThroughput: 50 * 1024 * 1024,
      uploadThroughput: 1.5 * 1024 * 1024,
    });
    const chooser = engineer.waitForEvent('filechooser');
    await engineer.getByRole('button', { name: 'Upload a data sheet' }).click();
    await (await chooser).setFiles(pdfPath);
    const bar = engineer.getByRole('progressbar', { name: 'Upload progress' });
    await bar.waitFor();
    await engineer.waitForFunction(() => {
      const el = document.querySelector('[role="progressbar"][aria-label="Upload progress"]');
      const now = Number(el?.getAttribute('aria-valuenow'));
      return now > 0 && now < 100;
    });
    await screenshot(engineer, 'catalogue-2-upload-progress');
    await engineer.getByRole('link', { name: 'Download type-347-mill-sheet.pdf' }).waitFor({ timeout: 30_000 });
    expect(await bar.getAttribute('aria-valuenow')).toBe('100');
    await engineer.getByText('100 %', { exact: true }).waitFor();
    await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: -1 });
    await screenshot(engineer, 'catalogue-3-upload-done');

    await engineer.getByRole('link', { name: 'Edit this alloy' }).click();
    const density = engineer.getByLabel('Density (kg/m³)', { exact: true });
    await density.waitFor();
    expect(await density.inputValue()).toBe(String(before.densityKgM3));
    await density.fill(String(newDensity));
    await engineer.getByLabel('Note for this change', { exact: true }).fill('Density from the supplier’s mill sheet');
    await screenshot(engineer, 'catalogue-4-edit');
    await engineer.getByRole('button', { name: 'Save draft' }).click();
    await engineer.getByRole('heading', { name: `Draft version ${before.version + 1}` }).waitFor();
    const drafted = engineer.getByRole('list', { name: 'Draft changes' });
    await drafted.getByText(`${newDensity} kg/m³`).waitFor();
    await screenshot(engineer, 'catalogue-5-draft-saved');
    expect(pageErrors(engineer)).toEqual([]);
    await engineer.context().close();

    // --- admin ---
    const admin = await signedIn('admin@dilato.test');
    await admin.goto(`/alloys/${before.id}/review`);
    await admin.getByRole('heading', { name: `Review ${DESIGNATION}` }).waitFor();
    const changes = admin.getByRole('list', { name: 'Changes to publish' });
    const densityChange = changes.getByRole('listitem').filter({ hasText: 'Density' });
    await densityChange.getByText(`${before.densityKgM3} kg/m³`).waitFor();
    await densityChange.getByText(`${newDensity} kg/m³`).waitFor();
    await admin.getByLabel('Note for the history', { exact: true }).fill('Checked against the mill sheet');
    await screenshot(admin, 'catalogue-6-admin-review');
    await admin.getByRole('button', { name: 'Publish' }).click();
    await admin.getByRole('alertdialog', { name: 'Confirm publishing' }).getByRole('button', { name: 'Yes, publish' }).click();
    await admin.getByRole('heading', { name: DESIGNATION, level: 1 }).waitFor();
    await admin.getByText(`Version ${before.version + 1}`, { exact: true }).waitFor();
    await screenshot(admin, 'catalogue-7-published');
    expect(pageErrors(admin)).toEqual([]);
    await admin.context().close();

    // --- fabricator ---
    const fabricator = await signedIn('fabricator@dilato.test', PHONE);
    await fabricator.goto(`/alloys/${before.id}`);
    await fabricator.getByRole('heading', { name: DESIGNATION, level: 1 }).waitFor();
    await fabricator.getByText(`Version ${before.version + 1}`, { exact: true }).waitFor();
    await fabricator.getByRole('group', { name: 'Density' }).getByText(`${newDensity} kg/m³`, { exact: true }).waitFor();
    await fabricator.getByRole('link', { name: 'Download type-347-mill-sheet.pdf' }).first().waitFor();
    expect(await fabricator.getByRole('link', { name: 'Edit this alloy' }).count()).toBe(0);
    await screenshot(fabricator, 'catalogue-8-fabricator-sees-new-value');
    expect(pageErrors(fabricator)).toEqual([]);
    await fabricator.context().close();
  });

  it('when the catalogue is opened on a phone, then alloys show as cards; on a desktop, as a table', async () => {
    const phone = await signedIn('fabricator@dilato.test', PHONE);
    await phone.goto('/alloys');
    await phone.getByRole('article', { name: DESIGNATION }).waitFor();
    expect(await phone.getByRole('table', { name: 'Alloys' }).count()).toBe(0);
    expect(await phone.getByRole('article').count()).toBeGreaterThanOrEqual(15);
    await phone.getByRole('article').first().scrollIntoViewIfNeeded();
    await screenshot(phone, 'catalogue-list-phone');
    await phone.context().close();

    const desk = await signedIn('fabricator@dilato.test', DESKTOP);
    await desk.goto('/alloys');
    const table = desk.getByRole('table', { name: 'Alloys' });
    await table.waitFor();
    expect(await table.getByRole('row').count()).toBeGreaterThanOrEqual(16);
    expect(await desk.getByRole('article').count()).toBe(0);
    await screenshot(desk, 'catalogue-list-desktop');
    expect(pageErrors(desk)).toEqual([]);
    await desk.context().close();
  });

  it('when three alloys are ticked and compared, then the comparison shows all three side by side', async () => {
    const page = await signedIn('sales@dilato.test', DESKTOP);
    await page.goto('/alloys');
    const picks = ['Type 321', 'Alloy 625', 'Type 409'];
    for (const name of picks) await page.getByRole('checkbox', { name: `Compare ${name}`, exact: true }).click();
    await page.getByRole('button', { name: 'Compare selected alloys' }).click();
    await page.getByRole('heading', { name: 'Compare alloys' }).waitFor();
    const table = page.getByRole('table', { name: 'Comparison' });
    await table.waitFor();
    for (const name of picks) await table.getByRole('columnheader', { name }).waitFor();
    await page.getByRole('img', { name: /Growth per metre/ }).waitFor();
    // One drawn line per alloy (the drawing loads with the first chart).
    const paths = page.getByRole('img', { name: /Growth per metre/ }).locator('svg path');
    await paths.nth(picks.length - 1).waitFor();
    expect(await paths.count()).toBeGreaterThanOrEqual(picks.length);
    await page.getByLabel('Compare growth at (°C)', { exact: true }).fill('600');
    await table.getByRole('rowheader', { name: 'Growth at 600 °C' }).waitFor();
    await screenshot(page, 'catalogue-compare');
    expect(pageErrors(page)).toEqual([]);
    await page.context().close();
  });

  it('when the admin opens the flex parts, then the dozen show with edit controls; a fabricator only reads them', async () => {
    const admin = await signedIn('admin@dilato.test', DESKTOP);
    await admin.getByRole('link', { name: 'Flex parts' }).first().click();
    await admin.getByRole('heading', { name: 'Flex parts', level: 1 }).waitFor();
    await admin.getByRole('heading', { name: 'Add a flex part' }).waitFor();
    // The form shows before the list has loaded.
    await admin.getByRole('article').nth(11).waitFor();
    expect(await admin.getByRole('article').count()).toBeGreaterThanOrEqual(12);
    expect(await admin.getByRole('button', { name: /^Edit / }).count()).toBeGreaterThanOrEqual(12);
    await screenshot(admin, 'catalogue-flex-parts-admin');
    await admin.context().close();

    const fabricator = await signedIn('fabricator@dilato.test', PHONE);
    await fabricator.goto('/flex-parts');
    await fabricator.getByRole('article').first().waitFor();
    expect(await fabricator.getByRole('button', { name: /^Edit / }).count()).toBe(0);
    expect(await fabricator.getByRole('heading', { name: 'Add a flex part' }).count()).toBe(0);
    await screenshot(fabricator, 'catalogue-flex-parts-phone');
    expect(pageErrors(fabricator)).toEqual([]);
    await fabricator.context().close();
  });
});
