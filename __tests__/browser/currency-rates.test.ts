import type { Browser } from 'playwright-core';
import { DESKTOP, launchBrowser, newPage, pageErrors, PHONE, screenshot, signIn } from './browser';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser.close());

it('when an admin sets a GBP rate, sees it listed and removes it, then the list says so; a bad rate is refused under its field', async () => {
  const { context, page } = await newPage(browser, DESKTOP);
  await signIn(page, 'admin@dilato.test');
  await page.getByRole('heading', { name: 'Admin home' }).waitFor();
  await page.getByRole('link', { name: 'Currency rates' }).first().click();
  await page.getByRole('heading', { name: 'Currency rates', exact: true }).waitFor();
  await page.getByText(/No rates set/).waitFor();

  await page.getByLabel('Currency of the price', { exact: true }).fill('GBP');
  await page.getByLabel('EUR for one unit of that currency', { exact: true }).fill('-1');
  await page.getByRole('button', { name: 'Save rate' }).click();
  await page.getByText('The rate must be above zero').waitFor();

  await page.getByLabel('EUR for one unit of that currency', { exact: true }).fill('1.17');
  await page.getByRole('button', { name: 'Save rate' }).click();
  await page.getByText('1 GBP = 1.17 EUR').waitFor();
  await screenshot(page, 'currency-rates-1-set');

  await page.getByRole('button', { name: 'Remove the GBP rate' }).click();
  await page.getByText(/No rates set/).waitFor();
  expect(pageErrors(page)).toEqual([]);
  await context.close();
});

it('when a fabricator opens Type 409 on a phone, then its data cautions say the limit was lowered to the data and what is to be verified', async () => {
  const { context, page } = await newPage(browser, PHONE);
  await signIn(page, 'fabricator@dilato.test');
  await page.getByRole('heading', { name: 'Fabricator home' }).waitFor();
  await page.goto('/alloys');
  await page.getByRole('link', { name: 'Type 409', exact: true }).click();
  const cautions = page.getByRole('note', { name: 'Data cautions' });
  await cautions.getByText(/Usable limit lowered to 450 °C/).waitFor();
  await cautions.getByText('service limits', { exact: true }).waitFor();
  await screenshot(page, 'currency-rates-2-alloy-cautions-phone');
  expect(pageErrors(page)).toEqual([]);
  await context.close();
});
