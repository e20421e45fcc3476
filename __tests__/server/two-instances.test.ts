import { type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { Like } from 'typeorm';
import { startFakeSmtp, type FakeSmtp } from '../../server/mail/fake-smtp';
import { MailMessage } from '../../server/mail/mail-message.entity';
import { OutboxRepository } from '../../server/mail/outbox.repository';
import { DEMO_PASSWORD } from '../../server/seed/demo-users';
import { draftQuote } from './quote-helpers';
import { demoEmail } from './test-app';
import { openTestDatabase, testingOnPostgres, type TestDatabase } from './test-database';
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { startOnFreePort, waitForHealth } = require('../../scripts/server-process');

jest.setTimeout(120_000);

/** A browser on one instance: keeps the session cookie it was given, sends this instance's Origin. */
function browserOn(base: string, from = '203.0.113.9') {
  let cookie = '';
  const call = async (method: string, url: string, body?: unknown) => {
    const res = await fetch(`${base}${url}`, {
      method,
      headers: { Origin: base, 'Content-Type': 'application/json', 'X-Forwarded-For': from, ...(cookie ? { Cookie: cookie } : {}) },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    const set = res.headers.get('set-cookie');
    if (set) cookie = set.split(';')[0];
    const text = await res.text();
    return { status: res.status, body: text ? JSON.parse(text) : null };
  };
  return {
    get: (url: string) => call('GET', url),
    post: (url: string) => ({ send: (body: unknown) => call('POST', url, body) }),
    useCookieOf: (other: { cookie: () => string }) => {
      cookie = other.cookie();
    },
    cookie: () => cookie,
  };
}

// Two app processes on one PostgreSQL, mailing through one SMTP server, as behind a load balancer.
(testingOnPostgres() ? describe : describe.skip)('two instances on one PostgreSQL', () => {
  let db: TestDatabase;
  let smtp: FakeSmtp;
  const servers: ChildProcess[] = [];
  const dirs: string[] = [];
  let a: string;
  let b: string;

  async function instance(): Promise<string> {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'dilato-instance-'));
    dirs.push(dir);
    // PORT=0: a port picked beforehand could be taken by another server starting in the same run.
    const { server, listening } = startOnFreePort({ DATA_DIR: dir, DATABASE_URL: db.url, SMTP_URL: smtp.url, TRUST_PROXY: '1', WEB_DIR: dir }, { timeoutMs: 90_000 });
    servers.push(server);
    const base: string = await listening;
    await waitForHealth(base, server, 90_000);
    return base;
  }

  beforeAll(async () => {
    db = await openTestDatabase();
    smtp = await startFakeSmtp(new OutboxRepository(db.dataSource));
    a = await instance();
    // One after the other: the second start finds the seed already there.
    b = await instance();
  });

  afterAll(async () => {
    for (const s of servers) s.kill('SIGTERM');
    await Promise.all(servers.map((s) => new Promise((r) => (s.exitCode !== null ? r(null) : s.once('exit', r)))));
    await smtp.close();
    await db.close();
    for (const d of dirs) fs.rmSync(d, { recursive: true, force: true });
  });

  it('when a user signs in on one instance, then the other accepts the session', async () => {
    const onA = browserOn(a, '127.0.0.1');
    const signIn = await onA.post('/api/auth/sign-in').send({ email: demoEmail('sales'), password: DEMO_PASSWORD });
    expect(signIn.status).toBe(200);
    const onB = browserOn(b, '127.0.0.1');
    onB.useCookieOf(onA);
    const me = await onB.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe(demoEmail('sales'));
  });

  it('when failed sign-ins are spread over both instances, then they count toward one limit', async () => {
    // Default limit: 10 failures for one account from one strange address (server/auth/sign-in-limits.ts).
    const wrong = { email: demoEmail('engineer'), password: 'not-the-password' };
    for (let i = 0; i < 5; i += 1) {
      expect((await browserOn(a).post('/api/auth/sign-in').send(wrong)).status).toBe(401);
      expect((await browserOn(b).post('/api/auth/sign-in').send(wrong)).status).toBe(401);
    }
    // Each instance alone has seen only 5; together they have seen 10.
    expect((await browserOn(a).post('/api/auth/sign-in').send(wrong)).status).toBe(429);
    expect((await browserOn(b).post('/api/auth/sign-in').send({ ...wrong, password: DEMO_PASSWORD })).status).toBe(429);
  });

  it('when one quote is sent on both instances at once, then exactly one send wins and one e-mail goes out', async () => {
    const salesA = browserOn(a, '127.0.0.1');
    expect((await salesA.post('/api/auth/sign-in').send({ email: demoEmail('sales'), password: DEMO_PASSWORD })).status).toBe(200);
    const salesB = browserOn(b, '127.0.0.1');
    salesB.useCookieOf(salesA);
    const customer = 'two-instances@example.test';
    const quote = await draftQuote(null as never, salesA as never, customer);
    const sends = await Promise.all([salesA.post(`/api/quotes/${quote.id}/send`).send({}), salesB.post(`/api/quotes/${quote.id}/send`).send({})]);
    expect(sends.map((s) => s.status).sort()).toEqual([200, 409]);
    // Both answers are back, so both instances have finished with the mail server; it stores what it got.
    const mails = db.dataSource.getRepository(MailMessage);
    const countMail = () => mails.countBy({ to: Like(`%${customer}%`) });
    for (let i = 0; i < 100 && (await countMail()) === 0; i += 1) await new Promise((r) => setTimeout(r, 50));
    expect(await countMail()).toBe(1);
  });
});
