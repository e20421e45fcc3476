import { ROLES, type Role } from '../../shared/schemas/auth';
import { client, createTestApp, expectErrorShape, signedIn, type TestApp } from './test-app';
import { alloyId, newJob, newRun, runBody } from './jobs-helpers';

let t: TestApp;
let s304: string;
let s321: string;
let s316: string;
beforeAll(async () => {
  t = await createTestApp();
  [s304, s321, s316] = await Promise.all(['S30400', 'S32100', 'S31603'].map((uns) => alloyId(t, uns)));
});
afterAll(() => t.close());

type Method = 'get' | 'post' | 'patch' | 'put' | 'delete';
interface Target {
  url: string;
  body?: unknown;
}
interface Route {
  method: Method;
  path: string;
  /** Makes fresh data for one call, as the fabricator, so that no call depends on another. */
  target: () => Promise<Target>;
  ok: number;
  writes: boolean;
}

async function freshRun() {
  const fab = await signedIn(t.app, 'fabricator');
  const job = await newJob(fab, 'Roles job');
  const run = await newRun(fab, job.id, runBody(s304));
  const second = await newRun(fab, job.id, runBody(s304, 500));
  return { job, run, second };
}

const ROUTES: Route[] = [
  { method: 'get', path: '/api/jobs', ok: 200, writes: false, target: async () => ({ url: '/api/jobs' }) },
  {
    method: 'post',
    path: '/api/jobs',
    ok: 201,
    writes: true,
    target: async () => ({ url: '/api/jobs', body: { name: 'New', customer: 'C', application: 'A' } }),
  },
  { method: 'get', path: '/api/jobs/:id', ok: 200, writes: false, target: async () => ({ url: `/api/jobs/${(await freshRun()).job.id}` }) },
  {
    method: 'patch',
    path: '/api/jobs/:id',
    ok: 200,
    writes: true,
    target: async () => ({ url: `/api/jobs/${(await freshRun()).job.id}`, body: { status: 'archived' } }),
  },
  {
    method: 'post',
    path: '/api/jobs/:id/runs',
    ok: 201,
    writes: true,
    target: async () => ({ url: `/api/jobs/${(await freshRun()).job.id}/runs`, body: runBody(s321) }),
  },
  {
    method: 'put',
    path: '/api/jobs/:id/runs/order',
    ok: 200,
    writes: true,
    target: async () => {
      const { job, run, second } = await freshRun();
      return { url: `/api/jobs/${job.id}/runs/order`, body: { runIds: [second.id, run.id] } };
    },
  },
  { method: 'get', path: '/api/runs/:id', ok: 200, writes: false, target: async () => ({ url: `/api/runs/${(await freshRun()).run.id}` }) },
  {
    method: 'patch',
    path: '/api/runs/:id',
    ok: 200,
    writes: true,
    target: async () => ({ url: `/api/runs/${(await freshRun()).run.id}`, body: { installTempC: 25 } }),
  },
  { method: 'delete', path: '/api/runs/:id', ok: 204, writes: true, target: async () => ({ url: `/api/runs/${(await freshRun()).run.id}` }) },
  {
    method: 'post',
    path: '/api/runs/:id/duplicate',
    ok: 201,
    writes: true,
    target: async () => ({ url: `/api/runs/${(await freshRun()).run.id}/duplicate`, body: {} }),
  },
  {
    method: 'get',
    path: '/api/runs/:id/compare',
    ok: 200,
    writes: false,
    target: async () => ({ url: `/api/runs/${(await freshRun()).run.id}/compare?alloyIds=${s321},${s316}` }),
  },
];

const EDITORS: Role[] = ['fabricator', 'engineer', 'admin'];
const cells = ROUTES.flatMap((route) =>
  ROLES.map((role) => {
    const allowed = !route.writes || EDITORS.includes(role);
    return [`${route.method.toUpperCase()} ${route.path}`, role, allowed ? route.ok : 403, route] as const;
  }),
);

describe('who may use the jobs API', () => {
  it.each(cells)('when %s is asked by a %s, then %i', async (_name, role, expected, route) => {
    const { url, body } = await route.target();
    const c = await signedIn(t.app, role);
    const req = c[route.method](url);
    const res = body === undefined ? await req : await req.send(body as object);
    expect(res.status).toBe(expected);
    if (expected === 403) expectErrorShape(res.body, 'forbidden');
  });

  it.each(ROUTES.map((r) => [`${r.method.toUpperCase()} ${r.path}`, r] as const))('when %s is asked by nobody signed in, then 401', async (_name, route) => {
    const { url, body } = await route.target();
    const req = client(t.app)[route.method](url);
    const res = body === undefined ? await req : await req.send(body as object);
    expect(res.status).toBe(401);
    expectErrorShape(res.body, 'signed_out');
  });

  it('when sales is refused a change, then the run is as it was', async () => {
    const { run } = await freshRun();
    const sales = await signedIn(t.app, 'sales');
    expect((await sales.patch(`/api/runs/${run.id}`).send({ name: 'Sales edit' })).status).toBe(403);
    expect((await sales.delete(`/api/runs/${run.id}`)).status).toBe(403);
    const read = await sales.get(`/api/runs/${run.id}`);
    expect(read.body.run.name).toBe(run.name);
  });
});
