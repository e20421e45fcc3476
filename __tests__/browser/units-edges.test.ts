import type { APIRequestContext, Browser } from 'playwright-core';
import { BASE_URL, launchBrowser, newPage, pageErrors, PHONE, screenshot, signIn } from './browser';
import { draftQuote, tokenMailedTo } from './quote-fixtures';

jest.setTimeout(240_000);

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser.close();
});

const headers = { Origin: BASE_URL };

async function setUnits(api: APIRequestContext, unitSystem: 'metric' | 'imperial') {
  expect((await api.put('/api/me/preferences', { data: { unitSystem }, headers })).status()).toBe(200);
}

interface Version {
  densityKgM3: number;
  maxContinuousC: number;
  maxIntermittentC: number;
  pricePerKg: number;
  referenceTempC: number;
  cte: unknown[];
  modulus: unknown[];
  yield: unknown[];
  warningRanges: unknown[];
}

async function editableVersion(api: APIRequestContext, id: string): Promise<Version> {
  const { alloy } = (await (await api.get(`/api/alloys/${id}`)).json()) as { alloy: { draft: Version | null; published: Version | null } };
  return (alloy.draft ?? alloy.published)!;
}

describe('the edges in imperial, at 390 px', () => {
  // Alloy 600 (UNS N06600): no other browser test edits or reads it.
  it('when an engineer edits an alloy in imperial and types a limit in °F, then the draft stores the exact °C and leaves every other value as it was', async () => {
    const { context, page } = await newPage(browser, PHONE);
    await signIn(page, 'engineer@dilato.test');
    await page.getByRole('heading', { name: / home$/ }).waitFor();
    const api = context.request;
    await setUnits(api, 'imperial');
    const { items } = (await (await api.get('/api/alloys?search=N06600&includeDrafts=true')).json()) as { items: { id: string; uns: string }[] };
    const id = items.find((a) => a.uns === 'N06600')!.id;
    const before = await editableVersion(api, id);
    // A multiple of 5 °C is a whole °F (°F = °C × 9/5 + 32, NIST SP 811 §4.2.1.1): 10 °C under today's limit.
    const wantC = Math.floor((before.maxContinuousC - 10) / 5) * 5;
    const typedF = (wantC * 9) / 5 + 32;

    await page.goto(`/alloys/${id}/edit`);
    const limit = page.getByLabel('Continuous service limit in air (°F)', { exact: true });
    await limit.waitFor();
    // The tables read in the trade's imperial units, with the unit in each label.
    await page.getByLabel('Density (lb/in³)', { exact: true }).waitFor();
    await page.getByLabel('Price (per lb)', { exact: true }).waitFor();
    await page.getByLabel('Mean CTE (µin/in·°F), row 1', { exact: true }).waitFor();
    if (before.modulus.length > 0) await page.getByLabel('Modulus (Msi), row 1', { exact: true }).waitFor();
    if (before.yield.length > 0) await page.getByLabel('Yield (ksi), row 1', { exact: true }).waitFor();
    expect(await page.getByText(/\((°C|kg\/m³|GPa|MPa|µm\/m·K|per kg)\)/).count()).toBe(0);
    await limit.fill(String(typedF));
    await page.getByLabel('Note for this change', { exact: true }).fill('Continuous limit lowered, typed in °F');
    await limit.scrollIntoViewIfNeeded();
    await screenshot(page, 'units-edges-1-alloy-form-imperial');
    await page.getByRole('button', { name: 'Save draft' }).click();
    await page.getByRole('heading', { name: /^Draft version \d+$/ }).waitFor();
    await page.getByRole('list', { name: 'Draft changes' }).getByText(`${typedF} °F`).first().waitFor();
    await screenshot(page, 'units-edges-2-alloy-draft-imperial');

    const after = await editableVersion(api, id);
    expect(after.maxContinuousC).toBe(wantC);
    // Values nobody typed in are the same numbers, bit for bit, not a round trip through °F and lb.
    const data = ({ densityKgM3, maxIntermittentC, pricePerKg, referenceTempC, cte, modulus, yield: y, warningRanges }: Version) => ({
      densityKgM3,
      maxIntermittentC,
      pricePerKg,
      referenceTempC,
      cte,
      modulus,
      yield: y,
      warningRanges,
    });
    expect(data(after)).toEqual(data(before));

    await setUnits(api, 'metric');
    expect(pageErrors(page)).toEqual([]);
    await context.close();
  });

  it('when a fabricator in imperial types an outside diameter past the bound, then the field message gives the bound in inches', async () => {
    const { context, page } = await newPage(browser, PHONE);
    await signIn(page, 'fabricator@dilato.test');
    await page.getByRole('heading', { name: 'Fabricator home' }).waitFor();
    const api = context.request;
    await setUnits(api, 'imperial');
    const { items } = (await (await api.get('/api/alloys?search=S32100')).json()) as { items: { id: string; uns: string }[] };
    const job = await api.post('/api/jobs', { headers, data: { name: `Browser bound job ${Date.now()}`, customer: 'Invented test customer', application: 'Browser test pipework' } });
    const jobId = ((await job.json()) as { job: { id: string } }).job.id;
    const run = await api.post(`/api/jobs/${jobId}/runs`, {
      headers,
      data: { name: 'Collector', alloyId: items.find((a) => a.uns === 'S32100')!.id, tube: { odMm: 63.5, wallMm: 1.651 }, installTempC: 20, segments: [{ lengthMm: 600, startTempC: 700, endTempC: 600 }] },
    });
    const runId = ((await run.json()) as { run: { id: string } }).run.id;

    await page.goto(`/jobs/${jobId}/runs/${runId}`);
    await page.getByRole('heading', { name: 'Collector', level: 1 }).waitFor();
    await page.getByLabel('Outside diameter (in)', { exact: true }).fill('80');
    await page.getByRole('button', { name: 'Save changes', exact: true }).click();
    // The bound is 2000 mm = 2000 / 25.4 in = 78.74 in (1 in = 25.4 mm, NIST SP 811 App. B).
    const message = page.getByRole('group', { name: 'Tube' }).getByText('Outside diameter must be at most 78.74 in', { exact: true });
    await message.waitFor();
    // The results column says why it waits, in the same units.
    await page.getByRole('region', { name: 'Results' }).getByText('Outside diameter must be at most 78.74 in', { exact: true }).waitFor();
    expect(await page.getByText(/at most 2000 mm/).count()).toBe(0);
    await message.scrollIntoViewIfNeeded();
    await screenshot(page, 'units-edges-3-field-message-inches');

    await setUnits(api, 'metric');
    expect(pageErrors(page)).toEqual([]);
    await context.close();
  });

  it('when the customer switches their quote page to imperial, then masses read in lb and the choice holds after a reload', async () => {
    const sales = await newPage(browser, PHONE);
    await signIn(sales.page, 'sales@dilato.test');
    await sales.page.getByRole('heading', { name: 'Sales home' }).waitFor();
    const email = `units-${Date.now()}@example.test`;
    const quote = await draftQuote(sales.context.request, { name: 'Ines Okafor', email }, [
      ['Type 321 throughout', 'S32100'],
      ['Alloy 625 throughout', 'N06625'],
    ]);
    expect((await sales.context.request.post(`/api/quotes/${quote.id}/send`, { headers, data: {} })).status()).toBe(200);
    const token = await tokenMailedTo(sales.context.request, email);
    await sales.context.close();

    const customer = await newPage(browser, PHONE);
    await customer.page.goto(`/q/${token}`);
    const option1 = customer.page.getByRole('group', { name: 'Option 1' });
    await option1.waitFor();
    expect(await option1.innerText()).toMatch(/Weight: \d+\.\d{2} kg/);
    await customer.page.getByRole('radio', { name: 'Imperial (in, °F)' }).click();
    await option1.getByText(/Weight: \d+\.\d{2} lb/).waitFor();
    const text = await option1.innerText();
    expect(text).toMatch(/\d+ °F of temperature in hand|runs \d+ °F above/);
    expect(text).not.toMatch(/ kg\b|°C/);
    await screenshot(customer.page, 'units-edges-4-customer-imperial');
    await customer.page.reload();
    await option1.getByText(/Weight: \d+\.\d{2} lb/).waitFor();
    expect(await customer.page.getByRole('radio', { name: 'Imperial (in, °F)' }).isChecked()).toBe(true);
    expect(await customer.page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(PHONE.width);
    expect(pageErrors(customer.page)).toEqual([]);
    await customer.context.close();
  });
});
