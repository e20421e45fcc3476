/**
 * A server for the bench, in its own process so the load client does not share its thread:
 * `product <database file> [fresh] [web dir]` runs the real app on that database (serving the web build when given); `floor` is bare Express that
 * answers each registered path with fixed bytes (parsing a JSON body first where asked); `static <web dir>` is bare Express with the
 * product's compression serving another web export (the floor of the sign-in rows).
 * Talks to the parent over IPC: it sends { port }, and answers { memory } to 'memory'.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { AddressInfo } from 'node:net';
import compression from 'compression';
import express from 'express';
import { createApp } from '../../server/app';
import { openDatabase } from '../../server/db/data-source';
import { Mailer } from '../../server/mail/mailer';
import { seed } from '../../server/seed/seed';
import { webApp } from '../../server/web/web-app';

export interface FloorRoute {
  method: 'get' | 'post';
  path: string;
  body: string;
  parseJson: boolean;
}

type Message = { type: 'memory' } | { type: 'route'; route: FloorRoute };

function reply(msg: unknown) {
  process.send!(msg);
}

function listen(app: express.Express) {
  const server = app.listen(0, '127.0.0.1', () => reply({ type: 'port', port: (server.address() as AddressInfo).port }));
  server.keepAliveTimeout = 60_000;
}

async function product(file: string, fresh: boolean, webDir?: string) {
  const ds = await openDatabase(file);
  if (fresh) await seed(ds, { demo: true, catalogue: true });
  const uploadsDir = fs.mkdtempSync(path.join(os.tmpdir(), 'dilato-bench-uploads-'));
  process.on('exit', () => fs.rmSync(uploadsDir, { recursive: true, force: true }));
  listen(createApp(ds, { uploadsDir, mailer: new Mailer('smtp://127.0.0.1:9'), webDir }));
}

function floor() {
  const app = express();
  app.disable('x-powered-by');
  const routes = new Map<string, FloorRoute>();
  app.use(express.json({ limit: '1mb' }));
  app.use((req, res) => {
    const route = routes.get(`${req.method.toLowerCase()} ${req.path}`);
    if (!route) return void res.status(404).end();
    if (route.parseJson && typeof req.body !== 'object') return void res.status(400).end();
    res.type('application/json').send(route.body);
  });
  process.on('message', (msg: Message) => {
    if (msg.type === 'route') routes.set(`${msg.route.method} ${msg.route.path}`, msg.route);
  });
  listen(app);
}

function staticFloor(webDir: string) {
  const app = express();
  app.disable('x-powered-by');
  app.use(compression());
  app.use(webApp(webDir));
  listen(app);
}

process.on('SIGINT', () => process.exit(0));
process.on('SIGTERM', () => process.exit(0));
process.on('message', (msg: Message) => {
  // After a full collection, so the figure is what the server keeps rather than garbage not yet swept.
  if (msg.type === 'memory') {
    (globalThis as { gc?: () => void }).gc?.();
    reply({ type: 'memory', memory: process.memoryUsage() });
  }
});

const [mode, file, fresh, webDir] = process.argv.slice(2);
if (mode === 'product') void product(file, fresh === 'fresh', webDir);
else if (mode === 'static') staticFloor(file);
else floor();
