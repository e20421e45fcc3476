import { formatMinor } from '../../shared/payments/deposit-amount';
import { DEMO_SHOP_SETTINGS } from '../../shared/schemas/shop-settings';
import { acceptedQuote, answerSecondStep, payOnPage, publicDeposit, shopQuote, startPayment, TEST_CARDS, untilSent } from './deposit-helpers';
import { DEMO_USERS } from '../../server/seed/demo-users';
import { draftQuote, mailTo, tokenIn } from './quote-helpers';
import { createTestApp, expectErrorShape, signedIn, type TestApp } from './test-app';

const adminName = DEMO_USERS.find((u) => u.role === 'admin')!.name;

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
}, 60_000);
afterAll(() => t.close());

describe('deposits on accepted quotes', () => {
  it('when the customer accepts, pays with the success card and the webhook arrives, then the deposit is paid everywhere and receipts go out', async () => {
    const { sales, customer, token, quoteId, quote } = await acceptedQuote(t, 'paid@example.test');
    const total = quote.options[0].total;
    const due = await publicDeposit(customer, token);
    // 30 % is the demo shop's deposit share; the total is in euros with cents, so the deposit is whole cents.
    expect(due).toMatchObject({ status: 'due', sharePct: 30, currency: 'EUR', attempts: 0 });
    expect(Number.isInteger(due!.amountMinor)).toBe(true);
    expect(Math.abs(due!.amountMinor - total * 30)).toBeLessThanOrEqual(0.5);

    const url = await startPayment(customer, token);
    expect(url).toMatch(new RegExp(`^${t.payments.url}/pay/cs_test_`));
    expect(await startPayment(customer, token)).toBe(url); // a second press opens the same page
    expect((await publicDeposit(customer, token))?.status).toBe('pending');

    const page = await (await fetch(url)).text();
    expect(page).toContain(formatMinor(due!.amountMinor, 'EUR'));
    expect(page).toContain('4242 4242 4242 4242');
    const paid = await payOnPage(url, '4242 4242 4242 4242');
    expect(paid.status).toBe(303);
    expect(paid.location).toBe(`http://dilato.test/q/${token}?deposit=done`);

    expect(await publicDeposit(customer, token)).toMatchObject({ status: 'paid', amountMinor: due!.amountMinor, paidAt: expect.any(String) });
    const shop = await shopQuote(sales, quoteId);
    expect(shop.deposit?.status).toBe('paid');
    expect(shop.events.map((e) => e.note)).toEqual(expect.arrayContaining([expect.stringMatching(/^Deposit payment started \(attempt 1/), expect.stringMatching(/^Deposit paid/)]));
    const listed = ((await sales.get('/api/quotes')).body.items as { id: string; deposit?: { status: string } }[]).find((q) => q.id === quoteId);
    expect(listed?.deposit?.status).toBe('paid');
    expect((await sales.get(`/api/jobs/${shop.jobId}/deposits`)).body.items).toEqual(expect.arrayContaining([expect.objectContaining({ quoteId, quoteNumber: shop.number, status: 'paid' })]));

    expect((await mailTo(sales, 'paid@example.test')).some((m) => m.text.includes(`Deposit received on quote ${shop.number}: ${formatMinor(due!.amountMinor, 'EUR')}`))).toBe(true);
    const sellerMail = (await sales.get('/api/outbox')).body.items as { to: string; subject: string }[];
    expect(sellerMail.some((m) => m.subject === `Deposit paid on quote ${shop.number} by Oda Kallstrom` && !m.to.includes('paid@example.test'))).toBe(true);

    const again = await customer.post(`/api/public/quotes/${token}/deposit`).send({});
    expect(again.status).toBe(409);
    expectErrorShape(again.body, 'deposit_paid');
  });

  it('when the card is declined, then the customer is sent back with the reason, and a new attempt can then succeed', async () => {
    const { customer, token } = await acceptedQuote(t, 'declined@example.test');
    const first = await startPayment(customer, token);
    const declined = await payOnPage(first, TEST_CARDS.declined);
    expect(declined.location).toBe(`http://dilato.test/q/${token}?deposit=back`);
    expect(await publicDeposit(customer, token)).toMatchObject({ status: 'failed', failureMessage: 'Your card was declined.', attempts: 1 });

    const second = await startPayment(customer, token);
    expect(second).not.toBe(first);
    expect(await publicDeposit(customer, token)).toMatchObject({ status: 'pending', attempts: 2, failureMessage: null });
    expect((await payOnPage(second, TEST_CARDS.succeeds)).status).toBe(303);
    expect((await publicDeposit(customer, token))?.status).toBe('paid');
  });

  it('when the bank asks for a second step, then confirming pays and refusing fails the attempt', async () => {
    const a = await acceptedQuote(t, 'second-step@example.test');
    const url = await startPayment(a.customer, a.token);
    const step = await payOnPage(url, TEST_CARDS.secondStep);
    expect(step.status).toBe(200);
    expect(step.html).toContain('Confirm the payment');
    expect((await publicDeposit(a.customer, a.token))?.status).toBe('pending');
    expect((await answerSecondStep(url, 'confirm')).status).toBe(303);
    expect((await publicDeposit(a.customer, a.token))?.status).toBe('paid');

    const b = await acceptedQuote(t, 'second-step-refused@example.test');
    const refusedUrl = await startPayment(b.customer, b.token);
    await payOnPage(refusedUrl, TEST_CARDS.secondStep);
    await answerSecondStep(refusedUrl, 'refuse');
    expect(await publicDeposit(b.customer, b.token)).toMatchObject({ status: 'failed', failureMessage: 'Your bank did not confirm the payment.' });
  });

  it('when an admin refunds a paid deposit with a reason, then it goes through the provider, is kept in the history and receipts go out', async () => {
    const { sales, customer, token, quoteId } = await acceptedQuote(t, 'refund@example.test');
    await payOnPage(await startPayment(customer, token), TEST_CARDS.succeeds);
    const admin = await signedIn(t.app, 'admin');

    const noReason = await admin.post(`/api/quotes/${quoteId}/deposit/refund`).send({});
    expect(noReason.status).toBe(400);
    expect(noReason.body.error.fields.reason).toBeTruthy();
    expect((await sales.post(`/api/quotes/${quoteId}/deposit/refund`).send({ reason: 'Customer changed the order' })).status).toBe(403);

    const refunded = await admin.post(`/api/quotes/${quoteId}/deposit/refund`).send({ reason: 'Customer changed the order' });
    expect(refunded.status).toBe(200);
    expect(refunded.body.deposit).toMatchObject({ status: 'refunded', refundReason: 'Customer changed the order', refundedAt: expect.any(String) });
    await untilSent(t, 'charge.refunded');

    const shop = await shopQuote(sales, quoteId);
    expect(shop.deposit?.status).toBe('refunded');
    expect(shop.events.some((e) => e.note.startsWith('Deposit refunded') && e.note.endsWith('Customer changed the order') && e.by === adminName)).toBe(true);
    const activity = (await sales.get(`/api/quotes/${quoteId}/activity`)).body.items as { action: string; changes: { path: string; after: unknown }[] }[];
    expect(activity.find((a) => a.action === 'refunded')?.changes).toEqual(expect.arrayContaining([{ path: 'refundReason', before: null, after: 'Customer changed the order' }]));
    expect((await mailTo(sales, 'refund@example.test')).some((m) => m.text.includes('Reason: Customer changed the order'))).toBe(true);

    const twice = await admin.post(`/api/quotes/${quoteId}/deposit/refund`).send({ reason: 'Again' });
    expect(twice.status).toBe(409);
    expectErrorShape(twice.body, 'deposit_refunded');
  });

  it('when nothing has been paid, then a refund is refused and nothing is asked of the provider', async () => {
    const { quoteId } = await acceptedQuote(t, 'unpaid-refund@example.test');
    const admin = await signedIn(t.app, 'admin');
    const before = t.payments.sent.length;
    const res = await admin.post(`/api/quotes/${quoteId}/deposit/refund`).send({ reason: 'Nothing to refund' });
    expect(res.status).toBe(409);
    expectErrorShape(res.body, 'deposit_not_paid');
    expect(t.payments.sent.length).toBe(before);
  });

  it('when a quote is sent but not accepted, then no deposit is shown and none can be started', async () => {
    const sales = await signedIn(t.app, 'sales');
    const draft = await draftQuote(t.app, sales, 'undecided@example.test');
    await sales.post(`/api/quotes/${draft.id}/send`);
    const token = tokenIn((await mailTo(sales, 'undecided@example.test'))[0].text);
    expect((await sales.get(`/api/public/quotes/${token}`)).body.quote.deposit).toBeNull();
    expect((await shopQuote(sales, draft.id)).deposit).toBeNull();
    const res = await sales.post(`/api/public/quotes/${token}/deposit`).send({});
    expect(res.status).toBe(409);
    expectErrorShape(res.body, 'not_accepted');
  });

  it('when the shop sets the deposit share to 0 %, then an accepted quote asks for nothing and no payment can be started', async () => {
    const admin = await signedIn(t.app, 'admin');
    expect((await admin.put('/api/settings').send({ ...DEMO_SHOP_SETTINGS, depositSharePct: 0 })).status).toBe(200);
    try {
      const { sales, customer, token, quoteId } = await acceptedQuote(t, 'no-deposit@example.test');
      expect(await publicDeposit(customer, token)).toBeNull();
      expect((await shopQuote(sales, quoteId)).deposit).toBeNull();
      const before = t.payments.sent.length;
      const res = await customer.post(`/api/public/quotes/${token}/deposit`).send({});
      expect(res.status).toBe(409);
      expectErrorShape(res.body, 'deposits_off');
      expect(t.payments.sent.length).toBe(before);
    } finally {
      await admin.put('/api/settings').send(DEMO_SHOP_SETTINGS);
    }
  });

  it('when the share is not a whole percent from 0 to 100, then the settings are refused with the field named', async () => {
    const admin = await signedIn(t.app, 'admin');
    for (const depositSharePct of [12.5, -1, 101]) {
      const res = await admin.put('/api/settings').send({ ...DEMO_SHOP_SETTINGS, depositSharePct });
      expect(res.status).toBe(400);
      expect(res.body.error.fields.depositSharePct).toBeTruthy();
    }
  });
});
