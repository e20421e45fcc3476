import { type ChildProcess, execFile } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { Client } from 'pg';
import request from 'supertest';
import { openPostgres } from '../../scripts/lib/migrate-databases';
import { tableChecksum, type TableReport } from '../../scripts/lib/migrate-tables';
import { DEMO_PASSWORD } from '../../server/seed/demo-users';
import type { Role } from '../../shared/schemas/auth';
import { routeFixtures, routeList, routeUrl, type RouteFixtures } from './route-list';
import { createTestApp, demoEmail, HOST, ORIGIN, signedIn, type TestApp } from './test-app';
import { testingOnPostgres } from './test-database';
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { throwawayDatabase } = require('../../scripts/lib/postgres-cluster');
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { startOnFreePort, waitForHealth } = require('../../scripts/server-process');

jest.setTimeout(180_000);

const root = path.resolve(__dirname, '..', '..');
const ROLES: Role[] = ['admin', 'engineer', 'sales', 'fabricator'];

const postgresInstalled = () =>
  Boolean(process.env.TEST_POSTGRES_URL) ||
  (fs.existsSync('/usr/lib/postgresql') && fs.readdirSync('/usr/lib/postgresql').some((v) => fs.existsSync(path.join('/usr/lib/postgresql', v, 'bin', 'initdb'))));

// The source is a SQLite file, opened in this process: the SQLite run of the suite covers it; the
// PostgreSQL run (entity column types fixed to PostgreSQL) skips it.
const runHere = !testingOnPostgres() && postgresInstalled();
if (!testingOnPostgres() && !postgresInstalled()) {
  console.warn('migrate-data test skipped: no PostgreSQL binaries (apt-get install postgresql, or set TEST_POSTGRES_URL)');
}

function migrateData(args: string[]): Promise<{ status: number; stdout: string; stderr: string }> {
  return new Promise((resolve) => {
    const env: NodeJS.ProcessEnv = { ...process.env, SWC_NODE_PROJECT: path.join(root, 'server', 'tsconfig.json') };
    delete env.DATABASE_URL;
    execFile(process.execPath, ['-r', '@swc-node/register', path.join(root, 'scripts', 'migrate-data.ts'), ...args], { cwd: root, env }, (err, stdout, stderr) =>
      resolve({ status: err ? Number((err as { code?: number }).code ?? 1) : 0, stdout, stderr }),
    );
  });
}

async function snapshot(url: string): Promise<TableReport[]> {
  const db = await openPostgres(url);
  try {
    const out: TableReport[] = [];
    for (const table of await db.tables()) out.push(await tableChecksum(db, table, await db.columns(table)));
    return out;
  } finally {
    await db.close();
  }
}

interface Answer {
  status: number;
  type: string;
  body: string;
}

// Every GET route of the API, as every role, with the fixture ids: the "lists" the two databases must answer alike.
function getUrls(t: TestApp, fixtures: RouteFixtures): string[] {
  return routeList(t.app)
    .filter((r) => r.startsWith('GET ') && r !== 'GET /api/health')
    .map((r) => routeUrl(r, fixtures));
}

