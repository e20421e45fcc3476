import { createHash, randomBytes } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { Transform, type TransformCallback } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import type { Request } from 'express';
import type { StorageEngine } from 'multer';
import { AppError } from '../http/app-error';

export const MAX_DATASHEET_BYTES = 25 * 1024 * 1024;
const PDF_MAGIC = Buffer.from('%PDF-');

export interface StoredFile {
  storedName: string;
  sizeBytes: number;
  sha256: string;
}

/** Checks the first bytes for the PDF signature, counts, and hashes while the upload streams past. */
class PdfGate extends Transform {
  private head = Buffer.alloc(0);
  private checked = false;
  readonly hash = createHash('sha256');
  size = 0;

  constructor(private readonly maxBytes: number) {
    super();
  }

  _transform(chunk: Buffer, _enc: BufferEncoding, done: TransformCallback) {
    this.size += chunk.length;
    if (this.size > this.maxBytes) return done(tooLarge());
    if (!this.checked) {
      this.head = Buffer.concat([this.head, chunk]);
      if (this.head.length < PDF_MAGIC.length) return done();
      if (!this.head.subarray(0, PDF_MAGIC.length).equals(PDF_MAGIC)) return done(notPdf());
      this.checked = true;
      chunk = this.head;
    }
    this.hash.update(chunk);
    done(null, chunk);
  }

  _flush(done: TransformCallback) {
    if (!this.checked) return done(notPdf());
    done();
  }
}

function notPdf() {
  return new AppError(415, 'not_a_pdf', 'Only PDF data sheets can be uploaded; this file is not a PDF.', { file: 'Not a PDF file' });
}

export function tooLarge() {
  return new AppError(413, 'too_large', 'A data sheet may be at most 25 MB.', { file: 'Larger than 25 MB' });
}

/**
 * Streams each upload straight to disk under a random name (never the client's), judging it by
 * its content; anything refused or cut off part-way is deleted before the error is reported.
 */
export function pdfStorage(uploadsDir: string, maxBytes = MAX_DATASHEET_BYTES): StorageEngine {
  return {
    _handleFile(_req: Request, file, cb) {
      const storedName = `${randomBytes(16).toString('hex')}.pdf`;
      const target = path.join(uploadsDir, storedName);
      const gate = new PdfGate(maxBytes);
      fs.mkdirSync(uploadsDir, { recursive: true });
      pipeline(file.stream, gate, fs.createWriteStream(target, { flags: 'wx' }))
        .then(() => cb(null, { storedName, sizeBytes: gate.size, sha256: gate.hash.digest('hex') } as StoredFile & Partial<Express.Multer.File>))
        .catch((err) => {
          fs.rm(target, { force: true }, () => cb(err));
        });
    },
    _removeFile(_req, file, cb) {
      const storedName = (file as unknown as StoredFile).storedName;
      if (!storedName) return cb(null);
      fs.rm(path.join(uploadsDir, storedName), { force: true }, () => cb(null));
    },
  };
}
