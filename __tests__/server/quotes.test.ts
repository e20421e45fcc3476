import request from 'supertest';
import { Quote } from '../../server/quotes/quote.entities';
import type { AlloySummary } from '../../shared/schemas/alloy';
import { ROLES, type Role } from '../../shared/schemas/auth';
import type { QuoteView } from '../../shared/schemas/quotes';
import { client, createTestApp, expectErrorShape, HOST, ORIGIN, signedIn, type TestApp } from './test-app';
import { wordPhrase } from '../../shared/units';

let t: TestApp;
beforeEach(async () => {
  t = await createTestApp();
});
afterEach(() => t.close());

const inDays = (days: number) => new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10);

async function ids() {
  const sales = await signedIn(t.app, 'sales');
  const jobs = (await sales.get('/api/jobs')).body.items as { id: string; name: string }[];
  const alloys = (await sales.get('/api/alloys')).body.items as AlloySummary[];
  const alloy = (uns: string) => alloys.find((a) => a.uns === uns)!.id;
  return { jobId: jobs.find((j) => j.name === 'Road car downpipe')!.id, s321: alloy('S32100'), s304: alloy('S30400'), a625: alloy('N06625') };
}

async function draftQuote(sales: Awaited<ReturnType<typeof signedIn>>) {
  const { jobId, s321, s304, a625 } = await ids();
  const res = await sales.post('/api/quotes').send({
    jobId,
    customerName: 'Oda Kallstrom',
    customerEmail: 'oda@example.test',
    customerCompany: 'Kallstrom Track Days',
    validUntil: inDays(30),
    message: 'As discussed at the bench.',
    options: [
      { label: 'Type 321 throughout', alloyId: s321 },
      { label: 'Alloy 625 throughout', alloyId: a625 },
      { label: 'Type 304 throughout', alloyId: s304 },
    ],
  });
  expect(res.status).toBe(201);
  return res.body.quote as QuoteView;
}

/** The token is only ever in the e-mail: read it from the outbox as the customer would. */
async function tokenFromOutbox(sales: Awaited<ReturnType<typeof signedIn>>, to: string): Promise<string> {
  const outbox = (await sales.get('/api/outbox')).body.items as { to: string; text: string; html: string }[];
  const mail = outbox.find((m) => m.to.includes(to))!;
  const match = /\/q\/([A-Za-z0-9_-]+)/.exec(mail.text);
  return match![1];
}

