import path from 'node:path';
import Database from 'better-sqlite3';
import type { Browser, Page } from 'playwright-core';
import { BASE_URL, DESKTOP, launchBrowser, newPage, pageErrors, PHONE, screenshot, signIn } from './browser';
import { TOKEN_IN_TEXT } from './quote-fixtures';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser.close());


async function chooseAlloy(page: Page, option: number, name: RegExp) {
  await page.getByRole('button', { name: `Alloy for option ${option}`, exact: true }).click();
  await page.getByRole('radio', { name }).click();
}

/** Opens the newest outbox message to `to` whose subject matches, and returns its text as shown. */
async function openMail(page: Page, to: string, subject: RegExp): Promise<string> {
  await page.goto('/outbox');
  await page.getByRole('heading', { name: 'Outbox' }).waitFor();
  const link = page.getByRole('link', { name: new RegExp(`${subject.source}.*, to ${to.replace('.', '\\.')}`) }).first();
  await link.click();
  const text = page.getByLabel('Message text');
  await text.waitFor();
  return (await text.textContent()) ?? '';
}

describe('sales quotes, sent to a customer who answers through the private link', () => {
  it('when sales builds a three-option quote and sends it, and the customer accepts option 2 in a fresh browser, then sales sees accepted and the notification', async () => {
    const { context, page } = await newPage(browser, DESKTOP);
    await signIn(page, 'sales@dilato.test');
    await page.getByRole('heading', { name: 'Sales home' }).waitFor();

    await page.getByRole('link', { name: 'Quotes' }).first().click();
    await page.getByRole('heading', { name: 'Quotes', exact: true }).waitFor();
    await screenshot(page, 'quotes-1-list-empty');
    await page.getByRole('button', { name: 'New quote' }).click();
    await page.getByRole('heading', { name: 'New quote' }).waitFor();

    await page.getByRole('button', { name: 'Job', exact: true }).click();
    await page.getByRole('radio', { name: 'Road car downpipe' }).click();
    await page.getByLabel('Customer name', { exact: true }).fill('Oda Kallstrom');
    await page.getByLabel('Customer e-mail', { exact: true }).fill('oda@example.test');
    await page.getByLabel('Company', { exact: true }).fill('Kallstrom Track Days');
    await page.getByRole('button', { name: 'Add an option' }).click();
    await chooseAlloy(page, 1, /^Type 321 \(S32100\)/);
    await chooseAlloy(page, 2, /^Alloy 625 \(N06625\)/);
    await chooseAlloy(page, 3, /^Type 304\/304L \(S30400\)/);
    expect(await page.getByLabel('Name of option 2', { exact: true }).inputValue()).toBe('Alloy 625 throughout');

    // The live table prices every option and compares 2 and 3 with option 1.
    const table = page.getByRole('table', { name: 'Options compared' });
    await table.waitFor();
    const totals = table.getByRole('row').filter({ has: page.getByRole('rowheader', { name: 'Total', exact: true }) }).getByRole('cell');
    expect(await totals.count()).toBe(3);
    const euros = (await totals.allTextContents()).map((t) => Number(t.replace(/[^0-9.]/g, '')));
    expect(euros.every((v) => v > 0)).toBe(true);
    // A nickel alloy costs more than the stainless baseline.
    expect(euros[1]).toBeGreaterThan(euros[0]);
    const against = await table.getByRole('row').filter({ has: page.getByRole('rowheader', { name: 'Cost against option 1' }) }).getByRole('cell').allTextContents();
    expect(against[0]).toBe('–');
    expect(against[1]).toMatch(/^\+€[\d,.]+ \(\+\d+\.\d %\)$/);
    await page.getByText('Demo values').first().waitFor();
    const chart = page.getByRole('img', { name: /^Totals by option\./ });
    await chart.waitFor();
    // The drawing loads with the first chart.
    await chart.locator('svg path, svg rect').first().waitFor();
    expect(await chart.locator('svg path, svg rect').count()).toBeGreaterThan(0);
    expect(await chart.getAttribute('aria-label')).toContain('Option 2, Alloy 625 throughout');
    await table.scrollIntoViewIfNeeded();
    await screenshot(page, 'quotes-2-builder-three-options');

    // Changing option 3's alloy moves its total at once, before anything is saved.
    const before = (await totals.allTextContents())[2];
    await chooseAlloy(page, 3, /^Type 316L \(S31603\)/);
    await page.waitForFunction(
      (old) => {
        const rows = [...document.querySelectorAll('[role="table"] [role="row"]')];
        const row = rows.find((r) => r.querySelector('[role="rowheader"]')?.textContent === 'Total');
        return row?.querySelectorAll('[role="cell"]')[2]?.textContent !== old;
      },
      before,
    );
    await chooseAlloy(page, 3, /^Type 304\/304L \(S30400\)/);

    await page.getByRole('button', { name: 'Save draft' }).click();
    await page.waitForURL(/\/quotes\/[0-9a-f-]{36}$/);
    const quoteUrl = page.url();
    const heading = page.getByRole('heading', { name: /^Quote Q-\d{4}-\d{4}$/ });
    await heading.waitFor();
    const number = (await heading.textContent())!.replace('Quote ', '');
    await page.getByText('E-mail preview').waitFor();
    const subject = page.getByText(`Subject: Quote ${number} from`);
    await subject.waitFor();
    await subject.scrollIntoViewIfNeeded();
    await screenshot(page, 'quotes-3-draft-with-preview');

    await page.getByRole('button', { name: 'Send quote' }).click();
    await page.getByText(`Send quote ${number} to oda@example.test now?`).waitFor();
    await page.getByRole('button', { name: 'Yes, send it' }).click();
    await page.getByText('Prices as sent').waitFor();
    await page.getByText('E-mailed to oda@example.test').waitFor();
    expect(await page.getByRole('button', { name: 'Send quote' }).count()).toBe(0);
    await screenshot(page, 'quotes-4-sent');

    const mailText = await openMail(page, 'oda@example.test', new RegExp(`Quote ${number} from`));
    expect(mailText).toContain('Option 2, Alloy 625 throughout');
    await page.getByRole('radio', { name: 'HTML' }).click();
    const frame = page.locator('iframe');
    await frame.waitFor();
    // An empty sandbox: the e-mail's HTML can run no script.
    expect(await frame.getAttribute('sandbox')).toBe('');
    await screenshot(page, 'quotes-5-outbox-customer-mail');
    const token = TOKEN_IN_TEXT.exec(mailText)![1];

    // The customer: a fresh context with no cookies, on a phone.
    const customer = await newPage(browser, PHONE);
    expect(await customer.context.cookies()).toEqual([]);
    await customer.page.goto(`/q/${token}`);
    await customer.page.getByRole('heading', { name: `Quote ${number}` }).waitFor();
    await customer.page.getByText('Kestrel Lane Exhaust Works').first().waitFor();
    await customer.page.getByText(/Alloy 625 \(nickel.*°C in air/).first().waitFor();
    await customer.page.getByRole('heading', { name: 'Before you choose' }).waitFor();
    await customer.page.getByText(/Hot surfaces/).waitFor();
    // Nothing of the shop's app is reachable from the page.
    expect(await customer.page.getByRole('link').count()).toBe(0);
    await screenshot(customer.page, 'quotes-6-customer-page');

    await customer.page.getByRole('button', { name: 'Accept option 2' }).click();
    await customer.page.getByLabel('Your name', { exact: true }).fill('Oda Kallstrom');
    await screenshot(customer.page, 'quotes-7-customer-accepting');
    await customer.page.getByRole('button', { name: 'Confirm: accept option 2' }).click();
    await customer.page.getByText('Recorded. Kestrel Lane Exhaust Works has your answer.').waitFor();
    await customer.page.getByText('Quote accepted').waitFor();
    await customer.page.getByText(/You accepted option 2, Alloy 625 throughout/).waitFor();
    expect(await customer.page.getByRole('button', { name: /^Accept option/ }).count()).toBe(0);
    await screenshot(customer.page, 'quotes-8-customer-accepted');
    await customer.page.getByText('Quote accepted').scrollIntoViewIfNeeded();
    await screenshot(customer.page, 'quotes-8b-customer-confirmation-top');
    expect(pageErrors(customer.page)).toEqual([]);
    await customer.context.close();

    await page.goto(quoteUrl);
    await page.getByText('Accepted option 2: Alloy 625 throughout (by Oda Kallstrom)').waitFor();
    await page.getByText('Option 2 (Alloy 625 throughout)').waitFor();
    await page.getByRole('table', { name: 'Options compared' }).getByText('Accepted').waitFor();
    await screenshot(page, 'quotes-9-sales-sees-accepted');

    const note = await openMail(page, 'sales@dilato.test', new RegExp(`Quote ${number} accepted by`));
    expect(note).toContain('Oda Kallstrom for Kallstrom Track Days accepted option “Alloy 625 throughout”');
    await screenshot(page, 'quotes-10-outbox-notification');

    await page.goto('/quotes');
    await page.getByRole('link', { name: `Quote ${number}, Oda Kallstrom` }).getByText('Accepted').waitFor();
    expect(pageErrors(page)).toEqual([]);
    await context.close();
  });

  it('when the link is wrong or the quote has expired, then the customer gets a plain page that says so', async () => {
    const { context, page } = await newPage(browser, PHONE);
    await page.goto('/q/AAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAA');
    await page.getByRole('heading', { name: 'This quote link is not valid' }).waitFor();
    expect(await page.getByRole('link').count()).toBe(0);
    expect(await page.content()).not.toMatch(/quote_not_found|stack|Error:/);
    await screenshot(page, 'quotes-11-wrong-link');

    // Set up a sent quote through the API as sales, then age it past its date in the test
    // server's database: no API backdates a quote, and waiting a day is not a test.
    const sales = await newPage(browser, DESKTOP);
    await signIn(sales.page, 'sales@dilato.test');
    await sales.page.getByRole('heading', { name: 'Sales home' }).waitFor();
    const api = sales.context.request;
    const headers = { Origin: BASE_URL };
    const jobs = (await (await api.get('/api/jobs')).json()).items as { id: string; name: string }[];
    const alloys = (await (await api.get('/api/alloys')).json()).items as { id: string; uns: string }[];
    const alloy = (uns: string) => alloys.find((a) => a.uns === uns)!.id;
    const today = new Date().toISOString().slice(0, 10);
    const created = await api.post('/api/quotes', {
      headers,
      data: {
        jobId: jobs.find((j) => j.name === 'Road car downpipe')!.id,
        customerName: 'Pell Marrow',
        customerEmail: 'pell@example.test',
        validUntil: today,
        options: [
          { label: 'Type 321 throughout', alloyId: alloy('S32100') },
          { label: 'Type 304 throughout', alloyId: alloy('S30400') },
        ],
      },
    });
    expect(created.status()).toBe(201);
    const quoteId = (await created.json()).quote.id as string;
    expect((await api.post(`/api/quotes/${quoteId}/send`, { headers, data: {} })).status()).toBe(200);
    const outbox = (await (await api.get('/api/outbox')).json()).items as { to: string; text: string }[];
    const token = TOKEN_IN_TEXT.exec(outbox.find((m) => m.to.includes('pell@example.test'))!.text)![1];
    await sales.context.close();

    const dataDir = process.env.DILATO_DATA_DIR;
    if (!dataDir) throw new Error('DILATO_DATA_DIR is unset: run through `npm run test:browser`');
    const db = new Database(path.join(dataDir, 'dilato.sqlite'), { timeout: 5000 });
    try {
      expect(db.prepare(`UPDATE quote SET valid_until = '2020-01-01' WHERE id = ?`).run(quoteId).changes).toBe(1);
    } finally {
      db.close();
    }

    await page.goto(`/q/${token}`);
    await page.getByRole('heading', { name: 'This quote has expired' }).waitFor();
    expect(await page.getByRole('link').count()).toBe(0);
    expect(await page.content()).not.toMatch(/quote_expired|stack|Error:/);
    await screenshot(page, 'quotes-12-expired-link');
    expect(pageErrors(page)).toEqual([]);
    await context.close();
  });
});

it('when a fabricator opens quotes, then they can read them but not make, send or see the outbox', async () => {
  const { context, page } = await newPage(browser, DESKTOP);
  await signIn(page, 'fabricator@dilato.test');
  await page.getByRole('heading', { name: 'Fabricator home' }).waitFor();
  await page.getByRole('link', { name: 'Quotes' }).first().click();
  await page.getByRole('heading', { name: 'Quotes', exact: true }).waitFor();
  await page.getByText(/You can read them/).waitFor();
  expect(await page.getByRole('button', { name: 'New quote' }).count()).toBe(0);
  expect(await page.getByRole('link', { name: 'Outbox' }).count()).toBe(0);
  await page.setViewportSize(PHONE);
  await screenshot(page, 'quotes-13-fabricator-list-phone');
  await context.close();
});

it('when an admin opens shop settings, then the demo values are marked and a bad margin is refused under its field', async () => {
  const { context, page } = await newPage(browser, DESKTOP);
  await signIn(page, 'admin@dilato.test');
  await page.getByRole('heading', { name: 'Admin home' }).waitFor();
  await page.getByRole('link', { name: 'Shop settings' }).first().click();
  await page.getByRole('heading', { name: 'Shop settings' }).waitFor();
  await page.getByText('Demo values').waitFor();
  expect(await page.getByLabel('Shop name', { exact: true }).inputValue()).toBe('Kestrel Lane Exhaust Works');
  expect(Number(await page.getByLabel('Labour rate per hour', { exact: true }).inputValue())).toBeGreaterThan(0);
  // Saving would end the demo values for the other browser tests on this server: only the refusal is tried.
  await page.getByLabel('Margin (%)', { exact: true }).fill('-5');
  await page.getByRole('button', { name: 'Save settings' }).click();
  await page.getByText('Cannot be negative').waitFor();
  await screenshot(page, 'quotes-14-shop-settings-refused');
  expect(await page.getByText(/^Saved\./).count()).toBe(0);
  await context.close();
});
