import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { AddressInfo } from 'node:net';
import Papa from 'papaparse';
import { createApp } from '../../server/app';
import { openDatabase } from '../../server/db/data-source';
import { Mailer } from '../../server/mail/mailer';
import { seed } from '../../server/seed/seed';
import { bigImportCsv } from './csv-fixture';

const percentile = (sorted: number[], p: number) => sorted[Math.min(sorted.length - 1, Math.floor(sorted.length * p))] ?? NaN;

/** GET /api/health every 10 ms until `stop()`; returns the sorted latencies. */
function healthProbe(base: string) {
  const latencies: number[] = [];
  let running = true;
  const done = (async () => {
    while (running) {
      const t = performance.now();
      await fetch(`${base}/api/health`);
      latencies.push(performance.now() - t);
      await new Promise((r) => setTimeout(r, 10));
    }
  })();
  return async () => {
    running = false;
    await done;
    return latencies.sort((a, b) => a - b);
  };
}

/** A 5 MB, 7,273-row import (3,637 new alloys) against a real file database, with health checks running throughout. */
export async function importBench() {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'dilato-bench-'));
  const ds = await openDatabase(path.join(dir, 'bench.sqlite'));
  await seed(ds, { demo: true, catalogue: true });
  const mailer = new Mailer('smtp://127.0.0.1:9');
  const server = createApp(ds, { uploadsDir: dir, mailer }).listen(0, '127.0.0.1');
  await new Promise((r) => server.once('listening', r));
  const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  try {
    const signIn = await fetch(`${base}/api/auth/sign-in`, {
      method: 'POST',
      headers: { Origin: base, 'Content-Type': 'application/json' },
      body: JSON.stringify({ email: 'engineer@dilato.test', password: 'dilato-demo' }),
    });
    const cookie = signIn.headers.get('set-cookie')!.split(';')[0];
    const exported = await (await fetch(`${base}/api/alloys/export.csv`, { headers: { cookie } })).text();
    const { csv, alloys, rows } = bigImportCsv(exported, { rows: 7273, targetBytes: 5 * 1024 * 1024, rowsPerAlloy: 2 });

    // Floors, same run: health with nothing else going on, and parsing the file in one go.
    const idle = healthProbe(base);
    await new Promise((r) => setTimeout(r, 1000));
    const idleLatencies = await idle();
    const parseStart = performance.now();
    Papa.parse(csv, { header: true, skipEmptyLines: 'greedy' });
    const parseMs = performance.now() - parseStart;

    const busy = healthProbe(base);
    const start = performance.now();
    const started = (await (await fetch(`${base}/api/alloys/import`, { method: 'POST', headers: { Origin: base, cookie, 'Content-Type': 'text/csv' }, body: csv })).json()) as { import: { id: string; phase: string; report: { created: string[] } | null } };
    let job = started.import;
    while (job.phase !== 'done' && job.phase !== 'failed') {
      await new Promise((r) => setTimeout(r, 50));
      job = ((await (await fetch(`${base}/api/alloys/imports/${job.id}`, { headers: { cookie } })).json()) as typeof started).import;
    }
    const importMs = performance.now() - start;
    const busyLatencies = await busy();
    return {
      bytes: csv.length,
      rows,
      alloys,
      created: job.report?.created.length ?? 0,
      phase: job.phase,
      importMs,
      parseMs,
      health: { n: busyLatencies.length, p50: percentile(busyLatencies, 0.5), p99: percentile(busyLatencies, 0.99), max: busyLatencies.at(-1) ?? NaN },
      idle: { n: idleLatencies.length, p50: percentile(idleLatencies, 0.5), p99: percentile(idleLatencies, 0.99) },
    };
  } finally {
    server.close();
    mailer.close();
    await ds.destroy();
    fs.rmSync(dir, { recursive: true, force: true });
  }
}
