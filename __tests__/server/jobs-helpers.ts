import type { AlloySummary } from '../../shared/schemas/alloy';
import type { JobDetail, RunView } from '../../shared/schemas/jobs';
import { signedIn, type TestApp } from './test-app';

type Client = Awaited<ReturnType<typeof signedIn>>;

/** The catalogue id of a seeded alloy by UNS number (retired ones included). */
export async function alloyId(t: TestApp, uns: string): Promise<string> {
  const admin = await signedIn(t.app, 'admin');
  const res = await admin.get('/api/alloys').query({ search: uns, includeRetired: 'true' });
  const found = (res.body.items as AlloySummary[]).find((a) => a.uns === uns);
  if (!found) throw new Error(`no alloy ${uns}`);
  return found.id;
}

/** 3 in × 16 ga (0.065 in = 1.651 mm) exhaust tube. */
export const TUBE_3IN = { odMm: 76.2, wallMm: 1.651 };

/** A run body: 1 m of 3 in tube held uniformly at `tempC`, installed at 20 °C. */
export function runBody(alloy: string, tempC = 600, over: Record<string, unknown> = {}) {
  return {
    name: `Run at ${tempC} °C`,
    alloyId: alloy,
    tube: TUBE_3IN,
    installTempC: 20,
    segments: [{ lengthMm: 1000, startTempC: tempC, endTempC: tempC }],
    startFixing: 'flange',
    endFixing: 'sliding_bracket',
    ...over,
  };
}

export async function newJob(c: Client, name = 'Test job'): Promise<JobDetail> {
  const res = await c.post('/api/jobs').send({ name, customer: 'Test customer', application: 'Test pipework' });
  if (res.status !== 201) throw new Error(`job create failed: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.job;
}

export async function newRun(c: Client, jobId: string, body: Record<string, unknown>): Promise<RunView> {
  const res = await c.post(`/api/jobs/${jobId}/runs`).send(body);
  if (res.status !== 201) throw new Error(`run create failed: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.run;
}

export async function jobDetail(c: Client, jobId: string): Promise<JobDetail> {
  return (await c.get(`/api/jobs/${jobId}`)).body.job;
}
