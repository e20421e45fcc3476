import type { Browser, BrowserContext } from 'playwright-core';
import { BASE_URL, launchBrowser, newPage, pageErrors, PHONE, screenshot, signIn } from './browser';
import { draftQuote, tokenMailedTo } from './quote-fixtures';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser.close());

/** A two-option quote sent through the API as sales; answers its id, number and the customer's token. */
async function sentQuote(context: BrowserContext, email: string) {
  const api = context.request;
  const quote = await draftQuote(api, { name: 'Sable Okonjo', email }, [
    ['Type 321 throughout', 'S32100'],
    ['Type 304 throughout', 'S30400'],
  ]);
  expect((await api.post(`/api/quotes/${quote.id}/send`, { headers: { Origin: BASE_URL }, data: {} })).status()).toBe(200);
  return { ...quote, token: await tokenMailedTo(api, email) };
}

async function acceptOnPhone(token: string, number: string) {
  const customer = await newPage(browser, PHONE);
  const page = customer.page;
  await page.goto(`/q/${token}`);
  await page.getByRole('heading', { name: `Quote ${number}` }).waitFor();
  await page.getByRole('button', { name: 'Accept option 1' }).click();
  await page.getByLabel('Your name', { exact: true }).fill('Sable Okonjo');
  await page.getByRole('button', { name: 'Confirm: accept option 1' }).click();
  await page.getByText('Quote accepted').waitFor();
  await page.getByRole('heading', { name: 'Deposit due' }).waitFor();
  return customer;
}

describe('deposits on accepted quotes, paid on the payment provider’s page', () => {
  it('when the customer accepts on a phone and pays with the success card, then the quote page says "Deposit paid" and sales sees it', async () => {
    const sales = await newPage(browser, PHONE);
    await signIn(sales.page, 'sales@dilato.test');
    await sales.page.getByRole('heading', { name: 'Sales home' }).waitFor();
    const quote = await sentQuote(sales.context, 'sable@example.test');

    const { context, page } = await acceptOnPhone(quote.token, quote.number);
    // 30 % is the demo shop's deposit share.
    await page.getByText(/^30 % of the option you accepted/).waitFor();
    const due = (await page.getByText(/^€[\d,]+\.\d\d$/).first().textContent())!;
    await page.getByRole('heading', { name: 'Deposit due' }).scrollIntoViewIfNeeded();
    await screenshot(page, 'deposit-1-customer-deposit-due');

    await page.getByRole('button', { name: 'Pay deposit' }).click();
    await page.waitForURL(/\/pay\/cs_test_/);
    await page.getByRole('heading', { name: `Pay ${due}` }).waitFor();
    await screenshot(page, 'deposit-2-provider-page');
    await page.getByLabel('Card number').fill('4242 4242 4242 4242');
    await page.getByRole('button', { name: `Pay ${due}` }).click();

    await page.waitForURL(new RegExp(`/q/${quote.token}\\?deposit=done$`));
    await page.getByRole('heading', { name: 'Deposit paid' }).waitFor();
    await page.getByText(`${due} received on`).waitFor();
    expect(await page.getByRole('button', { name: 'Pay deposit' }).count()).toBe(0);
    await page.getByRole('heading', { name: 'Deposit paid' }).scrollIntoViewIfNeeded();
    await screenshot(page, 'deposit-3-customer-deposit-paid');
    expect(pageErrors(page)).toEqual([]);
    await context.close();

    await sales.page.goto(`/quotes/${quote.id}`);
    await sales.page.getByText(`Deposit paid · ${due}`).waitFor();
    await sales.page.getByText('Deposit paid (', { exact: false }).first().waitFor();
    await sales.page.getByText(`Deposit paid · ${due}`).scrollIntoViewIfNeeded();
    await screenshot(sales.page, 'deposit-4-sales-quote-deposit-paid');
    await sales.page.goto('/quotes');
    await sales.page.getByRole('link', { name: `Quote ${quote.number}, Sable Okonjo` }).getByText(`Deposit paid · ${due}`).waitFor();
    await screenshot(sales.page, 'deposit-5-sales-quotes-list');
    const jobId = (await (await sales.context.request.get(`/api/quotes/${quote.id}`)).json()).quote.jobId as string;
    await sales.page.goto(`/jobs/${jobId}/sheet`);
    await sales.page.getByText(`Deposit paid: ${due} on quote ${quote.number}`).waitFor();
    await screenshot(sales.page, 'deposit-5b-job-sheet-deposit-paid');
    expect(pageErrors(sales.page)).toEqual([]);
    await sales.context.close();
  });

  it('when the card is declined, then the customer is back on the quote page with the reason and can try again', async () => {
    const sales = await newPage(browser, PHONE);
    await signIn(sales.page, 'sales@dilato.test');
    await sales.page.getByRole('heading', { name: 'Sales home' }).waitFor();
    const quote = await sentQuote(sales.context, 'sable-declined@example.test');
    await sales.context.close();

    const { context, page } = await acceptOnPhone(quote.token, quote.number);
    await page.getByRole('button', { name: 'Pay deposit' }).click();
    await page.waitForURL(/\/pay\/cs_test_/);
    await page.getByLabel('Card number').fill('4000 0000 0000 0002');
    await page.getByRole('button', { name: /^Pay / }).click();
    await page.waitForURL(new RegExp(`/q/${quote.token}\\?deposit=back$`));
    await page.getByText('The payment did not go through').waitFor();
    await page.getByText(/Your card was declined\. Nothing was charged/).waitFor();
    await page.getByRole('button', { name: 'Try the payment again' }).scrollIntoViewIfNeeded();
    await screenshot(page, 'deposit-6-customer-declined-retry');
    await page.getByRole('button', { name: 'Try the payment again' }).click();
    await page.waitForURL(/\/pay\/cs_test_/);
    await page.getByLabel('Card number').waitFor();
    expect(pageErrors(page)).toEqual([]);
    await context.close();
  });
});
