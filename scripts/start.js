// `npm start`: build the web app if needed, then run the server (migrations and demo seed run inside).
const { ensureWebBuild } = require('./web-build');
const { startServer } = require('./server-process');

ensureWebBuild();
const server = startServer();
for (const signal of ['SIGINT', 'SIGTERM']) process.on(signal, () => server.kill(signal));
server.on('exit', (code) => process.exit(code ?? 0));
