import { pipeline } from 'node:stream/promises';
import { Router, type RequestHandler } from 'express';
import multer from 'multer';
import { requireRole, requireSignedIn } from '../auth/session';
import { AppError } from '../http/app-error';
import type { ObjectStore } from '../storage/object-store';
import type { DatasheetsService } from './datasheets.service';
import { pdfStorage, tooLarge, type StoredFile } from './pdf-storage';

function uploadOne(store: ObjectStore): RequestHandler {
  // Browsers send file names as raw UTF-8 without a charset parameter.
  const upload = multer({ storage: pdfStorage(store), defParamCharset: 'utf8', limits: { files: 1, fields: 5, fieldSize: 10_000 } }).single('file');
  return (req, res, next) => {
    upload(req, res, (err: unknown) => {
      if (!err) return next();
      if (err instanceof AppError) return next(err);
      const code = (err as { code?: string }).code;
      if (code === 'LIMIT_FILE_SIZE') return next(tooLarge());
      next(AppError.badRequest('invalid_upload', 'The upload could not be read; send one PDF in the field "file".', { file: 'Send one PDF in the field "file"' }));
    });
  };
}

/** POST /api/alloys/:id/datasheets and DELETE /api/datasheets/:id (engineer, admin); GET /api/datasheets/:id (anyone signed in). */
export function datasheetsRouter(service: DatasheetsService, store: ObjectStore): Router {
  const router = Router();

  router.post('/alloys/:id/datasheets', requireRole('engineer', 'admin'), uploadOne(store), async (req, res) => {
    const file = req.file as (Express.Multer.File & StoredFile) | undefined;
    if (!file) throw AppError.badRequest('invalid_upload', 'Choose a PDF to upload.', { file: 'Choose a PDF to upload' });
    const sheet = await service.attach(req.params.id as string, { ...file, originalName: file.originalname }, req.user!);
    res.status(201).json({ datasheet: sheet });
  });

  router.get('/datasheets/:id', requireSignedIn, async (req, res) => {
    const file = await service.forDownload(req.params.id as string, req.user!);
    // attachment() picks a type from the name's extension, so the PDF type is set after it.
    res.attachment(file.originalName);
    res.setHeader('Content-Type', 'application/pdf');
    res.setHeader('Content-Length', String(file.sizeBytes));
    // A broken stream part-way cannot become an error answer any more (the headers are out): the response is cut off.
    await pipeline(file.body, res).catch(() => res.destroy());
  });

  router.delete('/datasheets/:id', requireRole('engineer', 'admin'), async (req, res) => {
    await service.remove(req.params.id as string, req.user!);
    res.json({ removed: { id: req.params.id } });
  });

  return router;
}
