import { Router } from 'express';
import { currencyRateInputSchema, currencyRateParamsSchema } from '../../shared/schemas/currency-rate';
import { requireRole, requireSignedIn } from '../auth/session';
import { parseBody } from '../http/validate';
import type { CurrencyRatesService } from './currency-rates.service';

export function currencyRatesRouter(service: CurrencyRatesService): Router {
  const router = Router();
  router.get('/', requireSignedIn, async (_req, res) => {
    res.json(await service.table());
  });
  router.put('/:from', requireRole('admin'), async (req, res) => {
    const { from } = parseBody(currencyRateParamsSchema, req.params);
    const { rate } = parseBody(currencyRateInputSchema, req.body);
    res.json(await service.set(from, rate, req.user!.name));
  });
  router.delete('/:from', requireRole('admin'), async (req, res) => {
    res.json(await service.remove(parseBody(currencyRateParamsSchema, req.params).from));
  });
  return router;
}
