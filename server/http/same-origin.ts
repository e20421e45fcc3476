import type { RequestHandler } from 'express';
import { AppError } from './app-error';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Every state-changing request must carry an Origin header naming this server, scheme included
 * (https://host is not http://host): a missing or foreign Origin is refused, which stops
 * cross-site form posts riding on the session cookie.
 */
export function requireSameOrigin(publicUrl?: string): RequestHandler {
  const configured = publicUrl ? new URL(publicUrl).origin : undefined;
  return (req, _res, next) => {
    if (SAFE_METHODS.has(req.method)) return next();
    let origin: string | undefined;
    try {
      origin = req.headers.origin ? new URL(req.headers.origin).origin : undefined;
    } catch {
      origin = undefined;
    }
    const own = `${req.protocol}://${req.headers.host}`;
    if (!origin || (origin !== own && origin !== configured)) {
      return next(new AppError(403, 'foreign_origin', 'This request did not come from Dilato itself.'));
    }
    next();
  };
}
