import { randomBytes } from 'node:crypto';
import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import express, { type Request, type Response } from 'express';
import Stripe from 'stripe';
import { formatMinor } from '../../shared/payments/deposit-amount';
import { finishedPage, payPage, secondStepPage, TEST_CARDS } from './fake-pay-pages';

/**
 * A stand-in for the payment provider, on a loopback port: the few API calls Dilato makes
 * (Checkout Sessions create, Refunds create) in the provider's wire format, a plain payment page
 * of its own, and webhooks signed the way the provider signs them. No network, no real money.
 */

type Params = Record<string, any>;

interface FakeSession {
  id: string;
  amount: number;
  currency: string;
  description: string;
  successUrl: string;
  cancelUrl: string;
  metadata: Record<string, string>;
  paymentIntentId: string;
  paymentIntentMetadata: Record<string, string>;
  status: 'open' | 'complete' | 'expired';
  refunded: boolean;
}

export type WebhookTarget = string | ((payload: string, signature: string) => Promise<unknown>);

export interface FakeProvider {
  /** Where the SDK reaches it, e.g. http://127.0.0.1:40123 */
  url: string;
  secretKey: string;
  webhookSecret: string;
  /** Where signed events go: the app's webhook URL, or a function (tests). */
  setWebhookTarget(target: WebhookTarget): void;
  /** Every event sent, with its signature header, oldest first (tests replay them). */
  sent: { type: string; payload: string; signature: string }[];
  close(): Promise<void>;
}

const newId = (prefix: string) => `${prefix}_${randomBytes(12).toString('hex')}`;

function stripeError(res: Response, status: number, message: string, code?: string) {
  res.status(status).json({ error: { type: status === 401 ? 'authentication_error' : 'invalid_request_error', message, code } });
}

