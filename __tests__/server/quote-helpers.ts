import type { AlloySummary } from '../../shared/schemas/alloy';
import type { QuoteView } from '../../shared/schemas/quotes';
import { signedIn, type TestApp } from './test-app';

type Client = Awaited<ReturnType<typeof signedIn>>;

export const inDays = (days: number) => new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10);

/** A three-option draft for the demo job "Road car downpipe". */
export async function draftQuote(app: TestApp['app'], sales: Client, email = 'oda@example.test'): Promise<QuoteView> {
  const jobs = (await sales.get('/api/jobs')).body.items as { id: string; name: string }[];
  const alloys = (await sales.get('/api/alloys')).body.items as AlloySummary[];
  const alloy = (uns: string) => alloys.find((a) => a.uns === uns)!.id;
  const res = await sales.post('/api/quotes').send({
    jobId: jobs.find((j) => j.name === 'Road car downpipe')!.id,
    customerName: 'Oda Kallstrom',
    customerEmail: email,
    customerCompany: 'Kallstrom Track Days',
    validUntil: inDays(30),
    message: 'As discussed at the bench.',
    options: [
      { label: 'Type 321 throughout', alloyId: alloy('S32100') },
      { label: 'Type 304 throughout', alloyId: alloy('S30400') },
    ],
  });
  if (res.status !== 201) throw new Error(`draft quote: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.quote as QuoteView;
}

/** The messages the embedded SMTP server received for one address. */
export async function mailTo(sales: Client, to: string): Promise<{ to: string; subject: string; text: string }[]> {
  return ((await sales.get('/api/outbox')).body.items as { to: string; subject: string; text: string }[]).filter((m) => m.to.includes(to));
}

export const tokenIn = (text: string) => /\/q\/([A-Za-z0-9_-]+)/.exec(text)![1];
