import type { APIRequestContext, Browser } from 'playwright-core';
import { BASE_URL, launchBrowser, newPage, pageErrors, PHONE, screenshot, signIn } from './browser';
import { draftQuote, tokenMailedTo } from './quote-fixtures';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser.close());

/** A draft with a titanium option on the road car downpipe: 780 °C at its hottest, Ti-6Al-4V is seeded at 400 °C. */
const titaniumDraft = (api: APIRequestContext, email: string) =>
  draftQuote(api, { name: 'Ada Brennan', email }, [
    ['Type 321 throughout', 'S32100'],
    ['Titanium throughout', 'R56400'],
  ]);

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
    // In imperial the excess is a difference of temperatures: 380 °C × 9/5 = 684 °F (NIST SP 811 §4.2.1.1).
    const put = (unitSystem: string) => sales.context.request.put('/api/me/preferences', { data: { unitSystem }, headers: { Origin: BASE_URL } });
    expect((await put('imperial')).status()).toBe(200);
    await sales.page.reload();
    await limits.getByText('Option 2, Titanium throughout: 684 °F over its temperature limit').waitFor();
    await sales.page.getByRole('button', { name: 'Send quote' }).click();
    await sales.page.getByRole('button', { name: 'Yes, send it' }).click();
    await sales.page.getByText(/Over its temperature limit: option 2 \(Titanium throughout, 684 °F over\)/).waitFor();
    expect((await put('metric')).status()).toBe(200);

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
    // Once recorded, the form folds away behind one button; opening it and keeping the override folds it again.
    await engineer.page.getByLabel('Reason for the override of option 2', { exact: true }).waitFor({ state: 'detached' });
    await engineer.page.getByRole('button', { name: 'Replace override for option 2' }).click();
    await engineer.page.getByLabel('New reason for the override of option 2', { exact: true }).waitFor();
    await engineer.page.getByRole('button', { name: 'Keep the override of option 2' }).click();
    await engineer.page.getByRole('button', { name: 'Replace override for option 2' }).waitFor();
    expect(await engineer.page.getByLabel('New reason for the override of option 2', { exact: true }).count()).toBe(0);
    await screenshot(engineer.page, 'quote-limits-3-engineer-override');
    expect(pageErrors(engineer.page)).toEqual([]);
    await engineer.context.close();

    await sales.page.reload();
    await sales.page.getByText(/^Limit override for option 2 \(Titanium throughout, 380 °C \/ 684 °F over\)/).waitFor();
    await sales.page.getByRole('button', { name: 'Send quote' }).click();
    await sales.page.getByRole('button', { name: 'Yes, send it' }).click();
    await sales.page.getByText('Sent', { exact: true }).first().waitFor();
    const token = await tokenMailedTo(sales.context.request, email);
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
