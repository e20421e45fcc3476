import type { RequestHandler } from 'express';
import { AppError } from './app-error';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Every state-changing request must carry an Origin header naming this server: a missing
 * or foreign Origin is refused, which stops cross-site form posts riding on the session cookie.
 */
export function requireSameOrigin(publicUrl?: string): RequestHandler {
  const allowed = publicUrl ? new URL(publicUrl).host : undefined;
  return (req, _res, next) => {
    if (SAFE_METHODS.has(req.method)) return next();
    const origin = req.headers.origin;
    let host: string | undefined;
    try {
      host = origin ? new URL(origin).host : undefined;
    } catch {
      host = undefined;
    }
    if (!host || (host !== req.headers.host && host !== allowed)) {
      return next(new AppError(403, 'foreign_origin', 'This request did not come from Dilato itself.'));
    }
    next();
  };
}
