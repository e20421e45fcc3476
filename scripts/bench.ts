/**
 * npm run bench: how fast the engine answers the client's live recompute, how the server
 * keeps answering during a large CSV import, and the table of issue 12 (each figure against its
 * floor, measured in this run with interleaved pairs). Prints figures only; no assertions.
 */
import { calculateRun } from '../shared/engine/calculate-run';
import type { AlloyData, RunInput } from '../shared/engine/types';
import { importBench } from './lib/import-bench';
import path from 'node:path';
import { interactionBench } from './lib/interaction-bench';
import { serverBench, type Row } from './lib/server-bench';
import { signInBench } from './lib/sign-in-bench';

const FRAME_MS = 1000 / 60;
const SECONDS = 1;

// 304-like data: mean coefficients every 50 °C from the EN 1993-1-2 Annex C law (20 °C reference).
const temps = Array.from({ length: 24 }, (_, i) => 50 + 50 * i);
const alloy: AlloyData = {
  referenceTempC: 20,
  cte: temps.map((t) => ({ tempC: t, meanUmPerMK: 16 + 4.79e-3 * t - 1.243e-6 * t * t })),
  // 193 GPa and 205 MPa at 20 °C scaled by the EN 1993-1-2 Annex C factors k_E,θ and k_0.2p,θ for 1.4301.
  modulus: [1, 0.96, 0.92, 0.88, 0.84, 0.8, 0.76, 0.71, 0.63, 0.45, 0.2, 0.1].map((k, i) => ({ tempC: i === 0 ? 20 : 100 * i, gpa: 193 * k })),
  yield: [1, 0.82, 0.68, 0.64, 0.6, 0.54, 0.49, 0.4, 0.27, 0.14, 0.06, 0.03].map((k, i) => ({ tempC: i === 0 ? 20 : 100 * i, mpa: 205 * k })),
  densityKgM3: 8000,
  maxContinuousC: 925,
  maxIntermittentC: 870,
  pricePerKg: 5.2,
  warningRanges: [{ fromC: 427, toC: 871, code: 'CARBIDE_PRECIPITATION', message: 'Carbide precipitation range' }],
};

const input: RunInput = {
  tube: { odMm: 76.2, wallMm: 1.65 },
  installTempC: 20,
  segments: Array.from({ length: 10 }, (_, i) => ({ lengthMm: 80 + 10 * i, startTempC: 900 - 40 * i, endTempC: 860 - 40 * i })),
  flex: {
    parts: [
      { id: 'a', name: 'A', purpose: 'thermal_bellows', boreMm: 76.2, liveLengthMm: 150, ratedAxialCompressionMm: 25, ratedAxialExtensionMm: 25, lateralOffsetMm: 6, ratedAngularDeg: 3, ratedCycles: 10000, maxTempC: 950, price: 90 },
      { id: 'b', name: 'B', purpose: 'thermal_bellows', boreMm: 76.2, liveLengthMm: 100, ratedAxialCompressionMm: 10, ratedAxialExtensionMm: 10, lateralOffsetMm: 4, ratedAngularDeg: 3, ratedCycles: 10000, maxTempC: 950, price: 70 },
    ],
  },
};

function timeLoop(fn: () => number): { perSecond: number; sink: number } {
  let sink = 0;
  for (let i = 0; i < 2000; i++) sink += fn(); // warm-up for the JIT
  let n = 0;
  const start = performance.now();
  const end = start + SECONDS * 1000;
  let now = start;
  while (now < end) {
    for (let i = 0; i < 100; i++) sink += fn();
    n += 100;
    now = performance.now();
  }
  return { perSecond: (n * 1000) / (now - start), sink };
}

const engine = timeLoop(() => calculateRun(input, alloy).growthMm);

// Naive α·L·ΔT over the same segments with one room-temperature coefficient and mean segment temperature.
const alpha = alloy.cte[0].meanUmPerMK * 1e-6;
const segs = input.segments;
const bare = timeLoop(() => {
  let g = 0;
  for (const s of segs) g += alpha * s.lengthMm * ((s.startTempC + s.endTempC) / 2 - input.installTempC);
  return g;
});

