import type { Session, User } from 'lucia';
import type { Auth } from './lucia';

/**
 * How long a validated session is believed without reading the database again. Sign-out, a
 * deactivation, a role change or a new password on this instance drop the session here at once;
 * on another instance of the same shop the old session can still be used for up to this long.
 */
export const SESSION_RECHECK_MS = 5_000;

interface Entry {
  session: Session;
  user: User;
  checkedAt: number;
}

/**
 * Validated sessions by id, re-validated against the database every few seconds (see
 * SESSION_RECHECK_MS), so a burst of requests from one browser costs one session read.
 */
export class SessionCache {
  private readonly entries = new Map<string, Entry>();
  /** Bumped by every forget: a validation that was in flight across one is not kept. */
  private epoch = 0;

  constructor(
    private readonly auth: Auth,
    private readonly recheckMs = SESSION_RECHECK_MS,
    private readonly maxEntries = 10_000,
  ) {}

  async validate(sessionId: string): Promise<{ session: Session | null; user: User | null }> {
    const now = Date.now();
    const hit = this.entries.get(sessionId);
    if (hit && now - hit.checkedAt < this.recheckMs && hit.session.expiresAt.getTime() > now) {
      return { session: { ...hit.session, fresh: false }, user: hit.user };
    }
    const epoch = this.epoch;
    const result = await this.auth.validateSession(sessionId);
    if (result.session && result.user?.active && epoch === this.epoch) {
      if (!this.entries.has(sessionId) && this.entries.size >= this.maxEntries) this.entries.delete(this.entries.keys().next().value!);
      this.entries.set(sessionId, { session: result.session, user: result.user, checkedAt: now });
    } else {
      this.entries.delete(sessionId);
    }
    return result;
  }

  forget(sessionId: string): void {
    this.epoch++;
    this.entries.delete(sessionId);
  }

  forgetUser(userId: string): void {
    this.epoch++;
    for (const [id, entry] of this.entries) if (entry.user.id === userId) this.entries.delete(id);
  }

  /** Ends one session in the database and here. */
  async invalidateSession(sessionId: string): Promise<void> {
    this.forget(sessionId);
    await this.auth.invalidateSession(sessionId);
    this.forget(sessionId);
  }

  /** Ends every session of a user in the database and here. */
  async invalidateUserSessions(userId: string): Promise<void> {
    this.forgetUser(userId);
    await this.auth.invalidateUserSessions(userId);
    this.forgetUser(userId);
  }
}
