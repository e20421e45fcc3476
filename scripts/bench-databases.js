// `npm run bench:databases`: alloy list and calculator requests per second on SQLite and on PostgreSQL,
// each through a real server process on this machine. Prints figures, asserts nothing.
const fs = require('node:fs');
const os = require('node:os');
const path = require('node:path');
const { freePort, startServer, waitForHealth } = require('./server-process');
const { throwawayDatabase } = require('./lib/postgres-cluster');

const REQUESTS = Number(process.env.BENCH_REQUESTS ?? 400);
const CONCURRENCY = 4;

async function serve(env) {
  const port = await freePort();
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'dilato-bench-'));
  const server = startServer({ PORT: String(port), DATA_DIR: dir, WEB_DIR: dir, ...env }, 'ignore');
  const base = `http://127.0.0.1:${port}`;
  await waitForHealth(base, server, 120_000);
  return { base, stop: () => new Promise((r) => { server.once('exit', r); server.kill('SIGTERM'); }).then(() => fs.rmSync(dir, { recursive: true, force: true })) };
}

async function rate(label, call) {
  let next = 0;
  const started = process.hrtime.bigint();
  await Promise.all(
    Array.from({ length: CONCURRENCY }, async () => {
      while (next < REQUESTS) {
        next += 1;
        const res = await call();
        if (!res.ok) throw new Error(`${label}: ${res.status}`);
        await res.arrayBuffer();
      }
    }),
  );
  return REQUESTS / (Number(process.hrtime.bigint() - started) / 1e9);
}

async function measure(base) {
  const signIn = await fetch(`${base}/api/auth/sign-in`, {
    method: 'POST',
    headers: { Origin: base, 'Content-Type': 'application/json' },
    body: JSON.stringify({ email: 'fabricator@dilato.test', password: 'dilato-demo' }),
  });
  const headers = { Origin: base, Cookie: signIn.headers.get('set-cookie').split(';')[0], 'Content-Type': 'application/json' };
  const alloys = await (await fetch(`${base}/api/alloys?search=S32100`, { headers })).json();
  const body = JSON.stringify({ alloyId: alloys.items[0].id, tube: { odMm: 76.2, wallMm: 1.651 }, installTempC: 20, segments: [{ lengthMm: 1000, startTempC: 600, endTempC: 600 }] });
  const list = await rate('alloy list', () => fetch(`${base}/api/alloys`, { headers }));
  const calc = await rate('calc', () => fetch(`${base}/api/calc/run`, { method: 'POST', headers, body }));
  return { list, calc };
}

async function main() {
  const sqlite = await serve({});
  const onSqlite = await measure(sqlite.base);
  await sqlite.stop();
  const db = await throwawayDatabase();
  try {
    const pg = await serve({ DATABASE_URL: db.url });
    const onPg = await measure(pg.base);
    await pg.stop();
    const f = (n) => n.toFixed(0).padStart(6);
    console.log(`${REQUESTS} requests each, ${CONCURRENCY} at a time, one server process`);
    console.log(`alloy list   SQLite ${f(onSqlite.list)} req/s   PostgreSQL ${f(onPg.list)} req/s   PG/SQLite ${(onPg.list / onSqlite.list).toFixed(2)}`);
    console.log(`calc (alloy) SQLite ${f(onSqlite.calc)} req/s   PostgreSQL ${f(onPg.calc)} req/s   PG/SQLite ${(onPg.calc / onSqlite.calc).toFixed(2)}`);
  } finally {
    await db.drop();
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
