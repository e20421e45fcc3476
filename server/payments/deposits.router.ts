import express, { Router } from 'express';
import { refundDepositSchema } from '../../shared/schemas/deposits';
import { requireRole, requireSignedIn } from '../auth/session';
import { parseBody } from '../http/validate';
import { originOf } from '../quotes/quotes.router';
import type { DepositWebhooks } from './deposit-webhooks';
import type { DepositsService } from './deposits.service';

/**
 * The provider's webhook: mounted before the JSON parser (the signature covers the raw bytes) and
 * before the same-origin guard (the provider is not a browser on this origin); its signature is its proof.
 */
export function paymentWebhookRouter(webhooks: DepositWebhooks): Router {
  const router = Router();
  router.post('/payments/webhook', express.raw({ type: '*/*', limit: '256kb' }), async (req, res) => {
    const body = Buffer.isBuffer(req.body) ? req.body : undefined;
    res.json({ received: true, ...(await webhooks.receive(body, req.get('stripe-signature'))) });
  });
  return router;
}

/** The customer, through the private link, opens the provider's payment page. */
export function publicDepositRouter(service: DepositsService, publicUrl?: string): Router {
  const router = Router();
  router.post('/quotes/:token/deposit', async (req, res) => {
    res.json(await service.startPayment(req.params.token as string, originOf(req, publicUrl)));
  });
  return router;
}

export function depositsRouter(service: DepositsService, publicUrl?: string): Router {
  const router = Router();
  router.post('/quotes/:id/deposit/refund', requireRole('admin'), async (req, res) => {
    const { reason } = parseBody(refundDepositSchema, req.body);
    res.json({ deposit: await service.refund(req.params.id as string, reason, req.user!, originOf(req, publicUrl)) });
  });
  router.get('/jobs/:id/deposits', requireSignedIn, async (req, res) => {
    res.json({ items: await service.forJob(req.params.id as string) });
  });
  return router;
}
