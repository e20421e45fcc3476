import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { Client } from 'pg';
import type { DataSource } from 'typeorm';
import { databaseKind } from '../../server/db/column-types';
import { openDatabase } from '../../server/db/data-source';
import { seed, type SeedOptions } from '../../server/seed/seed';

export interface TestDatabase {
  dataSource: DataSource;
  /** The URL or path it was opened from (for a second process on the same database). */
  url: string;
  close: () => Promise<void>;
}

export const testingOnPostgres = () => databaseKind() === 'postgres';

/** `describe` on one database only (SQLite-file checks, for instance); skipped on the other. */
export const onSqliteOnly = (): jest.Describe => (testingOnPostgres() ? describe.skip : describe);

function adminUrl(url: string): string {
  const u = new URL(url);
  u.pathname = '/postgres';
  return u.toString();
}

async function asAdmin<T>(url: string, work: (c: Client) => Promise<T>): Promise<T> {
  const c = new Client({ connectionString: adminUrl(url) });
  await c.connect();
  try {
    return await work(c);
  } finally {
    await c.end();
  }
}

/**
 * A fresh, migrated database of its own for one test app: in-memory SQLite by default (a temporary
 * file when `reopenable`); with DATABASE_URL=postgres://… (set by `scripts/test-postgres.js`) a new
 * PostgreSQL database copied from a template, dropped again on close. With `seed`, the database comes
 * seeded so: on PostgreSQL the template already holds that seed (one template per seed choice, made
 * once per run), since seeding row by row over the network for every test would dominate the run.
 */
export async function openTestDatabase(options: { reopenable?: boolean; seed?: SeedOptions } = {}): Promise<TestDatabase> {
  if (!testingOnPostgres()) {
    // A file only where the test opens it a second time; ':memory:' dies with its connection.
    const dir = options.reopenable ? fs.mkdtempSync(path.join(os.tmpdir(), 'dilato-db-')) : null;
    const url = dir ? path.join(dir, 'dilato.sqlite') : ':memory:';
    const dataSource = await openDatabase(url);
    if (options.seed) await seed(dataSource, options.seed);
    return {
      dataSource,
      url,
      close: async () => {
        if (dataSource.isInitialized) await dataSource.destroy();
        if (dir) fs.rmSync(dir, { recursive: true, force: true });
      },
    };
  }
  const base = process.env.DATABASE_URL!;
  const template = options.seed ? await seededTemplate(base, options.seed) : databaseName(base);
  const name = `${databaseName(base)}_t_${process.pid}_${randomBytes(4).toString('hex')}`;
  await copyDatabase(base, template, name);
  const url = withDatabase(base, name);
  const dataSource = await openDatabase(url);
  return {
    dataSource,
    url,
    close: async () => {
      if (dataSource.isInitialized) await dataSource.destroy();
      await asAdmin(base, (c) => c.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`));
    },
  };
}

/** A PostgreSQL database with nothing in it (not even migrations), on the run's server; dropped on close. */
export async function openEmptyPostgresDatabase(): Promise<{ url: string; close: () => Promise<void> }> {
  const base = process.env.DATABASE_URL!;
  const name = `${databaseName(base)}_empty_${process.pid}_${randomBytes(4).toString('hex')}`;
  await asAdmin(base, (c) => c.query(`CREATE DATABASE "${name}" TEMPLATE template0 ENCODING 'UTF8' LC_COLLATE 'C' LC_CTYPE 'C'`));
  return {
    url: withDatabase(base, name),
    close: () => asAdmin(base, (c) => c.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`)).then(() => undefined),
  };
}

const databaseName = (url: string) => new URL(url).pathname.slice(1);
function withDatabase(url: string, name: string): string {
  const u = new URL(url);
  u.pathname = `/${name}`;
  return u.toString();
}

/** CREATE DATABASE … TEMPLATE, again while the template's last connection is still closing. */
async function copyDatabase(base: string, template: string, name: string): Promise<void> {
  for (let attempt = 0; ; attempt += 1) {
    try {
      await asAdmin(base, (c) => c.query(`CREATE DATABASE "${name}" TEMPLATE "${template}" STRATEGY FILE_COPY`));
      return;
    } catch (err) {
      // 55006: the template is being accessed by other users.
      if ((err as { code?: string }).code !== '55006' || attempt >= 50) throw err;
      await new Promise((r) => setTimeout(r, 100));
    }
  }
}

/** The run's migrated database, seeded once per seed choice; jest workers take turns through an advisory lock. */
async function seededTemplate(base: string, options: SeedOptions): Promise<string> {
  const name = `${databaseName(base)}_seed_${options.demo ? 'demo' : 'nodemo'}_${options.catalogue === false ? 'nocat' : 'cat'}`;
  await asAdmin(base, async (c) => {
    await c.query('SELECT pg_advisory_lock(1764601)');
    try {
      const found = await c.query('SELECT 1 FROM pg_database WHERE datname = $1', [name]);
      if (found.rowCount) return;
      const building = `${name}_building`;
      await c.query(`DROP DATABASE IF EXISTS "${building}" WITH (FORCE)`);
      await copyDatabase(base, databaseName(base), building);
      const ds = await openDatabase(withDatabase(base, building));
      await seed(ds, options);
      await ds.destroy();
      await c.query(`ALTER DATABASE "${building}" RENAME TO "${name}"`);
    } finally {
      await c.query('SELECT pg_advisory_unlock(1764601)');
    }
  });
  return name;
}
