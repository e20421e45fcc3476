import type { PublicUser, SignInInput } from '../../shared/schemas/auth';
import { AppError } from '../http/app-error';
import type { UsersRepository } from '../users/users.repository';
import { toPublicUser } from '../users/users.service';
import type { Auth } from './lucia';
import { verifyPassword } from './passwords';

// Hashing a throwaway password when the e-mail is unknown keeps both failures equally slow.
const UNKNOWN_USER_HASH =
  '$argon2id$v=19$m=19456,t=2,p=1$LfYEVuLo5kthFcAgNd36CQ$ONJOsvMh8LgJr9v4tV8ThUWaaHRcxRvtrDH5YFcxxDM';

export class AuthService {
  constructor(
    private readonly users: UsersRepository,
    private readonly auth: Auth,
  ) {}

  async signIn(input: SignInInput): Promise<{ user: PublicUser; sessionId: string }> {
    const user = await this.users.findByEmail(input.email);
    const ok = await verifyPassword(user?.passwordHash ?? UNKNOWN_USER_HASH, input.password);
    if (!user || !ok || !user.active) {
      throw new AppError(401, 'invalid_credentials', 'The e-mail or password is not right.');
    }
    const session = await this.auth.createSession(user.id, {});
    return { user: toPublicUser(user), sessionId: session.id };
  }

  signOut(sessionId: string) {
    return this.auth.invalidateSession(sessionId);
  }
}
