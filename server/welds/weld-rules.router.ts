import { Router } from 'express';
import { weldRuleInputSchema, weldRulePatchSchema } from '../../shared/schemas/weld-rules';
import { currentUser, requireRole, requireSignedIn } from '../auth/session';
import { parseBody, parsePatch } from '../http/validate';
import type { WeldPlanService } from './weld-plan.service';
import type { WeldRulesService } from './weld-rules.service';

/** A job's welds, for every signed-in role (sales quote the welding too). */
export function weldPlanRouter(service: WeldPlanService): Router {
  const router = Router();
  router.get('/jobs/:id/weld-plan', requireSignedIn, async (req, res) => {
    res.json({ plan: await service.plan(req.params.id as string) });
  });
  return router;
}

/** The shop's weld table: every signed-in role reads it; engineers and admins keep it. */
export function weldRulesRouter(service: WeldRulesService): Router {
  const router = Router();
  const editors = requireRole('engineer', 'admin');
  const id = (params: Record<string, unknown>) => params.id as string;

  router.get('/', requireSignedIn, async (_req, res) => {
    res.json({ items: await service.list() });
  });
  router.get('/:id', requireSignedIn, async (req, res) => {
    res.json({ rule: await service.get(id(req.params)) });
  });
  router.get('/:id/revisions', requireSignedIn, async (req, res) => {
    res.json({ items: await service.revisions(id(req.params)) });
  });
  router.post('/', editors, async (req, res) => {
    res.status(201).json({ rule: await service.create(parseBody(weldRuleInputSchema, req.body), currentUser(req)) });
  });
  router.patch('/:id', editors, async (req, res) => {
    res.json({ rule: await service.patch(id(req.params), parsePatch(weldRulePatchSchema, req.body), currentUser(req)) });
  });
  router.delete('/:id', editors, async (req, res) => {
    await service.remove(id(req.params), currentUser(req));
    res.status(204).end();
  });
  return router;
}
