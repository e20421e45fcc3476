import { Quote } from '../../server/quotes/quote.entities';
import type { AlloySummary } from '../../shared/schemas/alloy';
import type { PublicQuoteView, QuoteView } from '../../shared/schemas/quotes';
import { wordPhrase } from '../../shared/units';
import { inDays, mailTo, tokenIn } from './quote-helpers';
import { client, createTestApp, expectErrorShape, signedIn, type TestApp } from './test-app';

// Limits are the seeded catalogue's (data/seed/catalogue.json): Ti-6Al-4V 400 °C, Type 321 900 °C
// intermittent, Alloy 625 950 °C, Alloy X 932 °C. Peaks are the invented demo jobs' runs:
// "Road car downpipe" 780 °C; "Hill-climb special" collector 900 °C, turbo downpipe 820 °C, the rest cooler.

let t: TestApp;
beforeEach(async () => {
  t = await createTestApp();
});
afterEach(() => t.close());

type Client = Awaited<ReturnType<typeof signedIn>>;

async function lookups(c: Client) {
  const jobs = (await c.get('/api/jobs')).body.items as { id: string; name: string }[];
  const alloys = (await c.get('/api/alloys')).body.items as AlloySummary[];
  return { job: (name: string) => jobs.find((j) => j.name.startsWith(name))!.id, alloy: (uns: string) => alloys.find((a) => a.uns === uns)!.id };
}

async function titaniumQuote(sales: Client, email = 'oda@example.test', company = 'Kallstrom Track Days'): Promise<QuoteView> {
  const { job, alloy } = await lookups(sales);
  const res = await sales.post('/api/quotes').send({
    jobId: job('Road car downpipe'),
    customerName: 'Oda Kallstrom',
    customerEmail: email,
    customerCompany: company,
    validUntil: inDays(30),
    options: [
      { label: 'Type 321 throughout', alloyId: alloy('S32100') },
      { label: 'Titanium throughout', alloyId: alloy('R56400') },
    ],
  });
  expect(res.status).toBe(201);
  return res.body.quote;
}

async function sendAndOpen(sales: Client, quote: QuoteView, email: string) {
  expect((await sales.post(`/api/quotes/${quote.id}/send`).send({})).status).toBe(200);
  const token = tokenIn((await mailTo(sales, email))[0].text);
  const opened = await client(t.app).get(`/api/public/quotes/${token}`);
  expect(opened.status).toBe(200);
  return { token, view: opened.body.quote as PublicQuoteView };
}

