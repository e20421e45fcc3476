import type { RequestHandler } from 'express';
import { rateLimit, type IncrementResponse, type Store } from 'express-rate-limit';
import type { RateLimiterAbstract } from 'rate-limiter-flexible';
import type { Counters } from '../db/shared-counters';
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
export function publicLimiters(limits: PublicLimits, counters: Counters): RequestHandler[] {
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
  const seconds = Math.ceil(limits.windowMs / 1000);
  return [
    rateLimit({ ...common, limit: limits.perAddress, store: new CounterStore(counters('public_any', limits.perAddress, seconds)) }),
    rateLimit({ ...common, limit: limits.badLinksPerAddress, skipSuccessfulRequests: true, store: new CounterStore(counters('public_bad_link', limits.badLinksPerAddress, seconds)) }),
  ];
}

/** express-rate-limit's store on a shared counter, so every app instance counts an address together. */
class CounterStore implements Store {
  /** Names this store's keys apart from the other limiter's (express-rate-limit checks for double counting by it). */
  readonly prefix: string;

  constructor(private readonly counter: RateLimiterAbstract) {
    this.prefix = `${counter.keyPrefix}:`;
  }

  async increment(key: string): Promise<IncrementResponse> {
    const res = await this.counter.penalty(key, 1);
    return { totalHits: res.consumedPoints, resetTime: new Date(Date.now() + res.msBeforeNext) };
  }

  async decrement(key: string): Promise<void> {
    await this.counter.reward(key, 1);
  }

  async resetKey(key: string): Promise<void> {
    await this.counter.delete(key);
  }
}
