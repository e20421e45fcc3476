import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { generateBigDb } from '../generate-big-db';
import { addFloorRoute, latency, median, memoryOf, send, signIn, startChild, stop, throughput, type Req, type Target } from './http-load';

export interface Row {
  figure: string;
  product: number;
  floor: number;
  unit: 'req/s' | 'ms' | 'KB';
  goal: string;
  note?: string;
}

const ROUNDS = 5;
const BURST_MS = 1500;
const SAMPLES = 40;

/** Interleaved pairs: product burst, floor burst, ROUNDS times; medians of each. */
async function pairedThroughput(a: [Target, Req], b: [Target, Req]): Promise<[number, number]> {
  await throughput(a[0].port, a[1], 300);
  await throughput(b[0].port, b[1], 300);
  const xs: number[] = [];
  const ys: number[] = [];
  for (let i = 0; i < ROUNDS; i++) {
    xs.push(await throughput(a[0].port, a[1], BURST_MS));
    ys.push(await throughput(b[0].port, b[1], BURST_MS));
  }
  return [median(xs), median(ys)];
}

/**
 * Interleaved single requests, one at a time; p50 of each. Both sides first take the same warm-up
 * burst on the measured path, so a server started fresh is not compared cold against one that
 * earlier rows have already warmed. The i-th sample asks `reqOf(i)` (-1 for the warm-up), so a row
 * can ask something not asked before on each sample and no answer cache helps.
 */
async function pairedFirstAsks(a: [Target, (i: number) => Req], b: [Target, (i: number) => Req]): Promise<[number, number]> {
  await throughput(a[0].port, a[1](-1), 500);
  await throughput(b[0].port, b[1](-1), 500);
  const xs: number[] = [];
  const ys: number[] = [];
  for (let i = 0; i < SAMPLES; i++) {
    xs.push(await latency(a[0].port, a[1](i)));
    ys.push(await latency(b[0].port, b[1](i)));
  }
  return [median(xs), median(ys)];
}

/** The same request on every sample. */
const pairedLatency = (a: [Target, Req], b: [Target, Req]) => pairedFirstAsks([a[0], () => a[1]], [b[0], () => b[1]]);

const get = (p: string, cookie: string): Req => ({ method: 'GET', path: p, headers: { cookie } });

async function json<T>(target: Target, req: Req): Promise<T> {
  const res = await send(target.port, req);
  if (res.status >= 400) throw new Error(`${req.path}: ${res.status} ${res.body.toString().slice(0, 200)}`);
  return JSON.parse(res.body.toString()) as T;
}

/** A run of 10 segments from 900 °C down, with a flex section sized from the shop's parts (as the bench's engine row). */
function calcBody(alloyId: string) {
  return JSON.stringify({
    alloyId,
    tube: { odMm: 76.2, wallMm: 1.65 },
    installTempC: 20,
    segments: Array.from({ length: 10 }, (_, i) => ({ lengthMm: 80 + 10 * i, startTempC: 900 - 40 * i, endTempC: 860 - 40 * i })),
    flex: {},
  });
}

