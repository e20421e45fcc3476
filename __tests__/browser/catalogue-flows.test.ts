import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { BASE_URL, launchBrowser, newPage, pageErrors, PHONE, screenshot, signIn } from './browser';

// Each flow works on an alloy or part no other browser test touches, and reads current values
// first, so it holds on a database that earlier runs have changed.
let browser: Browser;
let dir: string;
beforeAll(async () => {
  browser = await launchBrowser();
  dir = fs.mkdtempSync(path.join(os.tmpdir(), 'dilato-flows-'));
});
afterAll(async () => {
  await browser.close();
  fs.rmSync(dir, { recursive: true, force: true });
});

async function signedIn(email: string): Promise<Page> {
  const { page } = await newPage(browser, PHONE);
  await signIn(page, email);
  await page.getByRole('heading', { name: / home$/ }).waitFor();
  return page;
}

async function alloyIdOf(page: Page, uns: string): Promise<string> {
  const { items } = await (await page.request.get(`/api/alloys?search=${uns}&includeDrafts=true&includeRetired=true`)).json();
  return (items as { id: string; uns: string }[]).find((a) => a.uns === uns)!.id;
}

const unique = () => String(Date.now() % 100000).padStart(5, '0');

describe('catalogue flows at 390 px', () => {
  it('when an engineer imports a CSV with one new alloy and one bad row, then the report names both and the new alloy is a draft', async () => {
    const engineer = await signedIn('engineer@dilato.test');
    const exported = await (await engineer.request.get('/api/alloys/export.csv')).text();
    const [header, ...rows] = exported.trim().split('\n');
    const uns = `N9${unique().slice(1)}`;
    const copied = rows.filter((r) => r.startsWith('S30409,')).map((r) => r.replace(/^S30409,[^,]*,/, `${uns},Trial alloy ${uns},`));
    expect(copied.length).toBeGreaterThan(3);
    const file = path.join(dir, 'trial-alloy.csv');
    // The same data under another UNS, but a family the catalogue does not know: refused by line.
    const bad = `N9${unique().slice(1, 4)}99`;
    const broken = copied[0].replace(new RegExp(`^${uns},Trial alloy ${uns},[^,]*,`), `${bad},Broken alloy,unobtainium,`);
    fs.writeFileSync(file, [header, ...copied, broken].join('\n'));

    await engineer.goto('/alloys');
    const chooser = engineer.waitForEvent('filechooser');
    await engineer.getByRole('button', { name: 'Import CSV' }).click();
    await (await chooser).setFiles(file);
    const report = engineer.getByLabel('Import report');
    await report.getByText(`Created 1: ${uns}`).waitFor({ timeout: 30_000 });
    await report.getByText('Refused rows 1').waitFor();
    await report.getByText(new RegExp(`^Line ${copied.length + 2} \\(${bad}\\): `)).waitFor();
    await report.scrollIntoViewIfNeeded();
    await screenshot(engineer, 'catalogue-flows-1-csv-import-report');

    await engineer.goto(`/alloys/${await alloyIdOf(engineer, uns)}`);
    await engineer.getByRole('heading', { name: `Trial alloy ${uns}`, level: 1 }).waitFor();
    await engineer.getByRole('heading', { name: 'Draft version 1' }).waitFor();
    expect(pageErrors(engineer)).toEqual([]);
    await engineer.context().close();
  });

  it('when an admin retires an alloy with a note, then a fabricator no longer finds it; restored, it is listed again', async () => {
    const admin = await signedIn('admin@dilato.test');
    const id = await alloyIdOf(admin, 'S43940');
    const state = (await (await admin.request.get(`/api/alloys/${id}`)).json()).alloy.status;
    if (state === 'retired') await admin.request.post(`/api/alloys/${id}/restore`, { headers: { Origin: BASE_URL }, data: { note: 'Back for the test' } });

    await admin.goto(`/alloys/${id}`);
    await admin.getByRole('heading', { name: 'Type 441', level: 1 }).waitFor();
    await admin.getByLabel('Note for the history', { exact: true }).fill('No longer stocked by our supplier');
    await admin.getByRole('button', { name: 'Retire', exact: true }).click();
    await admin.getByText('Retired. Readers no longer see it in the list.').waitFor();
    await screenshot(admin, 'catalogue-flows-2-retired');

    const fabricator = await signedIn('fabricator@dilato.test');
    await fabricator.goto('/alloys');
    await fabricator.getByLabel('Search designation or UNS').fill('S43940');
    await fabricator.getByText('No alloys match').waitFor();
    await screenshot(fabricator, 'catalogue-flows-3-fabricator-does-not-find-it');

    await admin.getByLabel('Note for the history', { exact: true }).fill('Stocked again');
    await admin.getByRole('button', { name: 'Restore', exact: true }).click();
    await admin.getByText('Restored to the published list.').waitFor();
    const history = admin.getByRole('list', { name: 'Revision history' });
    await history.getByText('No longer stocked by our supplier').waitFor();
    await history.getByText('Stocked again').waitFor();

    await fabricator.reload();
    await fabricator.getByLabel('Search designation or UNS').fill('S43940');
    await fabricator.getByRole('article', { name: 'Type 441' }).waitFor();
    expect(pageErrors(admin)).toEqual([]);
    expect(pageErrors(fabricator)).toEqual([]);
    await admin.context().close();
    await fabricator.context().close();
  });

  it('when an engineer adds a new source while editing, then the draft cites it and the change list names it', async () => {
    const engineer = await signedIn('engineer@dilato.test');
    const id = await alloyIdOf(engineer, 'S31008');
    const title = `Stockholder sheet ${unique()}`;
    await engineer.goto(`/alloys/${id}/edit`);
    await engineer.getByRole('button', { name: 'Change Source of the density' }).click();
    await engineer.getByRole('button', { name: 'Add a new source' }).click();
    await engineer.getByRole('radio', { name: 'Data sheet' }).click();
    await engineer.getByLabel('Source title', { exact: true }).fill(title);
    await engineer.getByLabel('Issuer', { exact: true }).fill('Invented Metals Ltd');
    await engineer.getByLabel('Edition or year', { exact: true }).fill('2026');
    await screenshot(engineer, 'catalogue-flows-4-new-source');
    await engineer.getByRole('button', { name: 'Add source', exact: true }).click();
    await engineer.getByText(`${title}, Invented Metals Ltd, 2026`, { exact: true }).waitFor();
    await engineer.getByLabel('Note for this change', { exact: true }).fill('Density cites the stockholder sheet');
    await engineer.getByRole('button', { name: 'Save draft' }).click();
    await engineer.getByRole('heading', { name: /^Draft version \d+$/ }).waitFor();
    await engineer.getByRole('list', { name: 'Draft changes' }).getByText(new RegExp(title)).first().waitFor();
    await screenshot(engineer, 'catalogue-flows-5-draft-cites-source');
    const sources = (await (await engineer.request.get('/api/sources')).json()).items as { title: string; kind: string }[];
    expect(sources.find((s) => s.title === title)?.kind).toBe('datasheet');
    expect(pageErrors(engineer)).toEqual([]);
    await engineer.context().close();
  });

  it('when an admin edits a flex part’s price, then its card shows the new price', async () => {
    const admin = await signedIn('admin@dilato.test');
    const parts = (await (await admin.request.get('/api/flex-parts')).json()).items as { id: string; code: string; price: number; currency: string }[];
    const part = parts[parts.length - 1];
    const price = Math.round(part.price + 7.25 * 100) / 100;
    await admin.goto('/flex-parts');
    const card = admin.getByRole('article', { name: new RegExp(`^${part.code} `) });
    await card.getByRole('button', { name: `Edit ${part.code}` }).click();
    await card.getByLabel(`Price, ${part.code}`, { exact: true }).fill(String(price));
    await screenshot(admin, 'catalogue-flows-6-flex-part-edit');
    await card.getByRole('button', { name: 'Save part' }).click();
    await card.getByRole('group', { name: 'Price' }).getByText(`${price.toFixed(2)} ${part.currency}`, { exact: true }).waitFor();
    await screenshot(admin, 'catalogue-flows-7-flex-part-saved');
    const after = (await (await admin.request.get('/api/flex-parts')).json()).items.find((p: { id: string }) => p.id === part.id);
    expect(after.price).toBe(price);
    expect(pageErrors(admin)).toEqual([]);
    await admin.context().close();
  });

  it('when an alloy has been published again, then its past versions can be browsed and the old value read', async () => {
    const admin = await signedIn('admin@dilato.test');
    const id = await alloyIdOf(admin, 'S30908');
    const before = (await (await admin.request.get(`/api/alloys/${id}`)).json()).alloy.published;
    const headers = { Origin: BASE_URL };
    expect((await admin.request.patch(`/api/alloys/${id}`, { headers, data: { densityKgM3: before.densityKgM3 + 3 } })).status()).toBe(200);
    expect((await admin.request.post(`/api/alloys/${id}/publish`, { headers, data: { note: 'New density' } })).status()).toBe(200);

    await admin.goto(`/alloys/${id}`);
    await admin.getByRole('link', { name: 'Browse past versions' }).click();
    await admin.getByRole('heading', { name: 'Versions of Type 309S', level: 1 }).waitFor();
    await admin.getByRole('heading', { name: `Version ${before.version + 1} (published, in use now)` }).waitFor();
    await admin.getByRole('group', { name: 'Density' }).getByText(`${before.densityKgM3 + 3} kg/m³`, { exact: true }).waitFor();
    await admin.getByRole('button', { name: `Version ${before.version}, superseded` }).click();
    await admin.getByRole('heading', { name: `Version ${before.version} (superseded)` }).waitFor();
    await admin.getByRole('group', { name: 'Density' }).getByText(`${before.densityKgM3} kg/m³`, { exact: true }).waitFor();
    await screenshot(admin, 'catalogue-flows-8-past-version');
    expect(pageErrors(admin)).toEqual([]);
    await admin.context().close();
  });

  it('when an engineer removes a data sheet and cancels an upload, then the list is empty again and nothing was attached', async () => {
    const engineer = await signedIn('engineer@dilato.test');
    const id = await alloyIdOf(engineer, 'S31603');
    const small = path.join(dir, 'type-316l-sheet.pdf');
    fs.writeFileSync(small, Buffer.from('%PDF-1.4\n1 0 obj << >> endobj\n%%EOF\n'));
    const headers = { Origin: BASE_URL };
    const up = await engineer.request.post(`/api/alloys/${id}/datasheets`, { headers, multipart: { file: { name: 'type-316l-sheet.pdf', mimeType: 'application/pdf', buffer: fs.readFileSync(small) } } });
    expect(up.status()).toBe(201);
    const sheetsBefore = (await (await engineer.request.get(`/api/alloys/${id}`)).json()).alloy.datasheets.length as number;

    await engineer.goto(`/alloys/${id}`);
    await engineer.getByRole('button', { name: 'Remove type-316l-sheet.pdf' }).first().click();
    await screenshot(engineer, 'catalogue-flows-9-remove-sheet');
    await engineer.getByRole('button', { name: 'Yes, remove it' }).click();
    await engineer.getByText('type-316l-sheet.pdf is removed.').waitFor();
    await engineer.getByRole('list', { name: 'Revision history' }).getByText('Data sheet removed').first().waitFor();

    // A large file on a slow line, cancelled part-way.
    const big = path.join(dir, 'big-sheet.pdf');
    const body = Buffer.alloc(6 * 1024 * 1024, 0x20);
    Buffer.from('%PDF-1.4\n').copy(body);
    fs.writeFileSync(big, body);
    const cdp = await engineer.context().newCDPSession(engineer);
    await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 20, downloadThroughput: 50 * 1024 * 1024, uploadThroughput: 512 * 1024 });
    const chooser = engineer.waitForEvent('filechooser');
    await engineer.getByRole('button', { name: 'Upload a data sheet' }).click();
    await (await chooser).setFiles(big);
    await engineer.waitForFunction(() => Number(document.querySelector('[role="progressbar"][aria-label="Upload progress"]')?.getAttribute('aria-valuenow')) > 0);
    await engineer.getByRole('button', { name: 'Cancel upload' }).click();
    await engineer.getByText('Upload of big-sheet.pdf cancelled; nothing was attached.').waitFor();
    await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: -1 });
    await screenshot(engineer, 'catalogue-flows-10-upload-cancelled');
    const sheetsAfter = (await (await engineer.request.get(`/api/alloys/${id}`)).json()).alloy.datasheets as { originalName: string }[];
    expect(sheetsAfter).toHaveLength(sheetsBefore - 1);
    expect(sheetsAfter.map((s) => s.originalName)).not.toContain('big-sheet.pdf');
    expect(pageErrors(engineer)).toEqual([]);
    await engineer.context().close();
  });
});
