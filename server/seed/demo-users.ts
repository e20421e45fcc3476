import type { DataSource } from 'typeorm';
import type { Role } from '../../shared/schemas/auth';
import { hashPassword } from '../auth/passwords';
import { UsersRepository } from '../users/users.repository';
import { randomUUID } from 'node:crypto';

export const DEMO_PASSWORD = 'dilato-demo';

/** The invented shop's people, one per role. Demo only: never seeded with SEED_DEMO=false. */
export const DEMO_USERS: { email: string; name: string; role: Role }[] = [
  { email: 'admin@dilato.test', name: 'Ines Varga', role: 'admin' },
  { email: 'engineer@dilato.test', name: 'Tomas Lindqvist-Oyelaran', role: 'engineer' },
  { email: 'fabricator@dilato.test', name: 'Rhea Castellano', role: 'fabricator' },
  { email: 'sales@dilato.test', name: 'Milo Achterberg', role: 'sales' },
];

/** Idempotent: adds only the demo users that are missing. */
export async function seedDemoUsers(dataSource: DataSource): Promise<number> {
  const users = new UsersRepository(dataSource);
  let added = 0;
  for (const demo of DEMO_USERS) {
    if (await users.findByEmail(demo.email)) continue;
    const passwordHash = await hashPassword(DEMO_PASSWORD);
    await users.save(users.create({ id: randomUUID(), ...demo, passwordHash, active: true }));
    added += 1;
  }
  return added;
}
