// Starts the TypeScript server in a child node process (compiled on the fly by swc).
const path = require('node:path');
const net = require('node:net');
const { spawn } = require('node:child_process');

const root = path.resolve(__dirname, '..');

function startServer(env = {}, stdio = 'inherit') {
  return spawn(process.execPath, ['-r', '@swc-node/register', path.join(root, 'server', 'index.ts')], {
    cwd: root,
    stdio,
    env: { ...process.env, SWC_NODE_PROJECT: path.join(root, 'server', 'tsconfig.json'), ...env },
  });
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

async function waitForHealth(url, server, timeoutMs = 30_000) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (server.exitCode !== null) throw new Error(`the server exited with code ${server.exitCode}`);
    try {
      const res = await fetch(`${url}/api/health`);
      if (res.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`the server did not answer ${url}/api/health within ${timeoutMs} ms`);
}

module.exports = { startServer, freePort, waitForHealth };