export async function startFakeProvider(options: { secretKey?: string; webhookSecret?: string } = {}): Promise<FakeProvider> {
  const secretKey = options.secretKey ?? 'sk_test_dilato_fake_provider';
  const webhookSecret = options.webhookSecret ?? `whsec_${randomBytes(24).toString('hex')}`;
  const signer = new Stripe(secretKey);
  const sessions = new Map<string, FakeSession>();
  const byIdempotencyKey = new Map<string, unknown>();
  const sent: FakeProvider['sent'] = [];
  let target: WebhookTarget | undefined;

  async function emit(type: string, object: unknown): Promise<void> {
    const event = { id: newId('evt'), object: 'event', api_version: Stripe.API_VERSION, created: Math.floor(Date.now() / 1000), type, livemode: false, pending_webhooks: 1, data: { object } };
    const payload = JSON.stringify(event, null, 2);
    const signature = signer.webhooks.generateTestHeaderString({ payload, secret: webhookSecret });
    sent.push({ type, payload, signature });
    if (!target) return;
    try {
      if (typeof target === 'function') await target(payload, signature);
      else await fetch(target, { method: 'POST', headers: { 'Content-Type': 'application/json', 'Stripe-Signature': signature }, body: payload });
    } catch (err) {
      console.error(`[fake payments] ${type} could not be delivered:`, err);
    }
  }

  const sessionObject = (s: FakeSession) => ({
    id: s.id,
    object: 'checkout.session',
    mode: 'payment',
    url: s.status === 'open' ? `${base}/pay/${s.id}` : null,
    status: s.status,
    payment_status: s.status === 'complete' ? 'paid' : 'unpaid',
    amount_total: s.amount,
    currency: s.currency,
    metadata: s.metadata,
    payment_intent: s.status === 'complete' ? s.paymentIntentId : null,
    success_url: s.successUrl,
    cancel_url: s.cancelUrl,
  });

  const failed = (s: FakeSession, code: string, message: string) => ({
    id: s.paymentIntentId,
    object: 'payment_intent',
    amount: s.amount,
    currency: s.currency,
    status: 'requires_payment_method',
    metadata: s.paymentIntentMetadata,
    last_payment_error: { type: 'card_error', code, message },
  });

  async function settle(s: FakeSession, res: Response, outcome: 'paid' | { code: string; message: string }) {
    if (outcome === 'paid') {
      s.status = 'complete';
      await emit('checkout.session.completed', sessionObject(s));
      return res.redirect(303, s.successUrl.replace('{CHECKOUT_SESSION_ID}', s.id));
    }
    s.status = 'expired';
    await emit('payment_intent.payment_failed', failed(s, outcome.code, outcome.message));
    return res.redirect(303, s.cancelUrl);
  }

  const app = express();
  app.disable('x-powered-by');
  const api = express.Router();
  api.use(express.urlencoded({ extended: true }));
  api.use((req, res, next) => {
    if (req.headers.authorization !== `Bearer ${secretKey}`) return stripeError(res, 401, 'Invalid API Key provided.');
    const key = req.headers['idempotency-key'];
    if (typeof key === 'string' && byIdempotencyKey.has(key)) return res.json(byIdempotencyKey.get(key));
    next();
  });
  const remember = (req: Request, body: unknown) => {
    const key = req.headers['idempotency-key'];
    if (typeof key === 'string') byIdempotencyKey.set(key, body);
    return body;
  };

  api.post('/checkout/sessions', (req, res) => {
    const p = req.body as Params;
    const item = p.line_items?.[0];
    const amount = Number(item?.price_data?.unit_amount) * Number(item?.quantity ?? 1);
    if (!Number.isInteger(amount) || amount < 1) return stripeError(res, 400, 'line_items[0][price_data][unit_amount] must be a positive integer.', 'parameter_invalid_integer');
    if (!p.success_url || !p.cancel_url) return stripeError(res, 400, 'success_url and cancel_url are required.', 'parameter_missing');
    const s: FakeSession = {
      id: newId('cs_test'),
      amount,
      currency: String(item.price_data.currency ?? '').toLowerCase(),
      description: String(item.price_data.product_data?.name ?? 'Payment'),
      successUrl: p.success_url,
      cancelUrl: p.cancel_url,
      metadata: p.metadata ?? {},
      paymentIntentId: newId('pi'),
      paymentIntentMetadata: p.payment_intent_data?.metadata ?? {},
      status: 'open',
      refunded: false,
    };
    sessions.set(s.id, s);
    res.json(remember(req, sessionObject(s)));
  });

  api.post('/refunds', (req, res) => {
    const p = req.body as Params;
    const s = [...sessions.values()].find((x) => x.paymentIntentId === p.payment_intent && x.status === 'complete');
    if (!s) return stripeError(res, 400, `No such payment_intent: '${p.payment_intent}'`, 'resource_missing');
    if (s.refunded) return stripeError(res, 400, `Charge for ${s.paymentIntentId} has already been refunded.`, 'charge_already_refunded');
    s.refunded = true;
    const refund = { id: newId('re'), object: 'refund', amount: s.amount, currency: s.currency, payment_intent: s.paymentIntentId, status: 'succeeded', reason: p.reason ?? null, metadata: p.metadata ?? {} };
    res.json(remember(req, refund));
    // The provider tells the webhook after it has answered the call.
    res.on('finish', () => {
      void emit('charge.refunded', { id: newId('ch'), object: 'charge', amount: s.amount, amount_refunded: s.amount, refunded: true, currency: s.currency, payment_intent: s.paymentIntentId, metadata: s.paymentIntentMetadata });
    });
  });
  api.use((_req, res) => stripeError(res, 404, 'The fake payment provider does not offer this endpoint.'));
  app.use('/v1', api);

  const pages = express.Router();
  pages.use(express.urlencoded({ extended: false }));
  const open = (req: Request, res: Response): FakeSession | undefined => {
    const s = sessions.get(req.params.id as string);
    if (!s) {
      res.status(404).type('text/plain').send('No such payment.');
      return undefined;
    }
    if (s.status !== 'open') {
      res.type('html').send(finishedPage(s.status === 'complete' ? s.successUrl.replace('{CHECKOUT_SESSION_ID}', s.id) : s.cancelUrl));
      return undefined;
    }
    return s;
  };
  const amountOf = (s: FakeSession) => formatMinor(s.amount, s.currency.toUpperCase());
  pages.get('/:id', (req, res) => {
    const s = open(req, res);
    if (s) res.type('html').send(payPage({ sessionId: s.id, description: s.description, amount: amountOf(s) }));
  });
  pages.post('/:id', async (req, res) => {
    const s = open(req, res);
    if (!s) return;
    const card = String(req.body?.card ?? '').replace(/\D/g, '');
    if (card === TEST_CARDS.succeeds) return settle(s, res, 'paid');
    if (card === TEST_CARDS.declined) return settle(s, res, { code: 'card_declined', message: 'Your card was declined.' });
    if (card === TEST_CARDS.secondStep) return res.type('html').send(secondStepPage(s.id, amountOf(s)));
    res.status(400).type('html').send(payPage({ sessionId: s.id, description: s.description, amount: amountOf(s), error: 'Use one of the test cards listed below.' }));
  });
  pages.post('/:id/confirm', async (req, res) => {
    const s = open(req, res);
    if (!s) return;
    if (req.body?.answer === 'confirm') return settle(s, res, 'paid');
    return settle(s, res, { code: 'payment_intent_authentication_failure', message: 'Your bank did not confirm the payment.' });
  });
  app.use('/pay', pages);

  const server: Server = await new Promise((resolve) => {
    const s = app.listen(0, '127.0.0.1', () => resolve(s));
  });
  const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  return {
    url: base,
    secretKey,
    webhookSecret,
    sent,
    setWebhookTarget: (t) => {
      target = t;
    },
    close: () =>
      new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      }),
  };
}