describe('options over their temperature limit', () => {
  it('when an option is over its limit, then sending is refused naming it, and nothing is e-mailed', async () => {
    const sales = await signedIn(t.app, 'sales');
    const quote = await titaniumQuote(sales);
    // 780 °C peak − 400 °C limit = 380 °C over.
    expect(quote.pricing!.options[1].tempMarginC).toBe(-380);
    const res = await sales.post(`/api/quotes/${quote.id}/send`).send({});
    expect(res.status).toBe(409);
    expectErrorShape(res.body, 'limit_override_needed');
    expect(res.body.error.message).toContain('option 2 (Titanium throughout, 380 °C over)');
    // The excess is a temperature difference: 380 °C × 9/5 = 684 °F (NIST SP 811, §4.2.1.1), not 716 °F.
    expect(wordPhrase(res.body.error.words, 'imperial')).toContain('option 2 (Titanium throughout, 684 °F over)');
    expect(wordPhrase(res.body.error.words, 'metric')).toBe(res.body.error.message);
    expect(res.body.error.fields).toEqual({ 'options.1.alloyId': 'Over its temperature limit: needs an override' });
    expect(await mailTo(sales, 'oda@example.test')).toHaveLength(0);
    expect((await sales.get(`/api/quotes/${quote.id}`)).body.quote.status).toBe('draft');
  });

  it('when sales or a fabricator tries to record an override, then 403; an engineer may, with a reason of at least 10 characters', async () => {
    const sales = await signedIn(t.app, 'sales');
    const quote = await titaniumQuote(sales);
    const reason = 'Customer runs it as a show car; the downpipe is wrapped and sees 380 °C at most.';
    for (const role of ['sales', 'fabricator'] as const) {
      const res = await (await signedIn(t.app, role)).post(`/api/quotes/${quote.id}/limit-overrides`).send({ optionIndex: 1, reason });
      expect(res.status).toBe(403);
    }
    const eng = await signedIn(t.app, 'engineer');
    const short = await eng.post(`/api/quotes/${quote.id}/limit-overrides`).send({ optionIndex: 1, reason: 'ok' });
    expect(short.status).toBe(400);
    expect(short.body.error.fields.reason).toMatch(/at least 10/);
    const within = await eng.post(`/api/quotes/${quote.id}/limit-overrides`).send({ optionIndex: 0, reason });
    expect(within.status).toBe(400);
    expectErrorShape(within.body, 'not_over_limit');

    const done = await eng.post(`/api/quotes/${quote.id}/limit-overrides`).send({ optionIndex: 1, reason });
    expect(done.status).toBe(201);
    const view = done.body.quote as QuoteView;
    expect(view.limitOverrides).toEqual([{ optionIndex: 1, reason, by: 'Tomas Lindqvist-Oyelaran', at: expect.any(String) }]);
    // 380 °C as a difference is 684 °F (× 9/5, NIST SP 811 §4.2.1.1).
    expect(view.events.at(-1)).toMatchObject({ status: 'draft', by: 'Tomas Lindqvist-Oyelaran', note: `Limit override for option 2 (Titanium throughout, 380 °C / 684 °F over): ${reason}` });
    const activity = (await sales.get(`/api/quotes/${quote.id}/activity`)).body.items as { action: string }[];
    expect(activity.map((a) => a.action)).toContain('limit_overridden');
    const stored = await t.dataSource.query('SELECT option_index, reason, by_name FROM quote_limit_override');
    expect(stored).toEqual([{ option_index: 1, reason, by_name: 'Tomas Lindqvist-Oyelaran' }]);
  });

  it('when the option is changed after its override, then the override no longer counts and sending is refused again', async () => {
    const sales = await signedIn(t.app, 'sales');
    const quote = await titaniumQuote(sales);
    const { alloy } = await lookups(sales);
    const eng = await signedIn(t.app, 'engineer');
    await eng.post(`/api/quotes/${quote.id}/limit-overrides`).send({ optionIndex: 1, reason: 'Wrapped downpipe on a show car.' });
    const options = [quote.options[0], { label: 'Titanium throughout', alloyId: alloy('R50400') }];
    const edited = await sales.patch(`/api/quotes/${quote.id}`).send({ options });
    expect(edited.body.quote.limitOverrides).toEqual([]);
    expect((await sales.post(`/api/quotes/${quote.id}/send`).send({})).status).toBe(409);
  });

  it('when the override is recorded, then the quote sends and the customer reads the caution in plain words and may accept', async () => {
    const sales = await signedIn(t.app, 'sales');
    const quote = await titaniumQuote(sales);
    const admin = await signedIn(t.app, 'admin');
    const reason = 'Show car only, heat-wrapped; replaced every season.';
    expect((await admin.post(`/api/quotes/${quote.id}/limit-overrides`).send({ optionIndex: 1, reason })).status).toBe(201);
    const { token, view } = await sendAndOpen(sales, quote, 'oda@example.test');
    expect(view.options[0]).toMatchObject({ limitState: 'ok', limitCaution: null, acceptable: true });
    expect(view.options[1]).toMatchObject({ limitState: 'over', acceptable: true });
    const caution = wordPhrase(view.options[1].limitCaution!, 'metric');
    expect(caution).toContain('about 380 °C hotter than it is rated for in air');
    expect(caution).toContain(`“${reason}”`);
    expect(caution).not.toMatch(/override|margin|intermittent/i);
    // A difference of 380 K is 684 °F (× 9/5, no 32 °F offset: NIST SP 811 §4.2.1.1).
    expect(wordPhrase(view.options[1].limitCaution!, 'imperial')).toContain('about 684 °F hotter');
    const accepted = await client(t.app).post(`/api/public/quotes/${token}/accept`).send({ optionIndex: 1, name: 'Oda Kallstrom' });
    expect(accepted.status).toBe(200);
  });

  it('when a sent quote holds an over-limit option without an override (sent before overrides existed), then the customer cannot accept it', async () => {
    const sales = await signedIn(t.app, 'sales');
    const quote = await titaniumQuote(sales);
    await (await signedIn(t.app, 'engineer')).post(`/api/quotes/${quote.id}/limit-overrides`).send({ optionIndex: 1, reason: 'Wrapped downpipe on a show car.' });
    const { token } = await sendAndOpen(sales, quote, 'oda@example.test');
    // Strip the frozen overrides, as a quote sent by the earlier release has none.
    const quotes = t.dataSource.getRepository(Quote);
    const snapshot = (await quotes.findOneByOrFail({ id: quote.id })).snapshot as unknown as Record<string, unknown>;
    delete snapshot.limitOverrides;
    await quotes.update({ id: quote.id }, { snapshot: snapshot as unknown as Quote['snapshot'] });

    const customer = client(t.app);
    const view = (await customer.get(`/api/public/quotes/${token}`)).body.quote as PublicQuoteView;
    expect(view.options[1].acceptable).toBe(false);
    const refused = await customer.post(`/api/public/quotes/${token}/accept`).send({ optionIndex: 1, name: 'Oda Kallstrom' });
    expect(refused.status).toBe(409);
    expectErrorShape(refused.body, 'over_limit');
    expect((await customer.post(`/api/public/quotes/${token}/accept`).send({ optionIndex: 0, name: 'Oda Kallstrom' })).status).toBe(200);
  });

  it('when an option runs near its limit, then it sends without an override and the customer reads a caution', async () => {
    const sales = await signedIn(t.app, 'sales');
    const { job, alloy } = await lookups(sales);
    const res = await sales.post('/api/quotes').send({
      jobId: job('Hill-climb special'),
      customerName: 'Per Lind',
      customerEmail: 'per@example.test',
      validUntil: inDays(30),
      options: [
        { label: 'Alloy 625 throughout', alloyId: alloy('N06625') },
        { label: 'Alloy X throughout', alloyId: alloy('N06002') },
      ],
    });
    // 932 °C limit − 900 °C collector = 32 °C, inside the 50 °C caution band.
    expect(res.body.quote.pricing.options[1].tempMarginC).toBe(32);
    const { view } = await sendAndOpen(sales, res.body.quote, 'per@example.test');
    expect(view.options[1]).toMatchObject({ limitState: 'near', acceptable: true });
    expect(wordPhrase(view.options[1].limitCaution!, 'metric')).toContain('only about 32 °C to spare');
  });
});