describe('building and sending a quote', () => {
  it('when sales drafts a three-option quote, then each option is priced from the job and compared with option 1', async () => {
    const sales = await signedIn(t.app, 'sales');
    const quote = await draftQuote(sales);
    expect(quote.status).toBe('draft');
    expect(quote.number).toMatch(/^Q-\d{4}-0001$/);
    const p = quote.pricing!;
    expect(p.frozen).toBe(false);
    expect(p.options).toHaveLength(3);
    expect(p.comparisons[0].costDifference).toBe(0);
    // The nickel alloy costs more and carries more heat than the stainless option 1.
    expect(p.options[1].total).toBeGreaterThan(p.options[0].total);
    expect(p.comparisons[1].costDifference).toBeCloseTo(p.options[1].total - p.options[0].total, 9);
    expect(p.comparisons[1].tempMarginGainedC).toBeGreaterThan(0);
    for (const o of p.options) expect(o.total).toBeCloseTo((o.materialCost + o.labourCost) * (1 + p.settings.marginPct / 100), 9);
  });

  it('when the quote is sent, then prices freeze, the customer gets an e-mail with a private link, and the token is stored only as a hash', async () => {
    const sales = await signedIn(t.app, 'sales');
    const quote = await draftQuote(sales);
    const preview = await sales.get(`/api/quotes/${quote.id}/email-preview`);
    expect(preview.body.email.subject).toContain(quote.number);
    const sent = await sales.post(`/api/quotes/${quote.id}/send`).send({});
    expect(sent.status).toBe(200);
    expect(sent.body.quote.status).toBe('sent');
    expect(sent.body.quote.pricing.frozen).toBe(true);

    const token = await tokenFromOutbox(sales, 'oda@example.test');
    // 32 random bytes, base64url: 256 bits.
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    const raw = JSON.stringify(await t.dataSource.query('SELECT * FROM quote'));
    expect(raw).not.toContain(token);

    // A later price change does not move a sent quote.
    const admin = await signedIn(t.app, 'admin');
    const { s321 } = await ids();
    await admin.patch(`/api/alloys/${s321}`).send({ pricePerKg: 999 });
    await admin.post(`/api/alloys/${s321}/publish`).send({ note: 'Checked' });
    const again = (await sales.get(`/api/quotes/${quote.id}`)).body.quote as QuoteView;
    expect(again.pricing!.options[0].total).toBe(sent.body.quote.pricing.options[0].total);
    expect((await sales.patch(`/api/quotes/${quote.id}`).send({ message: 'x' })).status).toBe(409);
  });

  it('when the salesperson works in imperial, then the customer’s link opens in imperial', async () => {
    const sales = await signedIn(t.app, 'sales');
    expect((await sales.put('/api/me/preferences').send({ unitSystem: 'imperial' })).status).toBe(200);
    try {
      const quote = await draftQuote(sales);
      await sales.post(`/api/quotes/${quote.id}/send`).send({});
      const token = await tokenFromOutbox(sales, 'oda@example.test');
      const opened = await client(t.app).get(`/api/public/quotes/${token}`);
      expect(opened.status).toBe(200);
      expect(opened.body.quote.units).toBe('imperial');
    } finally {
      await sales.put('/api/me/preferences').send({ unitSystem: 'metric' });
    }
  });

  it('when the customer opens the link and accepts option 2, then sales sees accepted and gets an e-mail', async () => {
    const sales = await signedIn(t.app, 'sales');
    const quote = await draftQuote(sales);
    await sales.post(`/api/quotes/${quote.id}/send`).send({});
    const token = await tokenFromOutbox(sales, 'oda@example.test');

    const customer = client(t.app); // no cookies
    const opened = await customer.get(`/api/public/quotes/${token}`);
    expect(opened.status).toBe(200);
    expect(opened.body.quote.options).toHaveLength(3);
    expect(wordPhrase(opened.body.quote.options[1].alloys[0].plainWords, 'metric')).toMatch(/Alloy 625.*°C in air/);
    expect(JSON.stringify(opened.body)).not.toMatch(/customerEmail|labourRate|createdBy|tokenHash/);
    expect((await sales.get(`/api/quotes/${quote.id}`)).body.quote.status).toBe('viewed');
    expect(opened.body.quote.units).toBe('metric'); // the salesperson never chose imperial

    const accepted = await customer.post(`/api/public/quotes/${token}/accept`).send({ optionIndex: 1, name: 'Oda Kallstrom' });
    expect(accepted.status).toBe(200);
    const after = (await sales.get(`/api/quotes/${quote.id}`)).body.quote as QuoteView;
    expect(after.status).toBe('accepted');
    expect(after.acceptedOptionIndex).toBe(1);
    expect(after.events.map((e) => e.status)).toEqual(['draft', 'sent', 'viewed', 'accepted']);
    const outbox = (await sales.get('/api/outbox')).body.items as { to: string; subject: string }[];
    expect(outbox.find((m) => m.to.includes('sales@dilato.test'))?.subject).toMatch(/accepted by Oda Kallstrom/);

    const twice = await customer.post(`/api/public/quotes/${token}/accept`).send({ optionIndex: 0, name: 'Oda' });
    expect(twice.status).toBe(409);
  });

  it('when the token is wrong, then 404; when the quote has expired, then 410; neither says more', async () => {
    const sales = await signedIn(t.app, 'sales');
    const wrong = await request(t.app).get('/api/public/quotes/AAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAA').set('Host', HOST);
    expect(wrong.status).toBe(404);
    expectErrorShape(wrong.body, 'quote_not_found');

    const quote = await draftQuote(sales);
    await sales.post(`/api/quotes/${quote.id}/send`).send({});
    const token = await tokenFromOutbox(sales, 'oda@example.test');
    await t.dataSource.getRepository(Quote).update({ id: quote.id }, { validUntil: '2020-01-01' });
    const expired = await request(t.app).get(`/api/public/quotes/${token}`).set('Host', HOST);
    expect(expired.status).toBe(410);
    expectErrorShape(expired.body, 'quote_expired');
    expect((await sales.get(`/api/quotes/${quote.id}`)).body.quote.status).toBe('expired');
    const late = await request(t.app).post(`/api/public/quotes/${token}/accept`).set('Host', HOST).set('Origin', ORIGIN).send({ optionIndex: 0, name: 'Oda' });
    expect(late.status).toBe(410);
  });

  it('when the quote is declined, then sales hears why', async () => {
    const sales = await signedIn(t.app, 'sales');
    const quote = await draftQuote(sales);
    await sales.post(`/api/quotes/${quote.id}/send`).send({});
    const token = await tokenFromOutbox(sales, 'oda@example.test');
    const res = await client(t.app).post(`/api/public/quotes/${token}/decline`).send({ name: 'Oda', reason: 'Budget moved to tyres' });
    expect(res.status).toBe(200);
    const after = (await sales.get(`/api/quotes/${quote.id}`)).body.quote as QuoteView;
    expect(after.status).toBe('declined');
    expect(after.events.at(-1)).toMatchObject({ status: 'declined', note: 'Budget moved to tyres', by: 'Oda' });
  });

  it('when a quote is invalid, then 400 names the fields', async () => {
    const sales = await signedIn(t.app, 'sales');
    const { jobId, s321 } = await ids();
    const res = await sales.post('/api/quotes').send({ jobId, customerName: '', customerEmail: 'nope', validUntil: 'soon', options: [{ label: 'One', alloyId: s321 }] });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['customerEmail', 'customerName', 'options', 'validUntil']);
    const unknown = await sales.post('/api/quotes').send({ jobId, customerName: 'A', customerEmail: 'a@b.test', validUntil: inDays(3), options: [{ label: 'One', alloyId: s321 }, { label: 'Two', alloyId: 'nope' }] });
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.fields).toEqual({ 'options.1.alloyId': 'Not a published alloy' });
  });
});

