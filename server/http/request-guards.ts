import type { Server } from 'node:http';
import type { RequestHandler } from 'express';
import { AppError } from './app-error';

/** Longer URLs than any screen of Dilato makes are refused before routing. */
export const MAX_URL_CHARS = 8 * 1024;

const CONTROL = /[\u0000-\u001f\u007f]/;

/**
 * Refuses over-long URLs (414) and control characters in the query (a NUL in a LIKE pattern ends
 * the pattern in SQLite, so a search for "\0" matched every job), in the one error shape.
 */
export const requestGuards: RequestHandler = (req, _res, next) => {
  if (req.originalUrl.length > MAX_URL_CHARS) {
    return next(new AppError(414, 'url_too_long', `The address is too long (at most ${MAX_URL_CHARS} characters).`));
  }
  const query = req.originalUrl.indexOf('?');
  if (query >= 0) {
    let text: string;
    try {
      text = decodeURIComponent(req.originalUrl.slice(query + 1).replace(/\+/g, ' '));
    } catch {
      return next(AppError.badRequest('invalid_query', 'The address has a broken %-escape.'));
    }
    if (CONTROL.test(text)) return next(AppError.badRequest('invalid_query', 'Searches and filters cannot contain control characters.'));
  }
  next();
};

/** Node answers malformed requests (e.g. headers over 16 KB: 431) itself with no body; this answers them in the error shape. */
export function answerClientErrors(server: Server): void {
  server.on('clientError', (err: NodeJS.ErrnoException, socket) => {
    if (!socket.writable) return socket.destroy();
    const tooLarge = err.code === 'HPE_HEADER_OVERFLOW';
    const status = tooLarge ? 431 : 400;
    const body = JSON.stringify({
      error: tooLarge
        ? { code: 'headers_too_large', message: 'The request headers or address are too large.' }
        : { code: 'bad_request', message: 'The request could not be read.' },
    });
    socket.end(
      `HTTP/1.1 ${status} ${tooLarge ? 'Request Header Fields Too Large' : 'Bad Request'}\r\nContent-Type: application/json; charset=utf-8\r\n` +
        `Content-Length: ${Buffer.byteLength(body)}\r\nConnection: close\r\n\r\n${body}`,
    );
  });
}