const result = calculateRun(input, alloy);
const meanMs = 1000 / engine.perSecond;
const fmt = (x: number, d = 0) => x.toLocaleString('en-US', { maximumFractionDigits: d, minimumFractionDigits: d });

console.log('Dilato engine bench (10-segment run, curves, stress, limits, flex, mass)');
console.log(`  curve points: ${result.curve.length}, growth-per-metre points: ${result.growthPerMetreCurve.length}`);
console.log(`  calculateRun:       ${fmt(engine.perSecond)} runs/s`);
console.log(`  bare α·L·ΔT loop:   ${fmt(bare.perSecond)} runs/s`);
console.log(`  ratio (bare/engine): ${fmt(bare.perSecond / engine.perSecond, 0)}×`);
console.log(`  mean calculateRun:  ${fmt(meanMs, 4)} ms vs a ${fmt(FRAME_MS, 1)} ms frame (${fmt((meanMs / FRAME_MS) * 100, 2)} % of a frame)`);
console.log(`  (checksums ${fmt(engine.sink % 1000, 3)} / ${fmt(bare.sink % 1000, 3)})`);

function printTable(rows: Row[]) {
  const value = (r: Row, x: number) => (r.unit === 'ms' ? `${fmt(x, 1)} ms` : r.unit === 'KB' ? `${fmt(x)} KB` : `${fmt(x)} req/s`);
  console.log('');
  console.log('| figure | product | floor | ratio | goal | note |');
  console.log('|---|---|---|---|---|---|');
  const floor = (r: Row) => (Number.isNaN(r.floor) ? '—' : value(r, r.floor));
  const ratio = (r: Row) => (Number.isNaN(r.floor) ? '—' : `${fmt(r.product / r.floor, 2)}×`);
  for (const r of rows) console.log(`| ${r.figure} | ${value(r, r.product)} | ${floor(r)} | ${ratio(r)} | ${r.goal} | ${r.note ?? ''} |`);
}

async function main() {
  // BENCH_ONLY=server: just the server rows of issue 12 (no engine, import or Chromium rows).
  if (process.env.BENCH_ONLY === 'server') {
    printTable(await serverBench((line) => console.log(line)));
    return;
  }
  // BENCH_ONLY=sign-in: just the sign-in screen's JavaScript and cold load against a bare Expo Router app.
  if (process.env.BENCH_ONLY === 'sign-in') {
    printTable(await signInBench(path.join(__dirname, '..', 'dist'), (line) => console.log(line)));
    return;
  }
  const b = await importBench();
  const ms = (x: number) => `${fmt(x, 1)} ms`;
  console.log('');
  console.log(`CSV import bench (${fmt(b.bytes / 1024 / 1024, 2)} MB, ${fmt(b.rows)} rows, ${fmt(b.alloys)} alloys; file database; ${b.phase}, ${fmt(b.created)} created)`);
  console.log(`  import, start to done:      ${ms(b.importMs)} (goal < 5000 ms); ${fmt(b.importMs / b.parseMs, 0)}× a bare parse of the file (${ms(b.parseMs)})`);
  console.log(`  health during the import:   p50 ${ms(b.health.p50)}, p99 ${ms(b.health.p99)} (goal < 100 ms), max ${ms(b.health.max)}, ${b.health.n} answers`);
  console.log(`  health with nothing to do:  p50 ${ms(b.idle.p50)}, p99 ${ms(b.idle.p99)}; p99 ratio busy/idle ${fmt(b.health.p99 / b.idle.p99, 1)}×`);

  console.log('');
  console.log('Server against its floors (issue 12), each server in its own process, keep-alive client, 8 in flight');
  const rows = await serverBench((line) => console.log(line));
  // Chromium on the last web build (`npm run build:web`); skipped when there is none.
  const webDir = path.join(__dirname, '..', 'dist');
  const ui = await interactionBench(webDir);
  const signIn = await signInBench(webDir, (line) => console.log(line));
  if (ui.length === 0) console.log('  (no web build in dist/: interaction and sign-in rows skipped; run npm run build:web first)');
  printTable([...rows, ...signIn, ...ui]);
}

void main().then(() => process.exit(0));
