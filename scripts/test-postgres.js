// `npm run test:postgres`: the server jest suite again, on a real PostgreSQL. Makes a throwaway
// database (on TEST_POSTGRES_URL's server, or on a throwaway cluster of Debian's PostgreSQL),
// migrates it once as the template every test app copies, runs jest with DATABASE_URL set, drops it.
// Two jest workers even on two cores: each spends much of its time waiting on the PostgreSQL server process.
const path = require('node:path');
const { spawnSync } = require('node:child_process');
const { throwawayDatabase } = require('./lib/postgres-cluster');

const root = path.resolve(__dirname, '..');

async function main() {
  const db = await throwawayDatabase();
  let status = 1;
  try {
    const env = { ...process.env, DATABASE_URL: db.url, SWC_NODE_PROJECT: path.join(root, 'server', 'tsconfig.json') };
    const migrate = spawnSync(process.execPath, ['-r', '@swc-node/register', path.join(root, 'scripts', 'lib', 'migrate-only.ts')], { cwd: root, env, stdio: 'inherit' });
    if (migrate.status !== 0) throw new Error('migrations failed on PostgreSQL');
    const started = Date.now();
    const jest = spawnSync(process.execPath, [require.resolve('jest/bin/jest'), ...(process.argv.length > 2 ? process.argv.slice(2) : ['__tests__/server/']), '--selectProjects', 'node', '--testTimeout', '30000', '--maxWorkers', '2'], {
      cwd: root,
      env,
      stdio: 'inherit',
      timeout: 20 * 60_000, // a hung run ends well inside CI's limit
    });
    console.log(`[test:postgres] server suite on PostgreSQL: ${((Date.now() - started) / 1000).toFixed(1)} s`);
    status = jest.status ?? 1;
  } finally {
    await db.drop();
  }
  process.exit(status);
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