export async function serverBench(log: (line: string) => void): Promise<Row[]> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'dilato-bench-'));
  // BENCH_BIG_DB=file keeps the generated database there and reuses it on the next run (a copy is served, so runs do not change it).
  const kept = process.env.BENCH_BIG_DB;
  const bigFile = path.join(dir, 'big.sqlite');
  const t0 = performance.now();
  const reused = Boolean(kept && fs.existsSync(kept));
  if (reused) fs.copyFileSync(kept!, bigFile);
  else {
    await generateBigDb(bigFile);
    if (kept) fs.copyFileSync(bigFile, kept);
  }
  log(`  ${reused ? 'copied' : 'generated'} database: 10,000 alloys, 2,000 jobs, 100,000 runs in ${((performance.now() - t0) / 1000).toFixed(1)} s (${(fs.statSync(bigFile).size / 1024 / 1024).toFixed(0)} MB)`);

  const small = await startChild(['product', path.join(dir, 'small.sqlite'), 'fresh']);
  const floor = await startChild(['floor']);
  const rows: Row[] = [];
  try {
    const cookie = await signIn(small, 'engineer@dilato.test');

    // 1. Alloy list, default page, against bare Express sending the same bytes.
    const listReq = get('/api/alloys', cookie);
    const listBytes = (await send(small.port, listReq)).body.toString();
    addFloorRoute(floor, { method: 'get', path: '/api/alloys', body: listBytes, parseJson: false });
    const [listRps, listFloor] = await pairedThroughput([small, listReq], [floor, { method: 'GET', path: '/api/alloys' }]);
    rows.push({ figure: 'GET /api/alloys (default page) req/s', product: listRps, floor: listFloor, unit: 'req/s', goal: '≥ 0.6×', note: `${(listBytes.length / 1024).toFixed(1)} KB` });

    // 2. Job detail of a demo job with 4 runs.
    const jobs = await json<{ items: { id: string; runCount: number }[] }>(small, get('/api/jobs?status=all', cookie));
    const job = jobs.items.find((j) => j.runCount === 4) ?? jobs.items[0];
    const jobReq = get(`/api/jobs/${job.id}`, cookie);
    const jobBytes = (await send(small.port, jobReq)).body.toString();
    addFloorRoute(floor, { method: 'get', path: '/api/job', body: jobBytes, parseJson: false });
    const [jobRps, jobFloor] = await pairedThroughput([small, jobReq], [floor, { method: 'GET', path: '/api/job' }]);
    rows.push({ figure: `GET /api/jobs/:id (${job.runCount} runs) req/s`, product: jobRps, floor: jobFloor, unit: 'req/s', goal: '≥ 0.5×', note: `${(jobBytes.length / 1024).toFixed(1)} KB` });

    // 3. Calculator, 10 segments, flex on, against bare Express parsing the same body.
    const s321 = await json<{ items: { id: string }[] }>(small, get('/api/alloys?search=S32100', cookie));
    const body = calcBody(s321.items[0].id);
    const calcReq: Req = { method: 'POST', path: '/api/calc/run', body, headers: { cookie, Origin: small.base } };
    const calcBytes = (await send(small.port, calcReq)).body.toString();
    addFloorRoute(floor, { method: 'post', path: '/api/calc/run', body: calcBytes, parseJson: true });
    const [calcRps, calcFloor] = await pairedThroughput([small, calcReq], [floor, { method: 'POST', path: '/api/calc/run', body }]);
    rows.push({ figure: 'POST /api/calc/run (10 segments, flex on) req/s', product: calcRps, floor: calcFloor, unit: 'req/s', goal: '≥ 0.6×', note: `${(calcBytes.length / 1024).toFixed(1)} KB answer` });
    stop(floor);

    // 4 and 5. The large database against the seeded one.
    const big = await startChild(['product', bigFile]);
    try {
      const bigCookie = await signIn(big, 'engineer@dilato.test');
      const search = (c: string) => get('/api/alloys?search=321', c);
      const [searchBig, searchSmall] = await pairedLatency([big, search(bigCookie)], [small, search(cookie)]);
      const found = await json<{ total: number }>(big, search(bigCookie));
      rows.push({ figure: 'alloy search, 10,000 alloys, p50', product: searchBig, floor: searchSmall, unit: 'ms', goal: '≤ 1.5×', note: `"321": ${found.total} matches, first page of 50` });
      // The same search with a lower service limit (one every alloy passes) not asked before on each sample: the page and its count are read from the database every time.
      const firstAsk = (c: string) => (i: number) => get(`/api/alloys?search=321&minServiceC=${i < 0 ? -50 : -100 - i}`, c);
      const [freshBig, freshSmall] = await pairedFirstAsks([big, firstAsk(bigCookie)], [small, firstAsk(cookie)]);
      rows.push({ figure: 'alloy search, 10,000 alloys, not cached, p50', product: freshBig, floor: freshSmall, unit: 'ms', goal: '≤ 1.5×', note: 'each sample a filter not asked before' });

      const memBefore = await memoryOf(big);
      const list = (c: string) => get('/api/jobs', c);
      const [jobsBig, jobsSmall] = await pairedLatency([big, list(bigCookie)], [small, list(cookie)]);
      // Twenty pages further into the history, as someone paging back would.
      for (let p = 1; p <= 20; p++) await send(big.port, get(`/api/jobs?page=${p}`, bigCookie));
      const memAfter = await memoryOf(big);
      const mb = (m: NodeJS.MemoryUsage) => `RSS ${(m.rss / 1024 / 1024).toFixed(0)} MB, heap ${(m.heapUsed / 1024 / 1024).toFixed(0)} MB`;
      rows.push({ figure: 'job list, 2,000 jobs / 100,000 runs, p50', product: jobsBig, floor: jobsSmall, unit: 'ms', goal: '≤ 1.5×, memory flat', note: `server after start ${mb(memBefore)}; after 20 pages ${mb(memAfter)}` });
      // A page size not asked before on each sample: the page and its count are read again (each job's totals stay cached by its revision).
      const freshList = (c: string) => (i: number) => get(`/api/jobs?pageSize=${i < 0 ? 25 : 26 + i}`, c);
      const [freshJobsBig, freshJobsSmall] = await pairedFirstAsks([big, freshList(bigCookie)], [small, freshList(cookie)]);
      rows.push({ figure: 'job list, 2,000 jobs / 100,000 runs, answer not kept, p50', product: freshJobsBig, floor: freshJobsSmall, unit: 'ms', goal: '≤ 1.5×', note: 'each sample a page size not asked before' });
    } finally {
      stop(big);
    }
  } finally {
    stop(small);
    stop(floor);
    fs.rmSync(dir, { recursive: true, force: true });
  }
  return rows;
}
