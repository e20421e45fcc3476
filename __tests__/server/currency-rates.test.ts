import type { CurrencyRatesView } from '../../shared/schemas/currency-rate';
import type { QuoteView } from '../../shared/schemas/quotes';
import { alloyId, jobDetail, newJob, newRun, runBody } from './jobs-helpers';
import { client, createTestApp, expectErrorShape, signedIn, type TestApp } from './test-app';

let t: TestApp;
beforeEach(async () => {
  t = await createTestApp();
});
afterEach(() => t.close());

const inDays = (days: number) => new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10);

/** Re-prices a seeded alloy in another currency and publishes it, as an admin would. */
async function priceIn(uns: string, pricePerKg: number, currency: string): Promise<string> {
  const admin = await signedIn(t.app, 'admin');
  const id = await alloyId(t, uns);
  expect((await admin.patch(`/api/alloys/${id}`).send({ pricePerKg, currency, note: 'Supplier quotes in dollars' })).status).toBe(200);
  expect((await admin.post(`/api/alloys/${id}/publish`).send({ note: 'Checked' })).status).toBe(200);
  return id;
}

describe('currency rates', () => {
  it('when anyone signed in reads the rates, then the shop currency comes with them; signed out gets 401', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const res = await fab.get('/api/currency-rates');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ shopCurrency: 'EUR', rates: [] });
    const anon = await client(t.app).get('/api/currency-rates');
    expect(anon.status).toBe(401);
  });

  it('when an admin sets, changes and removes a rate, then the table follows and names who set it', async () => {
    const admin = await signedIn(t.app, 'admin');
    const set = await admin.put('/api/currency-rates/usd').send({ rate: 0.92 });
    expect(set.status).toBe(200);
    const table = set.body as CurrencyRatesView;
    expect(table.rates).toEqual([{ from: 'USD', to: 'EUR', rate: 0.92, setBy: expect.any(String), setAt: expect.any(String) }]);
    expect((await admin.put('/api/currency-rates/USD').send({ rate: 0.9 })).body.rates[0].rate).toBe(0.9);
    expect((await admin.delete('/api/currency-rates/USD')).body.rates).toEqual([]);
    const again = await admin.delete('/api/currency-rates/USD');
    expect(again.status).toBe(404);
    expectErrorShape(again.body, 'not_found');
  });

  it('when a rate is bad or for the shop currency itself, then 400 names the field', async () => {
    const admin = await signedIn(t.app, 'admin');
    const negative = await admin.put('/api/currency-rates/USD').send({ rate: -1 });
    expect(negative.status).toBe(400);
    expect(Object.keys(negative.body.error.fields)).toEqual(['rate']);
    const code = await admin.put('/api/currency-rates/US').send({ rate: 1 });
    expect(code.status).toBe(400);
    expect(Object.keys(code.body.error.fields)).toEqual(['from']);
    const same = await admin.put('/api/currency-rates/EUR').send({ rate: 1 });
    expect(same.status).toBe(400);
    expectErrorShape(same.body, 'same_currency');
  });

  it('when a role other than admin sets or removes a rate, then 403', async () => {
    for (const role of ['engineer', 'fabricator', 'sales'] as const) {
      const c = await signedIn(t.app, role);
      expect((await c.put('/api/currency-rates/USD').send({ rate: 1 })).status).toBe(403);
      expect((await c.delete('/api/currency-rates/USD')).status).toBe(403);
    }
  });
});

describe('prices in another currency', () => {
  async function quoteBody(alloy: string) {
    const sales = await signedIn(t.app, 'sales');
    const jobs = (await sales.get('/api/jobs')).body.items as { id: string; name: string }[];
    const options = [{ label: 'The alloy', alloyId: alloy }, { label: 'Type 304 throughout', alloyId: await alloyId(t, 'S30400') }];
    return { jobId: jobs.find((j) => j.name === 'Road car downpipe')!.id, customerName: 'Oda', customerEmail: 'oda@example.test', validUntil: inDays(30), options };
  }

  it('when an alloy is priced in USD and no rate is set, then the quote is refused with a message; with a rate it is converted', async () => {
    const sales = await signedIn(t.app, 'sales');
    const s321 = await alloyId(t, 'S32100');
    const before = await sales.post('/api/quotes').send(await quoteBody(s321));
    expect(before.status).toBe(201);
    const eurCost = (before.body.quote as QuoteView).pricing!.options[0].materialCost;

    // Twice the EUR figure in USD at 0.5 EUR per USD is the same price: the material cost must come back unchanged.
    const eurPrice = (await sales.get(`/api/alloys/${s321}`)).body.alloy.published.pricePerKg as number;
    await priceIn('S32100', eurPrice * 2, 'USD');
    const refused = await sales.post('/api/quotes').send(await quoteBody(s321));
    expect(refused.status).toBe(400);
    expectErrorShape(refused.body, 'currency_not_converted');
    expect(refused.body.error.message).toMatch(/USD.*EUR.*Currency rates/);
    expect(Object.keys(refused.body.error.fields)).toEqual(['options.0.alloyId']);

    await (await signedIn(t.app, 'admin')).put('/api/currency-rates/USD').send({ rate: 0.5 });
    const converted = await sales.post('/api/quotes').send(await quoteBody(s321));
    expect(converted.status).toBe(201);
    const p = (converted.body.quote as QuoteView).pricing!;
    expect(p.currency).toBe('EUR');
    expect(p.options[0].materialCost).toBeCloseTo(eurCost, 9);
  });

  it('when a job mixes a USD-priced alloy with EUR ones, then its total cost is withheld with a note until a rate converts it', async () => {
    const fab = await signedIn(t.app, 'fabricator');
    const job = await newJob(fab, 'Two currencies');
    const s304 = await alloyId(t, 'S30400');
    const eurRun = await newRun(fab, job.id, runBody(s304, 500));
    const s321 = await priceIn('S32100', 40, 'USD');
    const usdRun = await newRun(fab, job.id, runBody(s321, 500));
    expect(usdRun.currency).toBe('USD');

    const mixed = (await jobDetail(fab, job.id)).totals;
    expect(mixed.materialCost).toBeNull();
    expect(mixed.costNote).toMatch(/EUR and USD/);

    await (await signedIn(t.app, 'admin')).put('/api/currency-rates/USD').send({ rate: 0.9 });
    const detail = await jobDetail(fab, job.id);
    const converted = detail.runs.find((r) => r.id === usdRun.id)!;
    expect(converted.currency).toBe('EUR');
    // Mass × price: the converted run costs 0.9 × what it cost in USD.
    expect(converted.result!.materialCost).toBeCloseTo(0.9 * usdRun.result!.materialCost, 9);
    expect(detail.totals.currency).toBe('EUR');
    expect(detail.totals.costNote).toBeNull();
    expect(detail.totals.materialCost).toBeCloseTo(eurRun.result!.materialCost + converted.result!.materialCost, 9);
  });
});
