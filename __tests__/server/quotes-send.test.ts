import request from 'supertest';
import { Mailer } from '../../server/mail/mailer';
import { createTestApp, expectErrorShape, signedIn, type TestApp } from './test-app';
import { draftQuote, mailTo, tokenIn } from './quote-helpers';

let t: TestApp;
afterEach(() => t.close());

describe('sending a quote once', () => {
  it('when 8 sends of one draft race each other, then one answers 200, 7 answer 409 and the customer gets one e-mail whose link works', async () => {
    t = await createTestApp();
    const sales = await signedIn(t.app, 'sales');
    const quote = await draftQuote(t.app, sales);
    const answers = await Promise.all(Array.from({ length: 8 }, () => sales.post(`/api/quotes/${quote.id}/send`).send({})));
    expect(answers.map((a) => a.status).sort()).toEqual([200, 409, 409, 409, 409, 409, 409, 409]);
    for (const refused of answers.filter((a) => a.status === 409)) expectErrorShape(refused.body, 'not_draft');

    const mails = await mailTo(sales, 'oda@example.test');
    expect(mails).toHaveLength(1);
    const opened = await request(t.app).get(`/api/public/quotes/${tokenIn(mails[0].text)}`);
    expect(opened.status).toBe(200);
    const events = (await sales.get(`/api/quotes/${quote.id}`)).body.quote.events.map((e: { status: string }) => e.status);
    expect(events.filter((s: string) => s === 'sent')).toHaveLength(1);
  });

  it('when the mail server cannot be reached, then 502 says so, the quote stays a draft with no link and can still be edited', async () => {
    const broken = new Mailer('smtp://127.0.0.1:9');
    t = await createTestApp({ mailer: broken });
    const sales = await signedIn(t.app, 'sales');
    const quote = await draftQuote(t.app, sales);
    const res = await sales.post(`/api/quotes/${quote.id}/send`).send({});
    broken.close();
    expect(res.status).toBe(502);
    expectErrorShape(res.body, 'mail_failed');
    const after = (await sales.get(`/api/quotes/${quote.id}`)).body.quote;
    expect(after.status).toBe('draft');
    expect(after.sentAt).toBeNull();
    expect(after.pricing.frozen).toBe(false);
    expect(after.events.map((e: { note: string }) => e.note)).toContain('The e-mail could not be sent; back to draft');
    expect((await sales.patch(`/api/quotes/${quote.id}`).send({ message: 'Still editable' })).status).toBe(200);
  });
});

describe('the customer link routes', () => {
  it('when one address tries many wrong tokens, then it is refused with 429 while the real customer elsewhere still opens the quote', async () => {
    t = await createTestApp({ trustProxy: 1, publicLimits: { badLinksPerAddress: 5 } });
    const sales = await signedIn(t.app, 'sales');
    const quote = await draftQuote(t.app, sales);
    expect((await sales.post(`/api/quotes/${quote.id}/send`).send({})).status).toBe(200);
    const token = tokenIn((await mailTo(sales, 'oda@example.test'))[0].text);
    const from = (address: string) => (url: string) => request(t.app).get(url).set('X-Forwarded-For', address);
    const guesser = from('203.0.113.50');
    for (let i = 0; i < 5; i += 1) expect((await guesser(`/api/public/quotes/${'A'.repeat(40)}${i}`)).status).toBe(404);
    const refused = await guesser(`/api/public/quotes/${token}`);
    expect(refused.status).toBe(429);
    expectErrorShape(refused.body, 'too_many_requests');
    expect(Number(refused.headers['retry-after'])).toBeGreaterThan(0);
    expect((await from('198.51.100.3')(`/api/public/quotes/${token}`)).status).toBe(200);
  });
});
