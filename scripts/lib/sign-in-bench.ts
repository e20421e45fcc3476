import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import zlib from 'node:zlib';
import { chromium, type Browser } from 'playwright-core';
import { median, startChild, stop, type Target } from './http-load';
import type { Row } from './server-bench';
import { compressWebExport } from '../compress-web';

const PAIRS = 7;
const FLOOR_APP = path.join(__dirname, '..', 'bench-floor-app');

/**
 * Runs in the page before any of its scripts: the time (from navigation start) of the first frame
 * in which an input is laid out, the moment a person could start typing their e-mail address.
 */
const FORM_VISIBLE_PROBE = `
  (() => {
    const look = () => {
      const input = document.querySelector('input');
      if (input && input.getBoundingClientRect().height > 0) window.__formVisibleMs = performance.now();
      else requestAnimationFrame(look);
    };
    requestAnimationFrame(look);
  })();
`;

/** The floor: a bare Expo Router app on the same installed versions, exported the way the product is. */
function exportFloorApp(outDir: string) {
  const expo = path.join(__dirname, '..', '..', 'node_modules', '.bin', 'expo');
  const result = spawnSync(expo, ['export', '--platform', 'web', '--output-dir', outDir, '--clear'], {
    cwd: FLOOR_APP,
    encoding: 'utf8',
    env: { ...process.env, EXPO_OFFLINE: '1', CI: '1', EXPO_NO_TELEMETRY: '1' },
  });
  if (result.status !== 0) throw new Error(`the floor app's export failed:\n${result.stdout}\n${result.stderr}`);
  // Served as the product's export is: compressed once at build time.
  compressWebExport(outDir);
}

interface Load {
  formVisibleMs: number;
  jsBytes: number;
  jsGzipBytes: number;
  scripts: number;
}

/** One cold load of /sign-in in a fresh browser context (no cache, no cookies). */
async function coldLoad(browser: Browser, target: Target, webDir: string): Promise<Load> {
  const context = await browser.newContext({ viewport: { width: 390, height: 844 }, baseURL: target.base });
  try {
    const page = await context.newPage();
    await page.addInitScript(FORM_VISIBLE_PROBE);
    const scripts: string[] = [];
    page.on('response', (res) => {
      const url = new URL(res.url());
      if (res.request().resourceType() === 'script' && url.origin === target.base) scripts.push(url.pathname);
    });
    await page.goto('/sign-in');
    // Function predicates, not strings: the product's Content-Security-Policy refuses string evaluation.
    const probed = () => (globalThis as unknown as { __formVisibleMs?: number }).__formVisibleMs;
    await page.waitForFunction(probed, undefined, { timeout: 30_000 });
    const formVisibleMs = (await page.evaluate(probed)) as number;
    // Sizes from the files themselves, gzip at the level the server's compression uses, so the figure does not depend on the transport.
    let jsBytes = 0;
    let jsGzipBytes = 0;
    for (const p of new Set(scripts)) {
      const file = fs.readFileSync(path.join(webDir, decodeURIComponent(p)));
      jsBytes += file.length;
      jsGzipBytes += zlib.gzipSync(file).length;
    }
    return { formVisibleMs, jsBytes, jsGzipBytes, scripts: new Set(scripts).size };
  } finally {
    await context.close();
  }
}

/** Issue 12's sign-in rows: JavaScript the sign-in screen loads, and cold /sign-in → form visible, each against a bare Expo Router export. */
export async function signInBench(webDir: string, log: (line: string) => void): Promise<Row[]> {
  if (!fs.existsSync(path.join(webDir, 'index.html'))) return [];
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'dilato-bench-sign-in-'));
  const floorDir = path.join(dir, 'floor-web');
  log('  exporting the bare Expo Router app for the sign-in floor…');
  exportFloorApp(floorDir);
  const product = await startChild(['product', path.join(dir, 'sign-in.sqlite'), 'fresh', webDir]);
  const floor = await startChild(['static', floorDir]);
  const browser = await chromium.launch({
    executablePath: '/usr/bin/chromium',
    headless: true,
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
  try {
    // One unmeasured load each, so both servers and the browser have paid their first-use costs.
    await coldLoad(browser, product, webDir);
    await coldLoad(browser, floor, floorDir);
    const ours: Load[] = [];
    const bare: Load[] = [];
    for (let i = 0; i < PAIRS; i++) {
      ours.push(await coldLoad(browser, product, webDir));
      bare.push(await coldLoad(browser, floor, floorDir));
    }
    const kb = (b: number) => b / 1024;
    const o = ours[0];
    const f = bare[0];
    return [
      {
        figure: 'JavaScript the sign-in screen loads, gzip (floor: bare Expo Router export)',
        product: kb(o.jsGzipBytes),
        floor: kb(f.jsGzipBytes),
        unit: 'KB',
        goal: '≤ 1.5×',
        note: `${o.scripts} files, ${kb(o.jsBytes).toFixed(0)} KB before gzip (floor ${f.scripts} files, ${kb(f.jsBytes).toFixed(0)} KB)`,
      },
      {
        figure: 'cold /sign-in → form visible, p50 of 7 interleaved pairs (floor: bare Expo Router app)',
        product: median(ours.map((l) => l.formVisibleMs)),
        floor: median(bare.map((l) => l.formVisibleMs)),
        unit: 'ms',
        goal: '≤ 1.2×',
        note: 'fresh browser context per load, 390 px wide, loopback',
      },
    ];
  } finally {
    await browser.close();
    stop(product);
    stop(floor);
    fs.rmSync(dir, { recursive: true, force: true });
  }
}
