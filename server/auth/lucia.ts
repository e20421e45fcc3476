import { BetterSqlite3Adapter } from '@lucia-auth/adapter-sqlite';
import { NodePostgresAdapter } from '@lucia-auth/adapter-postgresql';
import { Lucia, TimeSpan } from 'lucia';
import type { DataSource } from 'typeorm';
import { isPostgres, rawDatabase, rawPool } from '../db/data-source';
import type { Role } from '../../shared/schemas/auth';

interface UserColumns {
  email: string;
  name: string;
  role: Role;
  active: number | boolean;
}

export function createLucia(dataSource: DataSource) {
  const tables = { user: 'app_user', session: 'user_session' };
  const adapter = isPostgres(dataSource) ? new NodePostgresAdapter(rawPool(dataSource), tables) : new BetterSqlite3Adapter(rawDatabase(dataSource), tables);
  return new Lucia(adapter, {
    sessionExpiresIn: new TimeSpan(14, 'd'),
    sessionCookie: {
      name: 'dilato_session',
      // Secure is decided per request (HTTPS or not) where the cookie is written.
      attributes: { sameSite: 'lax', secure: false },
    },
    getUserAttributes: (columns) => {
      const c = columns as unknown as UserColumns;
      return { email: c.email, name: c.name, role: c.role, active: Boolean(c.active) };
    },
  });
}

export type Auth = ReturnType<typeof createLucia>;

declare module 'lucia' {
  interface Register {
    Lucia: Auth;
    DatabaseUserAttributes: UserColumns;
  }
}
