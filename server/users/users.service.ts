import { randomUUID } from 'node:crypto';
import type { CreateUserInput, ManagedUser, UpdateUserInput } from '../../shared/schemas/users';
import type { PublicUser } from '../../shared/schemas/auth';
import { isUniqueViolation } from '../db/errors';
import { AppError } from '../http/app-error';
import { hashPassword } from '../auth/passwords';
import type { SessionCache } from '../auth/session-cache';
import type { User } from './user.entity';
import type { UsersRepository } from './users.repository';

export function toPublicUser(user: Pick<User, 'id' | 'email' | 'name' | 'role'>): PublicUser {
  return { id: user.id, email: user.email, name: user.name, role: user.role };
}

export function toManagedUser(user: User): ManagedUser {
  return { ...toPublicUser(user), active: user.active, createdAt: user.createdAt.toISOString() };
}

export class UsersService {
  constructor(
    private readonly users: UsersRepository,
    private readonly sessions: SessionCache,
  ) {}

  async list(): Promise<ManagedUser[]> {
    return (await this.users.list()).map(toManagedUser);
  }

  async create(input: CreateUserInput): Promise<ManagedUser> {
    const taken = () =>
      AppError.conflict('email_taken', 'A user with this e-mail already exists.', { email: 'A user with this e-mail already exists' });
    if (await this.users.findByEmail(input.email)) throw taken();
    const user = this.users.create({
      id: randomUUID(),
      email: input.email,
      name: input.name,
      role: input.role,
      passwordHash: await hashPassword(input.password),
      active: true,
    });
    // Hashing yields to other requests, so a second create of the same e-mail can get here too: the UNIQUE index decides.
    try {
      return toManagedUser(await this.users.insert(user));
    } catch (err) {
      if (isUniqueViolation(err)) throw taken();
      throw err;
    }
  }

  async update(id: string, input: UpdateUserInput): Promise<ManagedUser> {
    const user = await this.users.findById(id);
    if (!user) throw AppError.notFound('There is no such user.');

    const losesAdmin =
      user.role === 'admin' && user.active && ((input.role && input.role !== 'admin') || input.active === false);
    if (losesAdmin && (await this.users.countActiveAdmins()) <= 1) {
      throw AppError.badRequest('last_admin', 'Dilato needs at least one active admin; make another admin first.');
    }

    if (input.name !== undefined) user.name = input.name;
    if (input.role !== undefined) user.role = input.role;
    if (input.active !== undefined) user.active = input.active;
    if (input.password !== undefined) user.passwordHash = await hashPassword(input.password);
    const saved = await this.users.save(user);

    // A deactivated user, a changed role or a new password ends every open session at once.
    if (input.active === false || input.role !== undefined || input.password !== undefined) {
      await this.sessions.invalidateUserSessions(user.id);
    }
    return toManagedUser(saved);
  }
}
