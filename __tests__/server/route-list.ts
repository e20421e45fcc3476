import type { Express } from 'express';
import { alloyId, newJob, newRun, runBody } from './jobs-helpers';
import { importCsv } from './import-helpers';
import { draftQuote, mailTo, tokenIn } from './quote-helpers';
import { signedIn, type TestApp } from './test-app';

interface Layer {
  rawPath?: string | string[];
  route?: { path: string | string[]; methods: Record<string, boolean> };
  handle: { stack?: Layer[] };
}

const join = (a: string, b: string) => `${a}/${b}`.replace(/\/+/g, '/').replace(/(.)\/$/, '$1');

/** Every route the app answers, as "METHOD /path" with Express's own parameter names, read from its router stack. */
export function routeList(app: Express): string[] {
  const out = new Set<string>();
  const walk = (stack: Layer[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route) {
        const paths = Array.isArray(layer.route.path) ? layer.route.path : [layer.route.path];
        for (const p of paths) for (const m of Object.keys(layer.route.methods)) out.add(`${m.toUpperCase()} ${join(prefix, p)}`);
      } else if (layer.handle?.stack) {
        const raw = layer.rawPath ?? '/';
        if (Array.isArray(raw) || typeof raw !== 'string') throw new Error('a router is mounted on a path the route list cannot read');
        walk(layer.handle.stack, join(prefix, raw));
      }
    }
  };
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack, '');
  return [...out].filter((r) => r.includes(' /api')).sort();
}

export interface RouteFixtures {
  ids: Record<'alloy' | 'job' | 'run' | 'quote' | 'outbox' | 'datasheet' | 'import' | 'user' | 'flex' | 'weldRule' | 'weldRuleToDelete', string>;
  /** The customer link token of a sent quote. */
  token: string;
}

/** One of everything a route's path can name: an alloy, a job with a run, a draft and a sent quote, a data sheet, an import… */
export async function routeFixtures(t: TestApp): Promise<RouteFixtures> {
  const eng = await signedIn(t.app, 'engineer');
  const sales = await signedIn(t.app, 'sales');
  const admin = await signedIn(t.app, 'admin');
  const alloy = await alloyId(t, 'S30400');
  const job = await newJob(eng, 'Fixture job');
  const run = await newRun(eng, job.id, runBody(await alloyId(t, 'S32100')));
  const sent = await draftQuote(t.app, sales, 'fixture@example.test');
  await sales.post(`/api/quotes/${sent.id}/send`).send({});
  const token = tokenIn((await mailTo(sales, 'fixture@example.test'))[0].text);
  const outbox = (await sales.get('/api/outbox')).body.items[0].id;
  const draft = await draftQuote(t.app, sales);
  const sheet = await eng.post(`/api/alloys/${alloy}/datasheets`).attach('file', Buffer.from('%PDF-1.4\n%%EOF\n'), { filename: 'a.pdf', contentType: 'application/pdf' });
  const imported = await importCsv(eng, (await eng.get('/api/alloys/export.csv')).text);
  const user = (await admin.get('/api/users')).body.items.find((u: { role: string }) => u.role === 'fabricator').id;
  const flex = (await admin.get('/api/flex-parts')).body.items[0].id;
  const [weldRule, weldRuleToDelete] = (await admin.get('/api/weld-rules')).body.items.map((r: { id: string }) => r.id);
  return { ids: { alloy, job: job.id, run: run.id, quote: draft.id, outbox, datasheet: sheet.body.datasheet.id, import: imported.id, user, flex, weldRule, weldRuleToDelete }, token };
}

/** The route's path with real ids (or a made-up token when `badToken`). */
export function routeUrl(route: string, { ids, token }: RouteFixtures, badToken = false): string {
  const [, path] = route.split(' ');
  const byPath: Record<string, string> = {
    '/api/alloys/imports/:id': ids.import,
    '/api/datasheets/:id': ids.datasheet,
    '/api/outbox/:id': ids.outbox,
    '/api/users/:id': ids.user,
    '/api/flex-parts/:id': ids.flex,
  };
  const prefix = path.split('/:')[0];
  const id =
    byPath[path] ??
    (prefix.startsWith('/api/weld-rules') ? (route.startsWith('DELETE') ? ids.weldRuleToDelete : ids.weldRule) : undefined) ?? (prefix.startsWith('/api/alloys') ? ids.alloy : prefix.startsWith('/api/jobs') ? ids.job : prefix.startsWith('/api/runs') ? ids.run : ids.quote);
  return path
    .replace(':token', badToken ? 'A'.repeat(43) : token)
    .replace(':version', '1')
    .replace(':from', 'USD')
    .replace(':id', id)
    .concat(path.endsWith('/compare') ? `?alloyIds=${ids.alloy},${ids.alloy}` : '');
}