describe('who may do what with quotes (every role × route)', () => {
  const cells: { what: string; allowed: Role[]; call: (c: Awaited<ReturnType<typeof signedIn>>, q: QuoteView) => Promise<{ status: number }> }[] = [
    { what: 'list quotes', allowed: [...ROLES], call: (c) => c.get('/api/quotes') },
    { what: 'read a quote', allowed: [...ROLES], call: (c, q) => c.get(`/api/quotes/${q.id}`) },
    { what: 'create a quote', allowed: ['sales', 'admin'], call: async (c, q) => c.post('/api/quotes').send({ jobId: q.jobId, customerName: 'B', customerEmail: 'b@example.test', validUntil: inDays(9), options: q.options }) },
    { what: 'change a draft', allowed: ['sales', 'admin'], call: (c, q) => c.patch(`/api/quotes/${q.id}`).send({ message: 'Changed' }) },
    { what: 'preview the e-mail', allowed: ['sales', 'admin'], call: (c, q) => c.get(`/api/quotes/${q.id}/email-preview`) },
    { what: 'send a quote', allowed: ['sales', 'admin'], call: (c, q) => c.post(`/api/quotes/${q.id}/send`).send({}) },
    { what: 'read the outbox', allowed: ['sales', 'admin'], call: (c) => c.get('/api/outbox') },
    { what: 'read shop settings', allowed: [...ROLES], call: (c) => c.get('/api/settings') },
    { what: 'change shop settings', allowed: ['admin'], call: async (c) => c.put('/api/settings').send({ ...(await c.get('/api/settings')).body.settings, labourRatePerHour: 70 }) },
  ];
  for (const cell of cells) {
    for (const role of ROLES) {
      const allowed = cell.allowed.includes(role);
      it(`when a ${role} tries to ${cell.what}, then ${allowed ? 'it is allowed' : '403'}`, async () => {
        const quote = await draftQuote(await signedIn(t.app, 'sales'));
        const res = await cell.call(await signedIn(t.app, role), quote);
        expect(res.status).toBe(allowed ? (res.status === 201 ? 201 : 200) : 403);
      });
    }
    it(`when anonymous tries to ${cell.what}, then 401`, async () => {
      const quote = await draftQuote(await signedIn(t.app, 'sales'));
      const res = await cell.call(client(t.app) as never, quote);
      expect(res.status).toBe(401);
    });
  }
});

describe('shop settings', () => {
  it('when an admin saves the shop’s own rates, then they are no longer marked demo and new drafts use them', async () => {
    const admin = await signedIn(t.app, 'admin');
    const before = (await admin.get('/api/settings')).body.settings;
    expect(before.isDemo).toBe(true);
    const saved = await admin.put('/api/settings').send({ ...before, labourRatePerHour: before.labourRatePerHour * 2 });
    expect(saved.body.settings).toMatchObject({ isDemo: false, labourRatePerHour: before.labourRatePerHour * 2 });
    const bad = await admin.put('/api/settings').send({ ...before, marginPct: -5 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty('marginPct');
  });
});
