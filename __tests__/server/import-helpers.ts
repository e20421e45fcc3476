import type { ImportJobView } from '../../shared/catalogue/catalogue-csv';
import type { client } from './test-app';

type Client = ReturnType<typeof client>;

/** Posts a CSV import and follows it until it is done or failed. */
export async function importCsv(c: Client, csv: string): Promise<ImportJobView> {
  const started = await c.post('/api/alloys/import').set('Content-Type', 'text/csv').send(csv);
  if (started.status !== 202) throw new Error(`import not started: ${started.status} ${JSON.stringify(started.body)}`);
  return waitForImport(c, started.body.import.id);
}

export async function waitForImport(c: Client, id: string, onPoll?: (job: ImportJobView) => Promise<void>): Promise<ImportJobView> {
  for (;;) {
    const job = (await c.get(`/api/alloys/imports/${id}`)).body.import as ImportJobView;
    if (job.phase === 'done' || job.phase === 'failed') return job;
    await onPoll?.(job);
    await new Promise((r) => setTimeout(r, 20));
  }
}
