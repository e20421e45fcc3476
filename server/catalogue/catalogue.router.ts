import express, { Router } from 'express';
import { z } from 'zod';
import { alloyInputSchema, alloyListQuerySchema, alloyPatchSchema, sourceInputSchema } from '../../shared/schemas/alloy';
import { requireRole, requireSignedIn } from '../auth/session';
import { AppError } from '../http/app-error';
import { fieldsFromZod, parseBody } from '../http/validate';
import type { CatalogueCsvService } from './catalogue-csv.service';
import type { CatalogueService } from './catalogue.service';

const noteSchema = z.object({ note: z.string().trim().max(500).default('') });

export function catalogueRouter(service: CatalogueService, csv: CatalogueCsvService): Router {
  const router = Router();
  const editors = requireRole('engineer', 'admin');
  const admins = requireRole('admin');

  router.get('/alloys', requireSignedIn, async (req, res) => {
    const query = alloyListQuerySchema.safeParse(req.query);
    if (!query.success) throw AppError.badRequest('invalid_query', 'Some filters are not valid.', fieldsFromZod(query.error));
    res.json(await service.list(query.data, req.user!));
  });

  router.get('/alloys/export.csv', requireSignedIn, async (req, res) => {
    res.type('text/csv; charset=utf-8').attachment('dilato-catalogue.csv').send(await csv.export(req.user!));
  });

  router.post('/alloys/import', editors, express.text({ type: ['text/csv', 'text/plain'], limit: '5mb' }), async (req, res) => {
    if (typeof req.body !== 'string' || req.body.trim() === '') {
      throw AppError.badRequest('invalid_csv', 'Send the CSV as the request body (text/csv).', { file: 'Empty or not CSV' });
    }
    res.json(await csv.import(req.body, req.user!));
  });

  router.post('/alloys', editors, async (req, res) => {
    const { note } = noteSchema.parse({ note: (req.body as { note?: unknown })?.note ?? '' });
    res.status(201).json({ alloy: await service.create(parseBody(alloyInputSchema, req.body), req.user!, note) });
  });

  router.get('/alloys/:id', requireSignedIn, async (req, res) => {
    res.json({ alloy: await service.detail(req.params.id as string, req.user!) });
  });

  router.patch('/alloys/:id', editors, async (req, res) => {
    res.json({ alloy: await service.patch(req.params.id as string, parseBody(alloyPatchSchema, req.body), req.user!) });
  });

  router.get('/alloys/:id/versions/:version', requireSignedIn, async (req, res) => {
    const version = Number(req.params.version);
    if (!Number.isInteger(version) || version < 1) throw AppError.notFound('There is no such version.');
    res.json({ version: await service.version(req.params.id as string, version, req.user!) });
  });

  router.get('/alloys/:id/revisions', requireSignedIn, async (req, res) => {
    res.json({ items: await service.revisions(req.params.id as string, req.user!) });
  });

  router.get('/alloys/:id/review', editors, async (req, res) => {
    res.json(await service.review(req.params.id as string, req.user!));
  });

  router.post('/alloys/:id/publish', admins, async (req, res) => {
    const { note } = parseBody(noteSchema, req.body);
    res.json({ alloy: await service.publish(req.params.id as string, req.user!, note) });
  });

  router.post('/alloys/:id/retire', admins, async (req, res) => {
    const { note } = parseBody(noteSchema, req.body);
    res.json({ alloy: await service.setRetired(req.params.id as string, true, req.user!, note) });
  });

  router.post('/alloys/:id/restore', admins, async (req, res) => {
    const { note } = parseBody(noteSchema, req.body);
    res.json({ alloy: await service.setRetired(req.params.id as string, false, req.user!, note) });
  });

  router.get('/sources', requireSignedIn, async (_req, res) => {
    res.json({ items: await service.sources() });
  });

  router.post('/sources', editors, async (req, res) => {
    res.status(201).json({ source: await service.createSource(parseBody(sourceInputSchema, req.body)) });
  });

  return router;
}
