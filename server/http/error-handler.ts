import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';
import { fieldsFromZodError } from '../../shared/schemas/field-errors';
import { isUniqueViolation } from '../db/errors';
import type { ApiErrorBody } from '../../shared/schemas/api-error';
import { AppError } from './app-error';

function send(res: Parameters<RequestHandler>[1], status: number, body: ApiErrorBody) {
  res.status(status).json(body);
}

export const apiNotFound: RequestHandler = (req, res) => {
  send(res, 404, { error: { code: 'not_found', message: `There is no API route ${req.method} ${req.path}.` } });
};

/** Writes every failure in the one error shape; stacks stay in the server log. */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  if (res.headersSent) {
    res.end();
    return;
  }
  if (err instanceof AppError) {
    for (const [name, value] of Object.entries(err.headers ?? {})) res.setHeader(name, value);
    send(res, err.status, {
      error: { code: err.code, message: err.message, ...(err.fields ? { fields: err.fields } : {}), ...(err.words ? { words: err.words } : {}) },
    });
    return;
  }
  // Safety nets: a schema applied without parseBody, or a race that only the database saw.
  if (err instanceof ZodError) {
    send(res, 400, { error: { code: 'invalid_input', message: 'Some values need attention.', fields: fieldsFromZodError(err) } });
    return;
  }
  if (isUniqueViolation(err)) {
    send(res, 409, { error: { code: 'conflict', message: 'This clashes with a record that already exists; reload and try again.' } });
    return;
  }
  const type = (err as { type?: string }).type;
  const status = (err as { status?: number }).status;
  if (type === 'entity.parse.failed') {
    send(res, 400, { error: { code: 'invalid_json', message: 'The request body is not valid JSON.' } });
    return;
  }
  if (type === 'entity.too.large' || status === 413) {
    send(res, 413, { error: { code: 'too_large', message: 'The request is too large: a request body may be at most 1 MB.' } });
    return;
  }
  if (typeof status === 'number' && status >= 400 && status < 500) {
    send(res, status, { error: { code: 'bad_request', message: 'The request could not be read.' } });
    return;
  }
  console.error(`[dilato] ${req.method} ${req.originalUrl} failed:`, err);
  send(res, 500, { error: { code: 'server_error', message: 'Something went wrong on the server. Try again.' } });
};
