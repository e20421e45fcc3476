import { Router } from 'express';
import { calcRunRequestSchema } from '../../shared/schemas/calc';
import { requireSignedIn } from '../auth/session';
import { parseBody } from '../http/validate';
import type { CalcService } from './calc.service';

export function calcRouter(service: CalcService): Router {
  const router = Router();
  router.post('/run', requireSignedIn, async (req, res) => {
    res.json(await service.run(parseBody(calcRunRequestSchema, req.body)));
  });
  return router;
}
