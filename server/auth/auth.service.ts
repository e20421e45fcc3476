import type { PublicUser, SignInInput } from '../../shared/schemas/auth';
import { AppError } from '../http/app-error';
import type { Mailer } from '../mail/mailer';
import type { UsersRepository } from '../users/users.repository';
import { toPublicUser } from '../users/users.service';
import type { KnownAddressesRepository } from './known-addresses.repository';
import type { Auth } from './lucia';
import type { SessionCache } from './session-cache';
import { verifyPassword } from './passwords';
import { addressHash, type SignInLimiter } from './sign-in-limits';
import { strangerSignInMail } from './sign-in-notice';

// Hashing a throwaway password when the e-mail is unknown keeps both failures equally slow.
const UNKNOWN_USER_HASH =
  '$argon2id$v=19$m=19456,t=2,p=1$LfYEVuLo5kthFcAgNd36CQ$ONJOsvMh8LgJr9v4tV8ThUWaaHRcxRvtrDH5YFcxxDM';

export class AuthService {
  constructor(
    private readonly users: UsersRepository,
    private readonly auth: Auth,
    private readonly sessions: SessionCache,
    private readonly limiter: SignInLimiter,
    private readonly addresses: KnownAddressesRepository,
    private readonly mailer?: Mailer,
  ) {}

  /** `ip` is the caller's address as express sees it (through the trusted proxy hops only). */
  async signIn(input: SignInInput, ip: string | undefined): Promise<{ user: PublicUser; sessionId: string }> {
    const user = await this.users.findByEmail(input.email);
    const address = addressHash(ip);
    const attempt = { email: input.email, address, known: user ? await this.addresses.isKnown(user.id, address) : false };
    await this.limiter.admit(attempt);
    const ok = await verifyPassword(user?.passwordHash ?? UNKNOWN_USER_HASH, input.password);
    if (!user || !ok || !user.active) {
      const { blockedNow, failures } = await this.limiter.failed(attempt);
      if (blockedNow && user?.active) await this.tellOwner(user, failures);
      // Only someone who knows the password learns that the account exists and is switched off.
      if (user && ok) throw new AppError(403, 'account_inactive', await this.inactiveMessage());
      throw new AppError(401, 'invalid_credentials', 'The e-mail or password is not right.');
    }
    await this.limiter.succeeded(attempt);
    await this.addresses.remember(user.id, address);
    const session = await this.auth.createSession(user.id, {});
    return { user: toPublicUser(user), sessionId: session.id };
  }

  private async inactiveMessage(): Promise<string> {
    const admins = (await this.users.activeAdmins()).map((a) => a.name);
    const whom = admins.length > 0 ? `your shop's Dilato admin (${admins.join(' or ')})` : "your shop's Dilato admin";
    return `This account is switched off, so it cannot sign in. Ask ${whom} to switch it back on.`;
  }

  /** Once, when a strange address is shut out of the account; a mail failure never changes the answer. */
  private async tellOwner(user: { email: string; name: string }, failures: number) {
    const mail = strangerSignInMail({ to: user.email, name: user.name, failures, minutes: Math.ceil(this.limiter.limits.windowMs / 60_000) });
    await this.mailer?.send(mail).catch((err: unknown) => console.error('[dilato] could not tell the owner about failed sign-ins:', err));
  }

  signOut(sessionId: string) {
    return this.sessions.invalidateSession(sessionId);
  }
}
