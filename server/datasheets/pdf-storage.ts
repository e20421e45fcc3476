import { createHash, randomBytes } from 'node:crypto';
import { Transform, type TransformCallback } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import type { Request } from 'express';
import type { StorageEngine } from 'multer';
import { AppError } from '../http/app-error';
import type { ObjectStore } from '../storage/object-store';

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
  // Not called "size": the S3 upload would take a stream's size property for its length before any byte has passed.
  bytesSeen = 0;

  constructor(private readonly maxBytes: number) {
    super();
  }

  _transform(chunk: Buffer, _enc: BufferEncoding, done: TransformCallback) {
    this.bytesSeen += chunk.length;
    if (this.bytesSeen > this.maxBytes) return done(tooLarge());
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

function storageUnavailable() {
  return new AppError(503, 'storage_unavailable', 'The data sheet could not be stored just now; try again later.');
}

export function tooLarge() {
  return new AppError(413, 'too_large', 'A data sheet may be at most 25 MB.', { file: 'Larger than 25 MB' });
}

/**
 * Streams each upload straight into the object store under a random name (never the client's),
 * judging it by its content; anything refused or cut off part-way is deleted before the error is reported.
 */
export function pdfStorage(store: ObjectStore, maxBytes = MAX_DATASHEET_BYTES): StorageEngine {
  return {
    _handleFile(_req: Request, file, cb) {
      const storedName = `${randomBytes(16).toString('hex')}.pdf`;
      const gate = new PdfGate(maxBytes);
      let readFailed = false;
      let storeFailedFirst = false;
      const reading = pipeline(file.stream, gate).catch((err: unknown) => {
        readFailed = true;
        throw err;
      });
      const writing = store.put(storedName, gate).catch((err: unknown) => {
        storeFailedFirst = !readFailed;
        // Unread, the gate would hold the request stream still for ever. No error passed: once the
        // request has been read through, nothing listens for one on the gate any more.
        gate.destroy();
        throw err;
      });
      Promise.allSettled([reading, writing]).then(async ([read, write]) => {
        if (read.status === 'fulfilled' && write.status === 'fulfilled') {
          return cb(null, { storedName, sizeBytes: gate.bytesSeen, sha256: gate.hash.digest('hex') } as StoredFile & Partial<Express.Multer.File>);
        }
        await store.remove(storedName).catch(() => undefined);
        // The gate's own refusal (not a PDF, too large) says more than the store's report of the broken stream.
        const refusal = [read, write].find((r): r is PromiseRejectedResult => r.status === 'rejected' && r.reason instanceof AppError);
        if (refusal) return cb(refusal.reason);
        if (storeFailedFirst) {
          console.error('[dilato] could not store a data sheet:', (write as PromiseRejectedResult).reason);
          return cb(storageUnavailable());
        }
        cb(read.status === 'rejected' ? read.reason : (write as PromiseRejectedResult).reason);
      });
    },
    _removeFile(_req, file, cb) {
      const storedName = (file as unknown as StoredFile).storedName;
      if (!storedName) return cb(null);
      store.remove(storedName).then(() => cb(null), () => cb(null));
    },
  };
}
