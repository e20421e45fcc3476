import { fork, type ChildProcess } from 'node:child_process';
import http from 'node:http';
import path from 'node:path';
import type { FloorRoute } from './bench-child';

export interface Req {
  method: 'GET' | 'POST';
  path: string;
  body?: string;
  headers?: Record<string, string>;
}

export interface Target {
  base: string;
  port: number;
  child: ChildProcess;
}

const agent = new http.Agent({ keepAlive: true, maxSockets: 64 });

/** One request on a keep-alive socket; resolves with the status and the body bytes. */
export function send(port: number, req: Req): Promise<{ status: number; body: Buffer; headers: http.IncomingHttpHeaders }> {
  return new Promise((resolve, reject) => {
    const r = http.request(
      { host: '127.0.0.1', port, method: req.method, path: req.path, agent, headers: { Host: `127.0.0.1:${port}`, ...(req.body ? { 'Content-Type': 'application/json' } : {}), ...req.headers } },
      (res) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => resolve({ status: res.statusCode ?? 0, body: Buffer.concat(chunks), headers: res.headers }));
      },
    );
    r.on('error', reject);
    r.end(req.body);
  });
}

/** Requests per second with `concurrency` requests always in flight for `ms`. */
export async function throughput(port: number, req: Req, ms: number, concurrency = 8): Promise<number> {
  let done = 0;
  const end = performance.now() + ms;
  const start = performance.now();
  await Promise.all(
    Array.from({ length: concurrency }, async () => {
      while (performance.now() < end) {
        const res = await send(port, req);
        if (res.status >= 400) throw new Error(`${req.method} ${req.path} answered ${res.status}: ${res.body.toString().slice(0, 200)}`);
        done++;
      }
    }),
  );
  return (done * 1000) / (performance.now() - start);
}

/** One request's time, in ms. */
export async function latency(port: number, req: Req): Promise<number> {
  const t = performance.now();
  const res = await send(port, req);
  if (res.status >= 400) throw new Error(`${req.method} ${req.path} answered ${res.status}`);
  return performance.now() - t;
}

export const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length % 2 ? s[(s.length - 1) / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2;
};

/** Starts a bench server process (see bench-child.ts) and waits for its port. */
export function startChild(args: string[]): Promise<Target> {
  const child = fork(path.join(__dirname, 'bench-child.ts'), args, {
    execArgv: ['-r', '@swc-node/register', '--expose-gc', ...(process.env.PROF ? ['--cpu-prof', '--cpu-prof-dir=/tmp/dilato-prof'] : [])],
    env: { ...process.env, SWC_NODE_PROJECT: 'server/tsconfig.json', NODE_ENV: 'production' },
    stdio: ['ignore', 'ignore', 'inherit', 'ipc'],
  });
  return new Promise((resolve, reject) => {
    child.once('error', reject);
    child.once('exit', (code) => reject(new Error(`bench server exited with ${code}`)));
    child.on('message', (msg: { type: string; port?: number }) => {
      if (msg.type === 'port') resolve({ base: `http://127.0.0.1:${msg.port}`, port: msg.port!, child });
    });
  });
}

export function memoryOf(target: Target): Promise<NodeJS.MemoryUsage> {
  return new Promise((resolve) => {
    const onMessage = (msg: { type: string; memory?: NodeJS.MemoryUsage }) => {
      if (msg.type !== 'memory') return;
      target.child.off('message', onMessage);
      resolve(msg.memory!);
    };
    target.child.on('message', onMessage);
    target.child.send({ type: 'memory' });
  });
}

export function addFloorRoute(target: Target, route: FloorRoute) {
  target.child.send({ type: 'route', route });
}

export function stop(target: Target) {
  target.child.removeAllListeners('exit');
  target.child.kill('SIGTERM');
}

/** Signs in as a demo user; returns the session cookie. */
export async function signIn(target: Target, email: string): Promise<string> {
  const res = await send(target.port, {
    method: 'POST',
    path: '/api/auth/sign-in',
    body: JSON.stringify({ email, password: 'dilato-demo' }),
    headers: { Origin: target.base },
  });
  const cookie = [res.headers['set-cookie']].flat()[0];
  if (!cookie) throw new Error(`sign-in failed: ${res.status}`);
  return cookie.split(';')[0];
}