describe('mixed-alloy options', () => {
  it('when an option has a 625 collector and 321 elsewhere, then each alloy’s words give the margin of the runs it is on', async () => {
    const sales = await signedIn(t.app, 'sales');
    const { job, alloy } = await lookups(sales);
    const jobId = job('Hill-climb special');
    const runs = (await sales.get(`/api/jobs/${jobId}`)).body.job.runs as { id: string; name: string }[];
    const collector = runs.find((r) => r.name === 'Manifold collector')!.id;
    const res = await sales.post('/api/quotes').send({
      jobId,
      customerName: 'Per Lind',
      customerEmail: 'per@example.test',
      validUntil: inDays(30),
      options: [
        { label: 'Alloy 625 throughout', alloyId: alloy('N06625') },
        { label: '625 collector, 321 elsewhere', alloyId: alloy('S32100'), runAlloys: { [collector]: alloy('N06625') } },
      ],
    });
    expect(res.status).toBe(201);
    // Option 2: the collector in 625 leaves 950 − 900 = 50 °C; the 321 runs peak at 820 °C, leaving 900 − 820 = 80 °C.
    expect(res.body.quote.pricing.options[1].tempMarginC).toBe(50);
    const { view } = await sendAndOpen(sales, res.body.quote, 'per@example.test');
    const [s321, a625] = ['Type 321', 'Alloy 625'].map((d) => view.options[1].alloys.find((a) => a.designation === d)!);
    expect(wordPhrase(s321.plainWords, 'metric')).toContain('which leaves 80 °C in hand');
    expect(wordPhrase(s321.plainWords, 'metric')).not.toMatch(/leaves 0 °C/);
    expect(wordPhrase(a625.plainWords, 'metric')).toContain('Where it is used (Manifold collector), the hottest part runs at about 900 °C, which leaves 50 °C in hand');
    for (const a of view.options[1].alloys) expect(wordPhrase(a.plainWords, 'metric')).not.toMatch(/kg per litre|density/i);
  });
});

describe('decision e-mails', () => {
  it('when the customer gave no company and accepts, then the note names them once; a decline reads "declined quote Q-…"', async () => {
    const sales = await signedIn(t.app, 'sales');
    const { job, alloy } = await lookups(sales);
    const make = async (email: string) =>
      (
        await sales.post('/api/quotes').send({
          jobId: job('Road car downpipe'),
          customerName: 'Oda Kallstrom',
          customerEmail: email,
          validUntil: inDays(30),
          options: [
            { label: 'Type 321 throughout', alloyId: alloy('S32100') },
            { label: 'Type 304 throughout', alloyId: alloy('S30400') },
          ],
        })
      ).body.quote as QuoteView;
    const a = await make('a@example.test');
    const { token: ta } = await sendAndOpen(sales, a, 'a@example.test');
    await client(t.app).post(`/api/public/quotes/${ta}/accept`).send({ optionIndex: 0, name: 'Oda Kallstrom' });
    const d = await make('d@example.test');
    const { token: td } = await sendAndOpen(sales, d, 'd@example.test');
    await client(t.app).post(`/api/public/quotes/${td}/decline`).send({ name: 'Per Lind', reason: 'Too dear' });

    const notes = (await mailTo(sales, 'sales@')).map((m) => m.text);
    const accepted = notes.find((n) => n.includes(a.number))!;
    expect(accepted).toMatch(new RegExp(`^Oda Kallstrom accepted option “Type 321 throughout” \\(.+\\) on quote ${a.number} \\(Road car downpipe\\)\\.`));
    expect(accepted).not.toContain('Oda Kallstrom for Oda Kallstrom');
    const declined = notes.find((n) => n.includes(d.number))!;
    expect(declined).toMatch(new RegExp(`^Per Lind \\(quote sent to Oda Kallstrom\\) declined quote ${d.number} \\(Road car downpipe\\)\\.`));
    expect(declined).not.toContain('on quote');
  });
});
