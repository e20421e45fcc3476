import type { RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import { AppError } from '../http/app-error';

export interface SignInLimits {
  windowMs: number;
  perAccount: number;
  perAddress: number;
}

export const DEFAULT_SIGN_IN_LIMITS: SignInLimits = { windowMs: 15 * 60 * 1000, perAccount: 10, perAddress: 50 };

function tooMany(resetTime: Date | undefined): AppError {
  const seconds = Math.max(1, Math.ceil(((resetTime?.getTime() ?? Date.now() + 60_000) - Date.now()) / 1000));
  const minutes = Math.ceil(seconds / 60);
  return new AppError(
    429,
    'too_many_attempts',
    `Too many failed sign-in attempts. Try again in ${minutes} minute${minutes === 1 ? '' : 's'}.`,
    undefined,
    { 'Retry-After': String(seconds) },
  );
}

/**
 * Failed sign-ins only are counted (successful ones are handed back), per account and per
 * address, so that a whole shop behind one address is not locked out by its own sign-ins.
 */
export function signInLimiters(limits: SignInLimits): RequestHandler[] {
  const common = {
    windowMs: limits.windowMs,
    skipSuccessfulRequests: true,
    standardHeaders: false as const,
    legacyHeaders: false,
    validate: { trustProxy: false, xForwardedForHeader: false },
    handler: ((req, _res, next) =>
      next(tooMany((req as { rateLimit?: { resetTime?: Date } }).rateLimit?.resetTime))) as RequestHandler,
  };
  const perAddress = rateLimit({ ...common, limit: limits.perAddress });
  const perAccount = rateLimit({
    ...common,
    limit: limits.perAccount,
    keyGenerator: (req) => {
      const email = (req.body as { email?: unknown } | undefined)?.email;
      return `account:${typeof email === 'string' ? email.trim().toLowerCase() : ''}`;
    },
  });
  return [perAddress, perAccount];
}
