import request from 'supertest';
import Stripe from 'stripe';
import { createPaymentsClient } from '../../server/payments/payments-client';
import { mailTo } from './quote-helpers';
import { acceptedQuote, payOnPage, publicDeposit, shopQuote, startPayment, TEST_CARDS, untilSent } from './deposit-helpers';
import { createTestApp, expectErrorShape, HOST, signedIn, type TestApp } from './test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
}, 60_000);
afterAll(() => t.close());

const signer = new Stripe('sk_test_for_signing_only');
const post = (payload: string, signature?: string) => {
  const req = request(t.app).post('/api/payments/webhook').set('Host', HOST).set('Content-Type', 'application/json');
  return (signature ? req.set('Stripe-Signature', signature) : req).send(payload);
};
const sign = (payload: string, secret = t.payments.webhookSecret) => signer.webhooks.generateTestHeaderString({ payload, secret });

/** An accepted quote with a payment page open, and the deposit row's id taken from what the fake was told. */
async function openPayment(email: string) {
  const a = await acceptedQuote(t, email);
  const url = await startPayment(a.customer, a.token);
  return { ...a, url };
}

function completedEvent(id: string, session: Record<string, unknown>) {
  return JSON.stringify({ id, object: 'event', type: 'checkout.session.completed', created: Math.floor(Date.now() / 1000), livemode: false, data: { object: session } });
}

describe('the payment webhook', () => {
  it('when the signature is missing, wrong, made with another secret or the payload was altered, then it answers 400 and nothing changes', async () => {
    const { customer, token, url } = await openPayment('bad-signature@example.test');
    // The provider's own event for this payment, captured but not delivered: the fake is pointed elsewhere meanwhile.
    t.payments.setWebhookTarget(async () => undefined);
    await payOnPage(url, TEST_CARDS.succeeds);
    const real = t.payments.sent.at(-1)!;
    expect(real.type).toBe('checkout.session.completed');

    const tries = [
      await post(real.payload),
      await post(real.payload, 't=1,v1=deadbeef'),
      await post(real.payload, sign(real.payload, 'whsec_someone_else')),
      await post(real.payload.replace('"paid"', '"paid" '), real.signature),
    ];
    for (const res of tries) {
      expect(res.status).toBe(400);
      expectErrorShape(res.body, 'bad_signature');
    }
    expect((await publicDeposit(customer, token))?.status).toBe('pending');

    const delivered = await post(real.payload, real.signature);
    expect([delivered.status, delivered.body]).toEqual([200, { received: true, handled: true }]);
    expect((await publicDeposit(customer, token))?.status).toBe('paid');
  });

  it('when an event is delivered again, then the second delivery is answered 200 and changes nothing', async () => {
    const { sales, customer, token, quoteId, url } = await openPayment('replay@example.test');
    await payOnPage(url, TEST_CARDS.succeeds);
    const paidEvent = t.payments.sent.filter((e) => e.type === 'checkout.session.completed').at(-1)!;
    const before = await shopQuote(sales, quoteId);
    const mails = (await sales.get('/api/outbox')).body.items.length;

    const replay = await post(paidEvent.payload, paidEvent.signature);
    expect([replay.status, replay.body]).toEqual([200, { received: true, handled: false }]);
    const after = await shopQuote(sales, quoteId);
    expect(after.events).toEqual(before.events);
    expect(after.deposit).toEqual(before.deposit);
    expect((await sales.get('/api/outbox')).body.items.length).toBe(mails);
    expect((await publicDeposit(customer, token))?.status).toBe('paid');
  });

  it('when events come out of order, then a late failure cannot undo a payment and a late payment after a refund changes nothing', async () => {
    const { customer, token, quoteId, url } = await openPayment('out-of-order@example.test');
    await payOnPage(url, TEST_CARDS.succeeds);
    const paid = JSON.parse(t.payments.sent.filter((e) => e.type === 'checkout.session.completed').at(-1)!.payload);
    const { depositId, attempt } = paid.data.object.metadata as Record<string, string>;

    const lateFailure = JSON.stringify({
      id: 'evt_late_failure_1',
      object: 'event',
      type: 'payment_intent.payment_failed',
      data: { object: { id: 'pi_old', object: 'payment_intent', metadata: { depositId, attempt }, last_payment_error: { message: 'Your card was declined.' } } },
    });
    expect((await post(lateFailure, sign(lateFailure))).status).toBe(200);
    expect((await publicDeposit(customer, token))?.status).toBe('paid');

    const admin = await signedIn(t.app, 'admin');
    expect((await admin.post(`/api/quotes/${quoteId}/deposit/refund`).send({ reason: 'Order moved to next year' })).status).toBe(200);
    const latePaid = completedEvent('evt_late_paid_1', paid.data.object);
    expect((await post(latePaid, sign(latePaid))).status).toBe(200);
    expect((await publicDeposit(customer, token))?.status).toBe('refunded');
  });

  it('when the shop refunds at the provider instead of in Dilato, then the signed event marks the deposit refunded, notes it and sends both receipts once', async () => {
    const { sales, customer, token, quoteId, url } = await openPayment('refund-at-provider@example.test');
    await payOnPage(url, TEST_CARDS.succeeds);
    const paid = await shopQuote(sales, quoteId);
    expect(paid.deposit?.status).toBe('paid');
    const refundMails = async () => (await mailTo(sales, 'refund-at-provider@example.test')).filter((m) => m.subject.startsWith('Refund: deposit for quote'));
    expect(await refundMails()).toHaveLength(0);

    // What the provider's own dashboard does: a refund on the payment, with nothing from Dilato.
    const provider = createPaymentsClient(t.payments.secretKey, t.payments.url);
    const session = JSON.parse(t.payments.sent.filter((e) => e.type === 'checkout.session.completed').at(-1)!.payload).data.object;
    await provider.refunds.create({ payment_intent: session.payment_intent });
    await untilSent(t, 'charge.refunded', t.payments.sent.filter((e) => e.type === 'charge.refunded').length);

    const after = await shopQuote(sales, quoteId);
    expect(after.deposit).toMatchObject({ status: 'refunded', refundedAt: expect.any(String), refundReason: null });
    expect(after.events.filter((e) => e.note.startsWith('Deposit refunded at the payment provider'))).toHaveLength(1);
    expect((await publicDeposit(customer, token))?.status).toBe('refunded');
    // The receipts follow the commit, so they may land a moment after the status does.
    for (let i = 0; i < 50 && (await refundMails()).length === 0; i++) await new Promise((r) => setTimeout(r, 40));
    expect(await refundMails()).toHaveLength(1);

    const refundEvent = t.payments.sent.filter((e) => e.type === 'charge.refunded').at(-1)!;
    expect((await post(refundEvent.payload, refundEvent.signature)).body).toEqual({ received: true, handled: false });
    expect(await refundMails()).toHaveLength(1);
  });

  it('when a paid event names another amount than the one asked, then the deposit is not marked paid', async () => {
    const { customer, token, url } = await openPayment('wrong-amount@example.test');
    t.payments.setWebhookTarget(async () => undefined);
    await payOnPage(url, TEST_CARDS.succeeds);
    const session = JSON.parse(t.payments.sent.at(-1)!.payload).data.object;
    const event = completedEvent('evt_wrong_amount_1', { ...session, amount_total: session.amount_total - 1 });
    expect((await post(event, sign(event))).status).toBe(200);
    expect((await publicDeposit(customer, token))?.status).toBe('pending');
  });
});

afterEach(() => {
  t.payments.setWebhookTarget((payload, signature) => post(payload, signature));
});
