import type { APIRequestContext, Browser } from 'playwright-core';
import { BASE_URL, launchBrowser, newPage, pageErrors, PHONE, screenshot, signIn } from './browser';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser.close());

const headers = { Origin: BASE_URL };
const TOKEN_IN_TEXT = /\/q\/([A-Za-z0-9_-]{20,})/;
const inDays = (days: number) => new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10);

/** A draft with a titanium option on the road car downpipe: 780 °C at its hottest, Ti-6Al-4V is seeded at 400 °C. */
async function titaniumDraft(api: APIRequestContext, email: string): Promise<{ id: string; number: string }> {
  const jobs = (await (await api.get('/api/jobs')).json()).items as { id: string; name: string }[];
  const alloys = (await (await api.get('/api/alloys')).json()).items as { id: string; uns: string }[];
  const alloy = (uns: string) => alloys.find((a) => a.uns === uns)!.id;
  const created = await api.post('/api/quotes', {
    headers,
    data: {
      jobId: jobs.find((j) => j.name === 'Road car downpipe')!.id,
      customerName: 'Ada Brennan',
      customerEmail: email,
      validUntil: inDays(30),
      options: [
        { label: 'Type 321 throughout', alloyId: alloy('S32100') },
        { label: 'Titanium throughout', alloyId: alloy('R56400') },
      ],
    },
  });
  expect(created.status()).toBe(201);
  return (await created.json()).quote;
}

describe('an option over its temperature limit, at 390 px', () => {
  it('when sales tries to send it, then it is refused until an engineer records an override; the customer then reads the caution and can accept', async () => {
    const email = `ada-${Date.now()}@example.test`;
    const sales = await newPage(browser, PHONE);
    await signIn(sales.page, 'sales@dilato.test');
    await sales.page.getByRole('heading', { name: 'Sales home' }).waitFor();
    const quote = await titaniumDraft(sales.context.request, email);

    await sales.page.goto(`/quotes/${quote.id}`);
    const limits = sales.page.getByRole('group', { name: 'Option 2 temperature' });
    await limits.getByText('Option 2, Titanium throughout: 380 °C over its temperature limit').waitFor();
    await limits.getByText('Needs an override from an engineer or admin before the quote can be sent.').waitFor();
    expect(await sales.page.getByRole('button', { name: /Record override/ }).count()).toBe(0);
    await screenshot(sales.page, 'quote-limits-1-sales-sees-over-limit');
    await sales.page.getByRole('button', { name: 'Send quote' }).click();
    await sales.page.getByRole('button', { name: 'Yes, send it' }).click();
    await sales.page.getByText(/Over its temperature limit: option 2 \(Titanium throughout, 380 °C over\)/).waitFor();
    await screenshot(sales.page, 'quote-limits-2-send-refused');

    const engineer = await newPage(browser, PHONE);
    await signIn(engineer.page, 'engineer@dilato.test');
    await engineer.page.getByRole('heading', { name: 'Engineer home' }).waitFor();
    await engineer.page.goto(`/quotes/${quote.id}`);
    const reason = engineer.page.getByLabel('Reason for the override of option 2', { exact: true });
    await reason.fill('short');
    await reason.blur();
    await engineer.page.getByText('Say why in a sentence (at least 10 characters)').waitFor();
    await reason.fill('Show car only: the downpipe is heat-wrapped and replaced every season.');
    await engineer.page.getByRole('button', { name: 'Record override for option 2' }).click();
    await engineer.page.getByText(/^Override by Tomas Lindqvist-Oyelaran .*“Show car only/).waitFor();
    await screenshot(engineer.page, 'quote-limits-3-engineer-override');
    expect(pageErrors(engineer.page)).toEqual([]);
    await engineer.context.close();

    await sales.page.reload();
    await sales.page.getByText(/^Limit override for option 2 \(Titanium throughout, 380 °C over\)/).waitFor();
    await sales.page.getByRole('button', { name: 'Send quote' }).click();
    await sales.page.getByRole('button', { name: 'Yes, send it' }).click();
    await sales.page.getByText('Sent', { exact: true }).first().waitFor();
    const outbox = (await (await sales.context.request.get('/api/outbox')).json()).items as { to: string; text: string }[];
    const token = TOKEN_IN_TEXT.exec(outbox.find((m) => m.to.includes(email))!.text)![1];
    expect(pageErrors(sales.page)).toEqual([]);
    await sales.context.close();

    const customer = await newPage(browser, PHONE);
    await customer.page.goto(`/q/${token}`);
    const caution = customer.page.getByRole('note', { name: 'Temperature caution for option 2' });
    await caution.getByText(/about 380 °C hotter than it is rated for in air/).waitFor();
    expect(await caution.textContent()).toContain('“Show car only: the downpipe is heat-wrapped and replaced every season.”');
    expect(await customer.page.getByRole('note', { name: 'Temperature caution for option 1' }).count()).toBe(0);
    await caution.scrollIntoViewIfNeeded();
    await screenshot(customer.page, 'quote-limits-4-customer-caution');
    // Nothing runs off a phone's width.
    expect(await customer.page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(PHONE.width);
    await customer.page.getByRole('button', { name: 'Accept option 2' }).click();
    await customer.page.getByLabel('Your name', { exact: true }).fill('Ada Brennan');
    await customer.page.getByRole('button', { name: 'Confirm: accept option 2' }).click();
    await customer.page.getByText('Quote accepted').waitFor();
    await screenshot(customer.page, 'quote-limits-5-customer-accepted');
    expect(pageErrors(customer.page)).toEqual([]);
    await customer.context.close();
  });
});
