import { Router, type Request } from 'express';
import { acceptQuoteSchema, declineQuoteSchema, limitOverrideSchema, quoteInputSchema, quotePatchSchema } from '../../shared/schemas/quotes';
import { requireRole, requireSignedIn } from '../auth/session';
import { parseBody, parsePatch } from '../http/validate';
import type { QuotesService } from './quotes.service';

/** The address links in e-mails point at: the configured public URL, else the one the request came to. */
export function originOf(req: Request, publicUrl?: string): string {
  return publicUrl ? publicUrl.replace(/\/$/, '') : `${req.protocol}://${req.get('host')}`;
}

export function quotesRouter(service: QuotesService, publicUrl?: string): Router {
  const router = Router();
  const sellers = requireRole('sales', 'admin');

  router.get('/', requireSignedIn, async (_req, res) => {
    res.json({ items: await service.list() });
  });
  router.post('/', sellers, async (req, res) => {
    res.status(201).json({ quote: await service.create(parseBody(quoteInputSchema, req.body), req.user!) });
  });
  router.get('/:id', requireSignedIn, async (req, res) => {
    res.json({ quote: await service.get(req.params.id as string) });
  });
  router.patch('/:id', sellers, async (req, res) => {
    res.json({ quote: await service.update(req.params.id as string, parsePatch(quotePatchSchema, req.body), req.user!) });
  });
  router.get('/:id/activity', requireSignedIn, async (req, res) => {
    res.json({ items: await service.activity(req.params.id as string) });
  });
  router.get('/:id/email-preview', sellers, async (req, res) => {
    res.json({ email: await service.emailPreview(req.params.id as string, originOf(req, publicUrl)) });
  });
  // Engineers and admins vouch for an option over its temperature limit; sales cannot.
  router.post('/:id/limit-overrides', requireRole('engineer', 'admin'), async (req, res) => {
    res.status(201).json({ quote: await service.recordLimitOverride(req.params.id as string, parseBody(limitOverrideSchema, req.body), req.user!) });
  });
  router.post('/:id/send', sellers, async (req, res) => {
    res.json({ quote: await service.send(req.params.id as string, req.user!, originOf(req, publicUrl)) });
  });
  return router;
}

/** What the customer's private link reaches, with no account: that one quote and nothing else. */
export function publicQuotesRouter(service: QuotesService, publicUrl?: string): Router {
  const router = Router();
  router.get('/quotes/:token', async (req, res) => {
    res.setHeader('Cache-Control', 'no-store');
    res.json({ quote: await service.customer.openByToken(req.params.token as string) });
  });
  router.post('/quotes/:token/accept', async (req, res) => {
    const body = parseBody(acceptQuoteSchema, req.body);
    res.json({ quote: await service.customer.decide(req.params.token as string, { accept: true, ...body }, originOf(req, publicUrl)) });
  });
  router.post('/quotes/:token/decline', async (req, res) => {
    const body = parseBody(declineQuoteSchema, req.body);
    res.json({ quote: await service.customer.decide(req.params.token as string, { accept: false, ...body }, originOf(req, publicUrl)) });
  });
  return router;
}
