// `npm run test:browser`: builds the web app if needed, starts the real server on a fresh
// database with the demo seed, and runs the Chromium tests in __tests__/browser against it.
const fs = require('node:fs');
const os = require('node:os');
const path = require('node:path');
const { spawnSync } = require('node:child_process');
const { ensureWebBuild } = require('./web-build');
const { startOnFreePort, waitForHealth } = require('./server-process');

const root = path.resolve(__dirname, '..');

async function main() {
  if (!fs.existsSync('/usr/bin/chromium')) {
    console.error('Browser tests need Debian chromium at /usr/bin/chromium: apt-get install -y chromium');
    process.exit(1);
  }
  ensureWebBuild();
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'dilato-browser-'));
  const started = Date.now();
  const { server, listening } = startOnFreePort({ DATA_DIR: dataDir, SEED_DEMO: 'true' }, { showOutput: true });
  let status = 1;
  try {
    // Pages are opened at localhost, the name a person types; the API's same-origin check follows the Host.
    const baseUrl = (await listening).replace('127.0.0.1', 'localhost');
    await waitForHealth(baseUrl, server);
    console.log(`[browser] the server answered after ${Date.now() - started} ms`);
    const jest = spawnSync(
      path.join(root, 'node_modules', '.bin', 'jest'),
      ['-c', 'jest.browser.config.js', '--runInBand', ...process.argv.slice(2)],
      // DILATO_DATA_DIR lets a test set up what no API offers (e.g. backdating a quote to test expiry).
      // The timeout ends a hung run well inside CI's limit instead of holding it to the end.
      { cwd: root, stdio: 'inherit', timeout: 20 * 60_000, env: { ...process.env, DILATO_BASE_URL: baseUrl, DILATO_DATA_DIR: dataDir } },
    );
    status = jest.status ?? 1;
  } finally {
    server.kill('SIGTERM');
    fs.rmSync(dataDir, { recursive: true, force: true });
  }
  process.exit(status);
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