(runHere ? describe : describe.skip)('npm run migrate-data from SQLite to PostgreSQL', () => {
  let t: TestApp;
  let fixtures: RouteFixtures;
  let target: { url: string; drop: () => Promise<void> };
  let dataDir: string;
  let server: ChildProcess | undefined;
  const cookies = new Map<Role, string>();

  beforeAll(async () => {
    [t, target] = await Promise.all([createTestApp({ reopenable: true, publicUrl: ORIGIN }), throwawayDatabase()]);
    dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'dilato-moved-'));
    // The demo shop plus one of everything: a job with a run, a sent and a draft quote (so mail in the outbox), a data sheet, an import.
    fixtures = await routeFixtures(t);
    // A flag that is false (the demo data has only true ones): a user who left the shop.
    const admin = await signedIn(t.app, 'admin');
    const left = await admin.post('/api/users').send({ email: 'left@example.test', name: 'Former welder', role: 'fabricator', password: 'a long enough password' });
    expect((await admin.patch(`/api/users/${left.body.user.id}`).send({ active: false })).status).toBe(200);
    // The customer's first look at the sent quote marks it viewed (a write behind a GET); done here, so the comparison reads a settled state.
    expect((await request(t.app).get(`/api/public/quotes/${fixtures.token}`).set('Host', HOST)).status).toBe(200);
    for (const role of ROLES) {
      const res = await request(t.app).post('/api/auth/sign-in').set('Host', HOST).set('Origin', ORIGIN).send({ email: demoEmail(role), password: DEMO_PASSWORD });
      cookies.set(role, String(res.headers['set-cookie']).split(';')[0]);
    }
  });

  afterAll(async () => {
    if (server) {
      server.kill('SIGTERM');
      await new Promise((r) => (server!.exitCode !== null ? r(null) : server!.once('exit', r)));
    }
    await t?.close();
    await target?.drop();
    if (dataDir) fs.rmSync(dataDir, { recursive: true, force: true });
  });

  it('copies every table and the data sheets, answers every API list alike, and refuses a second run', async () => {
    const args = ['--from', `sqlite:${t.databaseUrl}`, '--to', target.url, '--from-uploads', t.uploadsDir, '--to-uploads', path.join(dataDir, 'uploads')];
    const started = Date.now();
    const first = await migrateData(args);
    console.log(`[migrate-data] demo data plus fixtures, SQLite → PostgreSQL in ${Date.now() - started} ms (process start included)\n${first.stdout.split('\n').filter((l) => l.startsWith('[')).join('\n')}`);
    expect(first.stderr).toBe('');
    expect(first.status).toBe(0);
    expect(first.stdout).toMatch(/1 data-sheet files \(\d+ bytes\) copied/);

    const copied = await snapshot(target.url);
    const rowsOf = (table: string) => copied.find((c) => c.table === table)?.rows;
    expect(rowsOf('alloy')).toBeGreaterThan(0);
    expect(rowsOf('quote')).toBe(2);
    expect(rowsOf('datasheet')).toBe(1);
    expect(rowsOf('mail_message')).toBeGreaterThan(0);

    // A second run into the now non-empty target is refused and writes nothing.
    const second = await migrateData([...args.slice(0, 6), '--to-uploads', path.join(dataDir, 'uploads-again')]);
    expect(second.status).toBe(2);
    expect(second.stderr).toMatch(/refused: the target database .* is not empty/);
    expect(await snapshot(target.url)).toEqual(copied);
    expect(fs.existsSync(path.join(dataDir, 'uploads-again'))).toBe(false);

    const urls = getUrls(t, fixtures);
    expect(urls).toEqual(expect.arrayContaining(['/api/alloys', '/api/jobs', `/api/jobs/${fixtures.ids.job}`, '/api/quotes', '/api/flex-parts', '/api/users', '/api/weld-rules', '/api/sources', '/api/outbox']));
    // A draft is priced at the moment it is read, so its `pricedAt` is the one value that is not data.
    const answer = (url: string, status: number, type: string, body: Buffer): Answer => ({
      status,
      type,
      body: url.includes(fixtures.ids.quote) && type.startsWith('application/json') ? body.toString().replace(/"pricedAt":"[^"]*"/g, '"pricedAt":"(now)"') : body.toString('base64'),
    });
    const before = new Map<string, Answer>();
    for (const role of ROLES) {
      for (const url of urls) {
        const res = await request(t.app).get(url).set('Host', HOST).set('Cookie', cookies.get(role)!).buffer(true).parse((r, done) => {
          const chunks: Buffer[] = [];
          r.on('data', (c: Buffer) => chunks.push(c));
          r.on('end', () => done(null, Buffer.concat(chunks)));
        });
        before.set(`${role} ${url}`, answer(url, res.status, String(res.headers['content-type'] ?? ''), res.body as Buffer));
      }
    }

    // The same product on the copy, under the same public address (quote links name it): the sessions came along, so the same cookies are signed in there.
    const copyServer = startOnFreePort({ DATA_DIR: dataDir, DATABASE_URL: target.url, WEB_DIR: dataDir, PUBLIC_URL: ORIGIN }, { timeoutMs: 90_000 });
    server = copyServer.server;
    const base: string = await copyServer.listening;
    await waitForHealth(base, server, 90_000);
    const differing: string[] = [];
    for (const [key, expected] of before) {
      const [role, url] = key.split(' ');
      const res = await fetch(`${base}${url}`, { headers: { Cookie: cookies.get(role as Role)! } });
      const got = answer(url, res.status, res.headers.get('content-type') ?? '', Buffer.from(await res.arrayBuffer()));
      if (JSON.stringify(got) !== JSON.stringify(expected)) differing.push(`${key}: ${expected.status} → ${got.status}`);
    }
    expect(differing).toEqual([]);
    expect([...before.values()].filter((a) => a.status === 200).length).toBeGreaterThan(urls.length);

    // New rows on the copy come after the copied ones: the insertion-order sequences moved past the copied values.
    const headers = { Cookie: cookies.get('engineer')!, Origin: ORIGIN, 'Content-Type': 'application/json' };
    const created = await fetch(`${base}/api/jobs`, { method: 'POST', headers, body: JSON.stringify({ name: 'First job on PostgreSQL', customer: 'Test customer', application: 'Test pipework' }) });
    expect(created.status).toBe(201);
    const jobId = ((await created.json()) as { job: { id: string } }).job.id;
    const pg = new Client({ connectionString: target.url });
    await pg.connect();
    try {
      const { rows } = await pg.query('SELECT (SELECT MIN(rowid) FROM activity WHERE subject_id = $1) AS new_row, (SELECT MAX(rowid) FROM activity WHERE subject_id <> $1) AS copied', [jobId]);
      expect(Number(rows[0].new_row)).toBeGreaterThan(Number(rows[0].copied));
    } finally {
      await pg.end();
    }
  });
});
