import type { APIRequestContext } from 'playwright-core';
import { BASE_URL } from './browser';

export const TOKEN_IN_TEXT = /\/q\/([A-Za-z0-9_-]{20,})/;
const headers = { Origin: BASE_URL };
const inDays = (days: number) => new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10);

/** A draft quote on the demo road car downpipe, made through the API as sales; each option is [label, UNS]. */
export async function draftQuote(api: APIRequestContext, customer: { name: string; email: string }, options: [string, string][]): Promise<{ id: string; number: string }> {
  const jobs = (await (await api.get('/api/jobs')).json()).items as { id: string; name: string }[];
  const alloys = (await (await api.get('/api/alloys')).json()).items as { id: string; uns: string }[];
  const alloy = (uns: string) => alloys.find((a) => a.uns === uns)!.id;
  const created = await api.post('/api/quotes', {
    headers,
    data: {
      jobId: jobs.find((j) => j.name === 'Road car downpipe')!.id,
      customerName: customer.name,
      customerEmail: customer.email,
      validUntil: inDays(30),
      options: options.map(([label, uns]) => ({ label, alloyId: alloy(uns) })),
    },
  });
  expect(created.status()).toBe(201);
  return (await created.json()).quote;
}

/** The customer's link token from the newest e-mail to the address in the outbox. */
export async function tokenMailedTo(api: APIRequestContext, email: string): Promise<string> {
  const outbox = (await (await api.get('/api/outbox')).json()).items as { to: string; text: string }[];
  return TOKEN_IN_TEXT.exec(outbox.find((m) => m.to.includes(email))!.text)![1];
}
