import type { Browser, Page, Response } from 'playwright-core';
import { BASE_URL, launchBrowser, newPage, pageErrors, PHONE, screenshot, signIn } from './browser';

// Type 316Ti: no other browser test edits it.
const UNS = 'S31635';
const DESIGNATION = 'Type 316Ti';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser.close());

async function signedIn(email: string): Promise<Page> {
  const { page } = await newPage(browser, PHONE);
  await signIn(page, email);
  await page.getByRole('heading', { name: / home$/ }).waitFor();
  return page;
}

/** Every API answer of 400 or more the page receives, as "STATUS METHOD path". */
function failedRequests(page: Page): string[] {
  const failed: string[] = [];
  page.on('response', (res: Response) => {
    if (res.status() >= 400 && res.url().includes('/api/')) failed.push(`${res.status()} ${res.request().method()} ${new URL(res.url()).pathname}`);
  });
  page.on('console', (message) => {
    if (message.type() === 'error') failed.push(`console: ${message.text()}`);
  });
  return failed;
}

describe('the catalogue review step, at 390 px', () => {
  it('when an engineer submits a draft, then the admin’s home counts it; sent back with a note, resubmitted, and published with a note after a confirmation, with no failing request', async () => {
    const engineer = await signedIn('engineer@dilato.test');
    const api = engineer.context().request;
    const list = (await (await api.get(`/api/alloys?search=${UNS}`)).json()).items as { id: string }[];
    const id = list[0].id;
    const before = (await (await api.get(`/api/alloys/${id}`)).json()).alloy;
    const newDensity = before.published.densityKgM3 + 5;
    const patched = await api.patch(`/api/alloys/${id}`, { headers: { Origin: BASE_URL }, data: { densityKgM3: newDensity, note: 'Density from the stockholder sheet' } });
    expect(patched.status()).toBe(200);

    await engineer.goto(`/alloys/${id}`);
    await engineer.getByRole('heading', { name: `Draft version ${before.published.version + 1}` }).waitFor();
    await engineer.getByLabel('Note for the reviewer (optional)', { exact: true }).fill('Density from the stockholder sheet, 5 kg/m³ up');
    await engineer.getByRole('button', { name: 'Submit for review' }).click();
    await engineer.getByText(/^Submitted for review .* by Tomas Lindqvist-Oyelaran: an admin will publish it or send it back\.$/).waitFor();
    await screenshot(engineer, 'catalogue-review-1-engineer-submitted');

    const admin = await signedIn('admin@dilato.test');
    const failed = failedRequests(admin);
    const queue = admin.getByLabel('Review queue');
    const waiting = (await (await admin.context().request.get('/api/alloys/review-queue')).json()).count as number;
    expect(waiting).toBeGreaterThanOrEqual(1);
    await queue.getByRole('heading', { name: `Waiting for review: ${waiting}` }).waitFor();
    await queue.getByText('“Density from the stockholder sheet, 5 kg/m³ up”').waitFor();
    await screenshot(admin, 'catalogue-review-2-admin-home-queue');
    await queue.getByRole('link', { name: new RegExp(`^Review ${DESIGNATION} \\(UNS ${UNS}\\), version ${before.published.version + 1}$`) }).click();
    await admin.getByRole('heading', { name: `Review ${DESIGNATION}` }).waitFor();
    await admin.getByLabel('What to change', { exact: true }).fill('Add the stockholder sheet as a source first');
    await screenshot(admin, 'catalogue-review-3-send-back');
    await admin.getByRole('button', { name: 'Send back to the engineer' }).click();
    await admin.getByRole('heading', { name: DESIGNATION, level: 1 }).waitFor();

    await engineer.reload();
    await engineer.getByRole('alert').getByText('“Add the stockholder sheet as a source first”').waitFor();
    await screenshot(engineer, 'catalogue-review-4-engineer-sees-note');
    await engineer.getByRole('button', { name: 'Submit for review' }).click();
    await engineer.getByText(/^Submitted for review .*: an admin will publish it or send it back\.$/).waitFor();
    expect(pageErrors(engineer)).toEqual([]);
    await engineer.context().close();

    // This time from the alloy's own page, which stays mounted under the review screen and asks for the draft's changes.
    await admin.goto(`/alloys/${id}`);
    await admin.getByRole('list', { name: 'Draft changes' }).waitFor();
    await admin.getByRole('link', { name: 'Review and publish' }).click();
    await admin.getByRole('heading', { name: `Review ${DESIGNATION}` }).waitFor();
    await admin.getByRole('button', { name: 'Publish', exact: true }).click();
    await admin.getByText('Write a note for the history: what changed and why.').waitFor();
    expect(await admin.getByRole('alertdialog', { name: 'Confirm publishing' }).count()).toBe(0);
    await admin.getByLabel('Note for the history', { exact: true }).fill('Checked against the stockholder sheet');
    await admin.getByRole('button', { name: 'Publish', exact: true }).click();
    const dialog = admin.getByRole('alertdialog', { name: 'Confirm publishing' });
    await dialog.getByText(`Publish draft version ${before.published.version + 1} of ${DESIGNATION}?`).waitFor();
    await screenshot(admin, 'catalogue-review-5-confirm-publish');
    await dialog.getByRole('button', { name: 'Yes, publish' }).click();
    await admin.getByRole('heading', { name: DESIGNATION, level: 1 }).waitFor();
    await admin.getByText(`Version ${before.published.version + 1}`, { exact: true }).waitFor();
    await admin.getByRole('group', { name: 'Density' }).getByText(`${newDensity} kg/m³`, { exact: true }).waitFor();
    await screenshot(admin, 'catalogue-review-6-published');
    // Give a stray refetch the time to happen before checking none did.
    await admin.goto('/');
    await admin.getByLabel('Review queue').waitFor();
    expect(failed).toEqual([]);
    expect(pageErrors(admin)).toEqual([]);
    await admin.context().close();
  });
});
