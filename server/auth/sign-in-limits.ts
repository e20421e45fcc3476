import { createHash } from 'node:crypto';
import { ipKeyGenerator } from 'express-rate-limit';
import type { RateLimiterAbstract } from 'rate-limiter-flexible';
import type { Counters } from '../db/shared-counters';
import { AppError } from '../http/app-error';

export interface SignInLimits {
  windowMs: number;
  /** Failures for one account from one address before that pair is refused (unless the address is the owner's). */
  perPair: number;
  /** Failures from one address, over all accounts, before strangers there are refused. */
  perAddress: number;
  /** Failures for one account from addresses its owner has never used, before all of them are refused. */
  perAccount: number;
  /** Failures of one account and address before each further try waits, doubling up to `maxDelayMs`. */
  slowAfter: number;
  baseDelayMs: number;
  maxDelayMs: number;
}

export const DEFAULT_SIGN_IN_LIMITS: SignInLimits = {
  windowMs: 15 * 60 * 1000,
  perPair: 10,
  perAddress: 100,
  perAccount: 30,
  slowAfter: 3,
  baseDelayMs: 500,
  maxDelayMs: 8000,
};

/** An address as the counters and the known-address list key it: IPv6 by its /56 block, then hashed. */
export function addressHash(ip: string | undefined): string {
  return createHash('sha256').update(ipKeyGenerator(ip ?? 'unknown')).digest('hex');
}

const minutes = (ms: number) => Math.max(1, Math.ceil(ms / 60_000));

function refused(ms: number, why: string): AppError {
  const m = minutes(ms);
  return new AppError(429, 'too_many_attempts', `${why} Try again in ${m} minute${m === 1 ? '' : 's'}.`, undefined, {
    'Retry-After': String(Math.max(1, Math.ceil(ms / 1000))),
  });
}

export interface Attempt {
  email: string;
  address: string;
  /** The account's owner has signed in from this address before. */
  known: boolean;
}

/**
 * Counts failed sign-ins by account and address together. At an address the owner has used,
 * failures only slow each next try down, so nobody can lock the owner out from elsewhere; from
 * strange addresses they are refused, per account-and-address, per address, and per account.
 */
export class SignInLimiter {
  private readonly pair: RateLimiterAbstract;
  private readonly address: RateLimiterAbstract;
  private readonly account: RateLimiterAbstract;

  constructor(
    readonly limits: SignInLimits,
    counters: Counters,
    private readonly sleep: (ms: number) => Promise<void> = (ms) => new Promise((r) => setTimeout(r, ms)),
  ) {
    const duration = Math.ceil(limits.windowMs / 1000);
    this.pair = counters('sign_in_pair', limits.perPair, duration);
    this.address = counters('sign_in_address', limits.perAddress, duration);
    this.account = counters('sign_in_account', limits.perAccount, duration);
  }

  private pairKey = (a: Attempt) => `${a.email}|${a.address}`;

  /** Before the password is checked: waits (known address) or refuses (strangers over a limit). */
  async admit(a: Attempt): Promise<void> {
    const pair = await this.pair.get(this.pairKey(a));
    const failures = pair?.consumedPoints ?? 0;
    if (a.known) {
      if (failures >= this.limits.slowAfter) {
        await this.sleep(Math.min(this.limits.maxDelayMs, this.limits.baseDelayMs * 2 ** (failures - this.limits.slowAfter)));
      }
      return;
    }
    if (pair && failures >= this.limits.perPair) {
      throw refused(pair.msBeforeNext, 'Too many failed sign-ins for this account from this address. If it is your account, sign in from a device or place you have used before, or ask an admin for a new password.');
    }
    const address = await this.address.get(a.address);
    if (address && address.consumedPoints >= this.limits.perAddress) {
      throw refused(address.msBeforeNext, 'Too many failed sign-ins from this address. People who have signed in from here before can still sign in.');
    }
    const account = await this.account.get(a.email);
    if (account && account.consumedPoints >= this.limits.perAccount) {
      throw refused(account.msBeforeNext, 'This account has had too many failed sign-ins from unfamiliar addresses. Sign in from a device or place you have used before.');
    }
  }

  /** Counts a failure; says whether it just closed a strange address to the account (worth telling the owner). */
  async failed(a: Attempt): Promise<{ blockedNow: boolean; failures: number }> {
    const pair = await this.pair.penalty(this.pairKey(a), 1);
    await this.address.penalty(a.address, 1);
    if (a.known) return { blockedNow: false, failures: pair.consumedPoints };
    const account = await this.account.penalty(a.email, 1);
    const blockedNow = pair.consumedPoints === this.limits.perPair || account.consumedPoints === this.limits.perAccount;
    return { blockedNow, failures: Math.max(pair.consumedPoints, account.consumedPoints) };
  }

  async succeeded(a: Attempt): Promise<void> {
    await this.pair.delete(this.pairKey(a));
  }
}
