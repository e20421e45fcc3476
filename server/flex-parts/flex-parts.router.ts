import { Router } from 'express';
import { flexPartInputSchema, flexPartPatchSchema } from '../../shared/schemas/alloy';
import { requireRole, requireSignedIn } from '../auth/session';
import { parseBody, parsePatch } from '../http/validate';
import type { FlexPartsService } from './flex-parts.service';

export function flexPartsRouter(service: FlexPartsService): Router {
  const router = Router();

  router.get('/', requireSignedIn, async (req, res) => {
    const includeInactive = req.query.includeInactive === 'true' && req.user!.role === 'admin';
    res.json({ items: await service.list(includeInactive) });
  });

  router.post('/', requireRole('admin'), async (req, res) => {
    res.status(201).json({ flexPart: await service.create(parseBody(flexPartInputSchema, req.body)) });
  });

  router.patch('/:id', requireRole('admin'), async (req, res) => {
    res.json({ flexPart: await service.update(req.params.id as string, parsePatch(flexPartPatchSchema, req.body)) });
  });

  return router;
}
