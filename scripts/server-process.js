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

/**
 * Starts the server with PORT=0 and answers its base URL once it says where it listens. No port is
 * picked beforehand, so nothing else starting at the same moment (a PostgreSQL cluster) can take it.
 * `showOutput` copies the server's own lines to this process's output.
 */
function startOnFreePort(env = {}, { showOutput = false, timeoutMs = 120_000 } = {}) {
  const server = startServer({ ...env, PORT: '0' }, ['ignore', 'pipe', 'inherit']);
  const listening = new Promise((resolve, reject) => {
    let seen = '';
    const timer = setTimeout(() => {
      server.kill('SIGKILL');
      reject(new Error(`the server did not say where it listens within ${timeoutMs} ms; it printed: ${seen.slice(-2000) || 'nothing'}`));
    }, timeoutMs);
    server.stdout.setEncoding('utf8');
    server.stdout.on('data', (chunk) => {
      if (showOutput) process.stdout.write(chunk);
      if (seen.length < 100_000) seen += chunk;
      const port = /listening on http:\/\/localhost:(\d+)/.exec(seen)?.[1];
      if (port) {
        clearTimeout(timer);
        resolve(`http://127.0.0.1:${port}`);
      }
    });
    server.once('exit', (code, signal) => {
      clearTimeout(timer);
      reject(new Error(`the server exited (${code ?? signal}) before it listened; it printed: ${seen.slice(-2000) || 'nothing'}`));
    });
  });
  // Later exits are the caller's business; without a handler a rejection after resolving is unhandled.
  listening.catch(() => {});
  return { server, listening };
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

module.exports = { startServer, startOnFreePort, freePort, waitForHealth };
