// Starts the TypeScript server in a child node process (compiled on the fly by swc).
const path = require('node:path');
const { spawn } = require('node:child_process');

const root = path.resolve(__dirname, '..');

function startServer(env = {}, stdio = 'inherit') {
  return spawn(process.execPath, ['-r', '@swc-node/register', path.join(root, 'server', 'index.ts')], {
    cwd: root,
    stdio,
    env: { ...process.env, SWC_NODE_PROJECT: path.join(root, 'server', 'tsconfig.json'), ...env },
  });
}

module.exports = { startServer };
