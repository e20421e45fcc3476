import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { send, signIn, startChild, stop, throughput } from './lib/http-load';
async function main() {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'dl-'));
  process.env.PROF = '1';
  const small = await startChild(['product', path.join(dir, 's.sqlite'), 'fresh']);
  const cookie = await signIn(small, 'engineer@dilato.test');
  const list = JSON.parse((await send(small.port, { method: 'GET', path: '/api/alloys?search=S32100', headers: { cookie } } as any)).body.toString());
  const body = JSON.stringify({ alloyId: list.items[0].id, tube: { odMm: 76.2, wallMm: 1.65 }, installTempC: 20, segments: Array.from({ length: 10 }, (_, i) => ({ lengthMm: 80 + 10 * i, startTempC: 900 - 40 * i, endTempC: 860 - 40 * i })), flex: {} });
  const req = { method: 'POST', path: '/api/calc/run', body, headers: { cookie, Origin: small.base } } as any;
  await throughput(small.port, req, 1000);
  const n = await throughput(small.port, req, 4000, 1);
  console.log('req/s one at a time', n.toFixed(0));
  stop(small);
  await new Promise((r) => setTimeout(r, 1500));
  process.exit(0);
}
main();
