import { Router } from 'express';
import { calcRunRequestSchema, resultDetailQuerySchema } from '../../shared/schemas/calc';
import { requireSignedIn } from '../auth/session';
import { parseBody, parseQuery } from '../http/validate';
import type { CalcService } from './calc.service';

export function calcRouter(service: CalcService): Router {
  const router = Router();
  router.post('/run', requireSignedIn, async (req, res) => {
    const { include } = parseQuery(resultDetailQuerySchema, req.query);
    res.json(await service.run(parseBody(calcRunRequestSchema, req.body), include === 'curves'));
  });
  return router;
}
