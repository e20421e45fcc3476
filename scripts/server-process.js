// Starts the TypeScript server in a child node process (compiled on the fly by swc).
const path = require('node:path');
const net = require('node:net');
const { spawn } = require('node:child_process');

const root = path.resolve(__dirname, '..');

// A server left running after its script ends keeps the test run's output open, and the run never ends.
const running = new Set();
process.on('exit', () => {
  for (const server of running) server.kill('SIGKILL');
});

function startServer(env = {}, stdio = 'inherit') {
  const server = spawn(process.execPath, ['-r', '@swc-node/register', path.join(root, 'server', 'index.ts')], {
    cwd: root,
    stdio,
    env: { ...process.env, SWC_NODE_PROJECT: path.join(root, 'server', 'tsconfig.json'), ...env },
  });
  running.add(server);
  server.once('exit', () => running.delete(server));
  return server;
}

function freePort() {
  return new Promise((resolve, reject) => {
    const srv = net.createServer();
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address();
      srv.close(() => resolve(port));
    });
    srv.on('error', reject);
  });
}

// Generous: on a two-core machine the server may start while the PostgreSQL suite holds both cores.
async function waitForHealth(url, server, timeoutMs = 120_000) {
  const started = Date.now();
  let last = 'no answer';
  while (Date.now() - started < timeoutMs) {
    if (server.exitCode !== null || server.signalCode !== null) throw new Error(`the server exited (${server.exitCode ?? server.signalCode}) before it answered`);
    try {
      const res = await fetch(`${url}/api/health`, { signal: AbortSignal.timeout(5_000) });
      if (res.ok) return Date.now() - started;
      last = `status ${res.status}`;
    } catch (err) {
      last = err.name === 'TimeoutError' ? 'no answer within 5 s' : 'not listening';
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  server.kill('SIGKILL');
  throw new Error(`the server did not answer ${url}/api/health within ${timeoutMs} ms (last try: ${last})`);
}

module.exports = { startServer, freePort, waitForHealth };
