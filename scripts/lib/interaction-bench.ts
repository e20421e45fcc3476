import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { chromium, type Page } from 'playwright-core';
import { median, send, signIn, startChild, stop } from './http-load';
import type { Row } from './server-bench';

const KEYSTROKES = 40;

interface Frame {
  ms: number;
  changed: boolean;
}

/**
 * Runs in the page (kept as text: the server's TypeScript has no DOM types): for each input event, the
 * time from the event to the first task after the next animation frame (the frame that shows the
 * keystroke), and whether the results panel's text had changed by then.
 */
const PROBE = `
  window.__frames = [];
  const results = () => document.querySelector('[aria-label="Results"]')?.textContent ?? '';
  if (!window.__probe) document.addEventListener('input', (event) => {
    const t0 = event.timeStamp;
    const before = results();
    requestAnimationFrame(() => {
      const channel = new MessageChannel();
      channel.port1.onmessage = () => window.__frames.push({ ms: performance.now() - t0, changed: results() !== before });
      channel.port2.postMessage(0);
    });
  }, true);
  window.__probe = true;
`;

function installProbe(page: Page) {
  return page.evaluate(PROBE);
}

async function typeAndMeasure(page: Page, label: string, keys: string[]): Promise<{ p50: number; p95: number; changed: number }> {
  await installProbe(page);
  const field = page.getByRole('group', { name: 'Segment 1', exact: true }).getByLabel(label, { exact: true }).or(page.getByLabel(label, { exact: true })).first();
  await field.click();
  await page.keyboard.press('End');
  // Ten keystrokes first, unmeasured: the figures are for a page that has been typed in, not its first JIT pass.
  for (let i = 0; i < 10; i++) {
    await page.keyboard.press(keys[i % keys.length]);
    await page.waitForTimeout(60);
  }
  await page.evaluate('window.__frames = []');
  for (let i = 0; i < KEYSTROKES; i++) {
    await page.keyboard.press(keys[i % keys.length]);
    await page.waitForTimeout(60);
  }
  const frames = (await page.evaluate('window.__frames')) as Frame[];
  const ms = frames.map((f) => f.ms).sort((a, b) => a - b);
  return { p50: median(ms), p95: ms[Math.min(ms.length - 1, Math.floor(ms.length * 0.95))], changed: frames.filter((f) => f.changed).length };
}

/** The same probe on a bare page holding one input: what Chromium itself takes from a keystroke to the next frame here, now. */
async function bareInputFloor(page: Page): Promise<{ p50: number; p95: number }> {
  await page.setContent('<label>Length (mm) <input value="600"></label><div aria-label="Results">0</div>');
  const r = await typeAndMeasure(page, 'Length (mm)', ['5', 'Backspace']);
  return { p50: r.p50, p95: r.p95 };
}

/** Chromium on the built web app: an edit of a segment length, and a keystroke in the run name. */
export async function interactionBench(webDir: string): Promise<Row[]> {
  if (!fs.existsSync(path.join(webDir, 'index.html'))) return [];
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'dilato-bench-ui-'));
  const server = await startChild(['product', path.join(dir, 'ui.sqlite'), 'fresh', webDir]);
  const browser = await chromium.launch({
    executablePath: '/usr/bin/chromium',
    headless: true,
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
  try {
    const cookie = await signIn(server, 'engineer@dilato.test');
    const jobs = JSON.parse((await send(server.port, { method: 'GET', path: '/api/jobs?status=all', headers: { cookie } })).body.toString()) as { items: { id: string }[] };
    const job = JSON.parse((await send(server.port, { method: 'GET', path: `/api/jobs/${jobs.items[0].id}`, headers: { cookie } })).body.toString()) as { job: { runs: { id: string }[] } };
    const page = await (await browser.newContext({ viewport: { width: 1280, height: 800 }, baseURL: server.base })).newPage();
    await page.goto('/sign-in');
    await page.getByLabel('Email', { exact: true }).fill('engineer@dilato.test');
    await page.getByLabel('Password', { exact: true }).fill('dilato-demo');
    await page.getByRole('button', { name: 'Sign in', exact: true }).click();
    await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
    await page.goto(`/jobs/${jobs.items[0].id}/runs/${job.job.runs[0].id}`);
    await page.getByRole('group', { name: 'Segment 1', exact: true }).getByLabel('Length (mm)', { exact: true }).waitFor();
    await page.getByText('Growth along the run').first().waitFor();

    // A digit on and off the end of the first segment's length: every keystroke changes the growth.
    const length = await typeAndMeasure(page, 'Length (mm)', ['5', 'Backspace']);
    const name = await typeAndMeasure(page, 'Run name', ['x', 'Backspace']);
    const bare = await bareInputFloor(await (await browser.newContext({ viewport: { width: 1280, height: 800 } })).newPage());
    const note = (r: typeof length) =>
      `p95 ${r.p95.toFixed(1)} ms (bare input ${bare.p95.toFixed(1)} ms); figures changed by that frame in ${r.changed}/${KEYSTROKES}; the charts redraw in the task after it`;
    return [
      { figure: 'edit a length → growth figures updated, p50 (floor: bare input)', product: length.p50, floor: bare.p50, unit: 'ms', goal: '≤ 16.7 ms, p95 ≤ 33 ms', note: note(length) },
      { figure: 'keystroke (run name) → next frame in the run editor, p50 (floor: bare input)', product: name.p50, floor: bare.p50, unit: 'ms', goal: '≤ 16.7 ms', note: `p95 ${name.p95.toFixed(1)} ms` },
    ];
  } finally {
    await browser.close();
    stop(server);
    fs.rmSync(dir, { recursive: true, force: true });
  }
}
