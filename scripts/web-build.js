// Builds the web export into dist/ when it is missing or older than any client source.
const fs = require('node:fs');
const path = require('node:path');
const { spawnSync } = require('node:child_process');
const { compressWebExport } = require('./compress-web');

const root = path.resolve(__dirname, '..');
const distIndex = path.join(root, 'dist', 'index.html');
const SOURCES = ['app', 'components', 'constants', 'hooks', 'shared', 'assets', 'app.json', 'package.json', 'tsconfig.json', 'metro.config.js', 'scripts/metro'];

function newestMtime(entry) {
  const full = path.join(root, entry);
  if (!fs.existsSync(full)) return 0;
  const stat = fs.statSync(full);
  if (!stat.isDirectory()) return stat.mtimeMs;
  let newest = stat.mtimeMs;
  for (const child of fs.readdirSync(full)) newest = Math.max(newest, newestMtime(path.join(entry, child)));
  return newest;
}

function webBuildIsFresh() {
  if (!fs.existsSync(distIndex)) return false;
  const built = fs.statSync(distIndex).mtimeMs;
  return SOURCES.every((entry) => newestMtime(entry) <= built);
}

function ensureWebBuild() {
  if (webBuildIsFresh()) {
    console.log('[dilato] web app is up to date (dist/)');
    return;
  }
  console.log('[dilato] building the web app into dist/ (about a minute on first run)…');
  const started = Date.now();
  const result = spawnSync(
    path.join(root, 'node_modules', '.bin', 'expo'),
    ['export', '--platform', 'web', '--output-dir', 'dist'],
    { cwd: root, stdio: 'inherit', env: { ...process.env, EXPO_OFFLINE: '1', CI: '1', EXPO_NO_TELEMETRY: '1' } },
  );
  if (result.status !== 0) {
    console.error('[dilato] the web build failed; see the output above.');
    process.exit(result.status ?? 1);
  }
  compressWebExport(path.join(root, 'dist'));
  // The index takes the build's start time: a source saved while the build ran is newer, so the next run builds again.
  const startedAt = new Date(started);
  fs.utimesSync(distIndex, startedAt, startedAt);
  console.log(`[dilato] web app built in ${((Date.now() - started) / 1000).toFixed(1)} s`);
}

module.exports = { ensureWebBuild, webBuildIsFresh };

if (require.main === module) ensureWebBuild();
