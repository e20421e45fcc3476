import type { RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import { AppError } from './app-error';

export interface PublicLimits {
  windowMs: number;
  /** Answers of any kind per address per window. */
  perAddress: number;
  /** Refused links (unknown or expired tokens) per address per window. */
  badLinksPerAddress: number;
}

export const DEFAULT_PUBLIC_LIMITS: PublicLimits = { windowMs: 15 * 60 * 1000, perAddress: 600, badLinksPerAddress: 30 };

/**
 * The customer's link routes need no account, so they are limited per address: a customer reading
 * their quote never comes near the limits, a script trying tokens meets the second one quickly.
 */
export function publicLimiters(limits: PublicLimits): RequestHandler[] {
  const handler: RequestHandler = (req, _res, next) => {
    const reset = (req as { rateLimit?: { resetTime?: Date } }).rateLimit?.resetTime;
    const seconds = Math.max(1, Math.ceil(((reset?.getTime() ?? Date.now() + 60_000) - Date.now()) / 1000));
    const minutes = Math.ceil(seconds / 60);
    next(
      new AppError(429, 'too_many_requests', `Too many requests from this address. Try again in ${minutes} minute${minutes === 1 ? '' : 's'}.`, undefined, {
        'Retry-After': String(seconds),
      }),
    );
  };
  const common = { windowMs: limits.windowMs, standardHeaders: false as const, legacyHeaders: false, handler, validate: { trustProxy: false, xForwardedForHeader: false } };
  return [rateLimit({ ...common, limit: limits.perAddress }), rateLimit({ ...common, limit: limits.badLinksPerAddress, skipSuccessfulRequests: true })];
}
