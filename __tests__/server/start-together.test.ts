import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { ChildProcess } from 'node:child_process';
import { Client } from 'pg';
import catalogue from '../../data/seed/catalogue.json';
import weldRules from '../../data/seed/weld-rules.json';
import { DEMO_USERS } from '../../server/seed/demo-users';
import { openEmptyPostgresDatabase, testingOnPostgres } from './test-database';
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { startOnFreePort, waitForHealth } = require('../../scripts/server-process');

jest.setTimeout(180_000);

const INSTANCES = 3;

// Several instances behind a load balancer, all started at once on a database that has nothing yet.
(testingOnPostgres() ? describe : describe.skip)('instances started together on an empty PostgreSQL database', () => {
  let empty: { url: string; close: () => Promise<void> };
  const servers: ChildProcess[] = [];
  const dirs: string[] = [];

  beforeAll(async () => {
    empty = await openEmptyPostgresDatabase();
  });

  afterAll(async () => {
    for (const s of servers) s.kill('SIGTERM');
    await Promise.all(servers.map((s) => new Promise((r) => (s.exitCode !== null || s.signalCode !== null ? r(null) : s.once('exit', r)))));
    await empty.close();
    for (const d of dirs) fs.rmSync(d, { recursive: true, force: true });
  });

  it('when they start at the same moment, then every one comes up and the schema and seed are there exactly once', async () => {
    const bases = await Promise.all(
      Array.from({ length: INSTANCES }, async () => {
        const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'dilato-together-'));
        dirs.push(dir);
        const { server, listening } = startOnFreePort({ DATA_DIR: dir, DATABASE_URL: empty.url, SEED_DEMO: 'true', WEB_DIR: dir });
        servers.push(server);
        const base: string = await listening;
        await waitForHealth(base, server, 120_000);
        return base;
      }),
    );
    expect(bases).toHaveLength(INSTANCES);

    const c = new Client({ connectionString: empty.url });
    await c.connect();
    try {
      const migrations = await c.query<{ name: string; n: string }>('SELECT name, COUNT(*) AS n FROM migrations GROUP BY name');
      expect(migrations.rows.length).toBeGreaterThan(20);
      expect(migrations.rows.filter((r) => Number(r.n) !== 1)).toEqual([]);
      const count = async (table: string) => Number((await c.query(`SELECT COUNT(*) AS n FROM ${table}`)).rows[0].n);
      // The counts the seed files and the demo list give, each once.
      expect(await count('alloy')).toBe(catalogue.alloys.length);
      expect(await count('app_user')).toBe(DEMO_USERS.length);
      expect(await count('weld_rule')).toBe(weldRules.rules.length);
    } finally {
      await c.end();
    }
  });
});
