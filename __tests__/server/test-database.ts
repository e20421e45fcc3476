import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { Client } from 'pg';
import type { DataSource } from 'typeorm';
import { databaseKind } from '../../server/db/column-types';
import { openDatabase } from '../../server/db/data-source';

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
 * file when `reopenable`); with
 * DATABASE_URL=postgres://… (set by `scripts/test-postgres.js`) a new PostgreSQL database copied
 * from the already-migrated one that URL names, dropped again on close.
 */
export async function openTestDatabase(options: { reopenable?: boolean } = {}): Promise<TestDatabase> {
  if (!testingOnPostgres()) {
    // A file only where the test opens it a second time; ':memory:' dies with its connection.
    const dir = options.reopenable ? fs.mkdtempSync(path.join(os.tmpdir(), 'dilato-db-')) : null;
    const url = dir ? path.join(dir, 'dilato.sqlite') : ':memory:';
    const dataSource = await openDatabase(url);
    return {
      dataSource,
      url,
      close: async () => {
        if (dataSource.isInitialized) await dataSource.destroy();
        if (dir) fs.rmSync(dir, { recursive: true, force: true });
      },
    };
  }
  const template = process.env.DATABASE_URL!;
  const name = `dilato_t_${process.pid}_${randomBytes(4).toString('hex')}`;
  const templateName = new URL(template).pathname.slice(1);
  await asAdmin(template, (c) => c.query(`CREATE DATABASE "${name}" TEMPLATE "${templateName}"`));
  const u = new URL(template);
  u.pathname = `/${name}`;
  const url = u.toString();
  const dataSource = await openDatabase(url);
  return {
    dataSource,
    url,
    close: async () => {
      if (dataSource.isInitialized) await dataSource.destroy();
      await asAdmin(template, (c) => c.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`));
    },
  };
}
