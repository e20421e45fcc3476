// A throwaway PostgreSQL: either the server TEST_POSTGRES_URL names, or a cluster of our own made with
// Debian's initdb in a temporary folder (run as the `postgres` user when we are root), on a free port.
// Either way each run gets a new database, created in the C locale so text sorts and LOWER() behave as
// SQLite's do, and dropped at the end.
const fs = require('node:fs');
const os = require('node:os');
const path = require('node:path');
const { execFileSync } = require('node:child_process');
const { randomBytes } = require('node:crypto');
const { Client } = require('pg');
const { freePort } = require('../server-process');

function postgresBin() {
  const root = '/usr/lib/postgresql';
  const versions = fs.existsSync(root) ? fs.readdirSync(root).filter((v) => fs.existsSync(path.join(root, v, 'bin', 'initdb'))) : [];
  if (versions.length === 0) throw new Error('PostgreSQL is not installed: apt-get install postgresql (or set TEST_POSTGRES_URL)');
  versions.sort((a, b) => Number(b) - Number(a));
  return path.join(root, versions[0], 'bin');
}

/** Runs a PostgreSQL tool as a user it accepts (it refuses root). */
function runAsOwner(tool, args) {
  const asRoot = process.getuid && process.getuid() === 0;
  const [cmd, argv] = asRoot ? ['runuser', ['-u', 'postgres', '--', tool, ...args]] : [tool, args];
  execFileSync(cmd, argv, { stdio: ['ignore', 'ignore', 'inherit'] });
}

async function startCluster() {
  const bin = postgresBin();
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'dilato-pg-'));
  fs.chmodSync(dir, 0o777);
  const dataDir = path.join(dir, 'data');
  runAsOwner(path.join(bin, 'initdb'), ['-D', dataDir, '-U', 'postgres', '--auth=trust', '-E', 'UTF8', '--locale=C']);
  // The port is free when picked but may be taken before PostgreSQL binds it (servers start beside it): try another.
  let port;
  for (let attempt = 1; ; attempt += 1) {
    port = await freePort();
    const options = `-p ${port} -k ${dir} -c listen_addresses=127.0.0.1 -c fsync=off -c synchronous_commit=off -c full_page_writes=off -c max_connections=200`;
    try {
      runAsOwner(path.join(bin, 'pg_ctl'), ['-D', dataDir, '-o', options, '-l', path.join(dir, 'log'), '-w', 'start']);
      break;
    } catch (err) {
      if (attempt >= 3) throw err;
      console.error(`[postgres] the cluster did not start on port ${port}; trying another`);
    }
  }
  return {
    url: `postgres://postgres@127.0.0.1:${port}/postgres`,
    stop: () => {
      try {
        runAsOwner(path.join(bin, 'pg_ctl'), ['-D', dataDir, '-m', 'immediate', '-w', 'stop']);
      } finally {
        fs.rmSync(dir, { recursive: true, force: true });
      }
    },
  };
}

async function withAdmin(url, work) {
  const c = new Client({ connectionString: url });
  await c.connect();
  try {
    return await work(c);
  } finally {
    await c.end();
  }
}

/** A new empty database on the given server (or on a throwaway cluster); `drop()` removes both. */
async function throwawayDatabase(serverUrl = process.env.TEST_POSTGRES_URL) {
  const cluster = serverUrl ? null : await startCluster();
  const admin = serverUrl ?? cluster.url;
  const name = `dilato_test_${randomBytes(5).toString('hex')}`;
  await withAdmin(admin, (c) => c.query(`CREATE DATABASE "${name}" TEMPLATE template0 ENCODING 'UTF8' LC_COLLATE 'C' LC_CTYPE 'C'`));
  const u = new URL(admin);
  u.pathname = `/${name}`;
  return {
    url: u.toString(),
    adminUrl: admin,
    drop: async () => {
      try {
        // The run's database and every copy the tests made of it (named after it).
        await withAdmin(admin, async (c) => {
          const { rows } = await c.query("SELECT datname FROM pg_database WHERE datname = $1 OR datname LIKE $1 || '\\_%'", [name]);
          for (const { datname } of rows) await c.query(`DROP DATABASE IF EXISTS "${datname}" WITH (FORCE)`);
        });
      } finally {
        cluster?.stop();
      }
    },
  };
}

module.exports = { throwawayDatabase };
