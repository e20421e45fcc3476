import express, { Router, type RequestHandler } from 'express';
import { z } from 'zod';
import { MAX_IMPORT_BYTES } from '../../shared/catalogue/catalogue-csv';
import { alloyInputSchema, alloyListQuerySchema, alloyPatchSchema, reviewNoteSchema, sourceInputSchema } from '../../shared/schemas/alloy';
import { requireRole, requireSignedIn } from '../auth/session';
import { AppError } from '../http/app-error';
import { parseBody, parsePatch, parseQuery } from '../http/validate';
import type { CatalogueCsvService } from './catalogue-csv.service';
import type { CatalogueService } from './catalogue.service';
import type { CatalogueReviewService } from './review.service';
import type { CatalogueVersionsService } from './versions.service';

const noteSchema = z.object({ note: z.string({ error: 'The note must be text' }).trim().max(500, { error: 'Use at most 500 characters' }).default('') });
const createSchema = alloyInputSchema.extend(noteSchema.shape);
/** Publishing and sending back say why, for the history and for the engineer. */
const requiredNoteSchema = reviewNoteSchema(true);

/** The CSV body, with a refusal that says how large a file may be. */
const csvBody: RequestHandler = (req, res, next) => {
  express.text({ type: ['text/csv', 'text/plain'], limit: MAX_IMPORT_BYTES })(req, res, (err?: unknown) => {
    if ((err as { type?: string } | undefined)?.type !== 'entity.too.large') return next(err);
    const mb = (bytes: number) => `${(bytes / 1024 / 1024).toFixed(1)} MB`;
    const size = Number(req.headers['content-length']);
    next(new AppError(413, 'too_large', `A CSV import may be at most ${mb(MAX_IMPORT_BYTES)}${size ? `; this file is ${mb(size)}` : ''}. Split it into smaller files.`, { file: `Larger than ${mb(MAX_IMPORT_BYTES)}` }));
  });
};

export function catalogueRouter(service: CatalogueService, csv: CatalogueCsvService, review: CatalogueReviewService, versions: CatalogueVersionsService): Router {
  const router = Router();
  const editors = requireRole('engineer', 'admin');
  const admins = requireRole('admin');

  router.get('/alloys', requireSignedIn, async (req, res) => {
    res.type('application/json').send(await service.listing.listJson(parseQuery(alloyListQuerySchema, req.query), req.user!));
  });

  router.get('/alloys/export.csv', requireSignedIn, async (req, res) => {
    res.type('text/csv; charset=utf-8').attachment('dilato-catalogue.csv').send(await csv.export(req.user!));
  });

  // Answers 202 at once; the client polls the import until it is done.
  router.post('/alloys/import', editors, csvBody, async (req, res) => {
    if (typeof req.body !== 'string' || req.body.trim() === '') {
      throw AppError.badRequest('invalid_csv', 'Send the CSV as the request body (text/csv).', { file: 'Empty or not CSV' });
    }
    const job = await csv.startImport(req.body, req.user!);
    res.status(202).location(`/api/alloys/imports/${job.id}`).json({ import: job });
  });

  router.get('/alloys/imports/:id', editors, async (req, res) => {
    res.json({ import: await csv.importStatus(req.params.id as string) });
  });

  router.get('/alloys/review-queue', admins, async (_req, res) => {
    const items = await review.queue();
    res.json({ items, count: items.length });
  });

  router.post('/alloys', editors, async (req, res) => {
    const { note, ...input } = parseBody(createSchema, req.body);
    res.status(201).json({ alloy: await service.create(input, req.user!, note) });
  });

  router.get('/alloys/:id', requireSignedIn, async (req, res) => {
    res.json({ alloy: await service.detail(req.params.id as string, req.user!) });
  });

  router.patch('/alloys/:id', editors, async (req, res) => {
    res.json({ alloy: await service.patch(req.params.id as string, parsePatch(alloyPatchSchema, req.body), req.user!) });
  });

  router.get('/alloys/:id/versions', requireSignedIn, async (req, res) => {
    res.json({ items: await versions.list(req.params.id as string, req.user!) });
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

  router.post('/alloys/:id/submit', editors, async (req, res) => {
    const { note } = parseBody(noteSchema, req.body);
    res.json({ alloy: await review.submit(req.params.id as string, req.user!, note) });
  });

  router.post('/alloys/:id/send-back', admins, async (req, res) => {
    const { note } = parseBody(requiredNoteSchema, req.body);
    res.json({ alloy: await review.sendBack(req.params.id as string, req.user!, note) });
  });

  router.post('/alloys/:id/publish', admins, async (req, res) => {
    const { note } = parseBody(requiredNoteSchema, req.body);
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
