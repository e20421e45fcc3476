// `npm run test:crash`: kills the real server with SIGKILL while concurrent writers create and change
// jobs and runs, restarts it on the same data, and checks that every write it acknowledged is there
// and that SQLite's integrity check passes. Exits non-zero on any loss.
const fs = require('node:fs');
const os = require('node:os');
const path = require('node:path');
const Database = require('better-sqlite3');
const { startOnFreePort, waitForHealth } = require('./server-process');

const ROUNDS = Number(process.env.CRASH_ROUNDS ?? 3);
const WRITERS = 8;
const WRITE_MS = 1500;
const ACCOUNTS = ['fabricator@dilato.test', 'engineer@dilato.test', 'admin@dilato.test'];

async function signIn(base, email) {
  const res = await fetch(`${base}/api/auth/sign-in`, {
    method: 'POST',
    headers: { Origin: base, 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password: 'dilato-demo' }),
  });
  if (!res.ok) throw new Error(`sign-in as ${email}: ${res.status}`);
  return res.headers.get('set-cookie').split(';')[0];
}

function api(base, cookie) {
  return async (method, url, body) => {
    const res = await fetch(`${base}/api${url}`, {
      method,
      headers: { Origin: base, Cookie: cookie, 'Content-Type': 'application/json' },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    return { status: res.status, body: res.status === 204 ? null : await res.json() };
  };
}

/** One writer: creates jobs, adds runs and renumbers notes until the server dies; returns what was acknowledged. */
async function writer(call, round, n, alloyId, acked) {
  for (let i = 0; ; i += 1) {
    try {
      const name = `crash r${round} w${n} #${i}`;
      const job = await call('POST', '/jobs', { name, customer: 'Crash test', application: 'Durability' });
      if (job.status !== 201) throw new Error(`create job answered ${job.status}`);
      acked.jobs.set(job.body.job.id, { name, notesRev: -1 });
      const run = await call('POST', `/jobs/${job.body.job.id}/runs`, {
        name: `run ${i}`,
        alloyId,
        tube: { odMm: 76.2, wallMm: 1.651 },
        segments: [{ lengthMm: 1000, startTempC: 600, endTempC: 600 }],
      });
      if (run.status !== 201) throw new Error(`create run answered ${run.status}`);
      acked.runs.set(run.body.run.id, job.body.job.id);
      for (let rev = 0; rev < 3; rev += 1) {
        const patch = await call('PATCH', `/jobs/${job.body.job.id}`, { notes: `rev-${rev}` });
        if (patch.status !== 200) throw new Error(`patch answered ${patch.status}`);
        acked.jobs.get(job.body.job.id).notesRev = rev;
      }
    } catch (err) {
      if (acked.dead) return;
      throw err;
    }
  }
}

const exited = (server) =>
  server.exitCode !== null || server.signalCode !== null ? Promise.resolve() : new Promise((r) => server.once('exit', r));

async function main() {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'dilato-crash-'));
  const env = { DATA_DIR: dataDir, SEED_DEMO: 'true', WEB_DIR: path.join(dataDir, 'no-web') };
  const acked = { jobs: new Map(), runs: new Map(), dead: false };
  let problems = 0;
  try {
    for (let round = 1; round <= ROUNDS; round += 1) {
      const started = Date.now();
      const { server, listening } = startOnFreePort(env);
      const base = await listening;
      await waitForHealth(base, server);
      console.log(`[crash] round ${round}: the server answered after ${Date.now() - started} ms`);
      const cookies = await Promise.all(ACCOUNTS.map((email) => signIn(base, email)));
      const call0 = api(base, cookies[0]);
      const alloyId = (await call0('GET', '/alloys?search=S32100')).body.items[0].id;
      acked.dead = false;
      const writers = Array.from({ length: WRITERS }, (_, n) => writer(api(base, cookies[n % cookies.length]), round, n, alloyId, acked));
      await new Promise((r) => setTimeout(r, WRITE_MS));
      acked.dead = true;
      const gone = exited(server);
      server.kill('SIGKILL');
      await Promise.all([gone, ...writers]);
      console.log(`[crash] round ${round}: SIGKILL with ${WRITERS} writers; ${acked.jobs.size} jobs and ${acked.runs.size} runs acknowledged so far`);
    }

    const { server, listening } = startOnFreePort(env);
    const base = await listening;
    await waitForHealth(base, server);
    const call = api(base, await signIn(base, ACCOUNTS[0]));
    let lost = 0;
    for (const [id, { name, notesRev }] of acked.jobs) {
      const res = await call('GET', `/jobs/${id}`);
      const rev = res.status === 200 ? Number((res.body.job.notes.match(/^rev-(\d+)$/) ?? [])[1] ?? -1) : -2;
      if (res.status !== 200 || res.body.job.name !== name || rev < notesRev) {
        lost += 1;
        console.error(`[crash] lost: job ${name} (${res.status}, notes ${res.body?.job?.notes}, acknowledged rev-${notesRev})`);
      }
    }
    for (const [id, jobId] of acked.runs) {
      const res = await call('GET', `/runs/${id}`);
      if (res.status !== 200 || res.body.run.jobId !== jobId) {
        lost += 1;
        console.error(`[crash] lost: run ${id} (${res.status})`);
      }
    }
    const gone = exited(server);
    server.kill('SIGTERM');
    await gone;
    const db = new Database(path.join(dataDir, 'dilato.sqlite'), { readonly: true });
    const integrity = db.pragma('integrity_check', { simple: true });
    db.close();
    const patches = [...acked.jobs.values()].reduce((sum, j) => sum + j.notesRev + 1, 0);
    const writes = acked.jobs.size + acked.runs.size + patches;
    console.log(
      `[crash] ${ROUNDS} SIGKILL rounds: ${writes} acknowledged writes (${acked.jobs.size} jobs, ${acked.runs.size} runs, ${patches} edits), ${lost} lost; integrity_check: ${integrity}`,
    );
    if (writes === 0) problems += 1;
    if (lost > 0 || integrity !== 'ok') problems += 1;
    console.log(`${problems === 0 ? 1 : 0} passed, ${problems === 0 ? 0 : 1} failed`);
  } finally {
    fs.rmSync(dataDir, { recursive: true, force: true });
  }
  process.exit(problems === 0 ? 0 : 1);
}

// A run takes well under a minute; one that hangs ends here rather than at CI's limit.
setTimeout(() => {
  console.error('[crash] still running after 5 minutes: stopped');
  process.exit(1);
}, 5 * 60_000).unref();

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
