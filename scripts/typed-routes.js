// Writes .expo/types/router.d.ts (Expo Router's typed routes) from the files in app/, the
// same declarations `expo start` writes, so that `npm run typecheck` checks every href.
const fs = require('node:fs');
const path = require('node:path');

const root = path.resolve(__dirname, '..');
const typesDir = path.join(root, '.expo', 'types');
process.env.EXPO_ROUTER_APP_ROOT = path.join(root, 'app');

const expoDir = path.dirname(require.resolve('expo/package.json', { paths: [root] }));
const cliDir = path.dirname(require.resolve('@expo/cli/package.json', { paths: [expoDir] }));
const typedRoutes = require(require.resolve('@expo/router-server/build/typed-routes', { paths: [cliDir] }));

fs.mkdirSync(typesDir, { recursive: true });
typedRoutes.regenerateDeclarations(typesDir, {});
// The declarations are written on a short timer; wait for the file before type checking.
const deadline = Date.now() + 10_000;
const wait = () => {
  if (fs.existsSync(path.join(typesDir, 'router.d.ts'))) return;
  if (Date.now() > deadline) {
    console.error('typed routes: .expo/types/router.d.ts was not written');
    process.exit(1);
  }
  setTimeout(wait, 50);
};
wait();
