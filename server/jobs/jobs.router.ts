import { Router } from 'express';
import {
  compareQuerySchema,
  jobDetailQuerySchema,
  jobCreateSchema,
  jobListQuerySchema,
  jobPatchSchema,
  runCreateSchema,
  runOrderSchema,
  runPatchSchema,
} from '../../shared/schemas/jobs';
import { currentUser, requireRole, requireSignedIn } from '../auth/session';
import { parseBody, parsePatch, parseQuery } from '../http/validate';
import type { JobsService } from './jobs.service';

/** Jobs and their runs: every signed-in role reads (sales quotes from them); the shop floor and engineering write. */
export function jobsRouter(service: JobsService): Router {
  const router = Router();
  const editors = requireRole('fabricator', 'engineer', 'admin');
  const id = (params: Record<string, unknown>) => params.id as string;

  router.get('/jobs', requireSignedIn, async (req, res) => {
    res.type('application/json').send(await service.lists.json(parseQuery(jobListQuerySchema, req.query)));
  });

  router.post('/jobs', editors, async (req, res) => {
    res.status(201).json({ job: await service.createJob(parseBody(jobCreateSchema, req.body), currentUser(req)) });
  });

  router.get('/jobs/:id', requireSignedIn, async (req, res) => {
    const { include } = parseQuery(jobDetailQuerySchema, req.query);
    res.type('application/json').send(await service.detailJson(id(req.params), include === 'curves'));
  });

  router.patch('/jobs/:id', editors, async (req, res) => {
    res.json({ job: await service.patchJob(id(req.params), parsePatch(jobPatchSchema, req.body), currentUser(req)) });
  });

  router.post('/jobs/:id/runs', editors, async (req, res) => {
    res.status(201).json({ run: await service.createRun(id(req.params), parseBody(runCreateSchema, req.body), currentUser(req)) });
  });

  router.put('/jobs/:id/runs/order', editors, async (req, res) => {
    res.json({ job: await service.reorderRuns(id(req.params), parseBody(runOrderSchema, req.body), currentUser(req)) });
  });

  router.get('/jobs/:id/activity', requireSignedIn, async (req, res) => {
    res.json({ items: await service.jobActivity(id(req.params)) });
  });

  router.get('/runs/:id/activity', requireSignedIn, async (req, res) => {
    res.json({ items: await service.runActivity(id(req.params)) });
  });

  router.get('/runs/:id', requireSignedIn, async (req, res) => {
    res.json({ run: await service.run(id(req.params)) });
  });

  router.patch('/runs/:id', editors, async (req, res) => {
    res.json({ run: await service.patchRun(id(req.params), parsePatch(runPatchSchema, req.body), currentUser(req)) });
  });

  router.delete('/runs/:id', editors, async (req, res) => {
    await service.deleteRun(id(req.params), currentUser(req));
    res.status(204).end();
  });

  router.post('/runs/:id/duplicate', editors, async (req, res) => {
    res.status(201).json({ run: await service.duplicateRun(id(req.params), currentUser(req)) });
  });

  router.get('/runs/:id/compare', requireSignedIn, async (req, res) => {
    res.json(await service.compare(id(req.params), parseQuery(compareQuerySchema, req.query).alloyIds));
  });

  return router;
}
