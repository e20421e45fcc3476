import { Like } from 'typeorm';
import { MailMessage } from '../../server/mail/mail-message.entity';
import { DEMO_PASSWORD } from '../../server/seed/demo-users';
import { client, createTestApp, demoEmail, expectErrorShape, type TestApp } from './test-app';

let t: TestApp;
afterEach(() => t.close());

/** A sign-in as seen through one trusted proxy, which appends the caller's real address. */
async function attempt(email: string, password: string, from = '203.0.113.1', forged?: string) {
  const c = client(t.app).post('/api/auth/sign-in');
  c.set('X-Forwarded-For', forged ? `${forged}, ${from}` : from);
  return c.send({ email, password });
}

const outboxFor = async (email: string) =>
  (await t.dataSource.getRepository(MailMessage).find({ where: { to: Like(`%${email}%`) }, order: { receivedAt: 'ASC' } })).map(
    ({ subject, text }) => ({ subject, text }),
  );

describe('failed sign-ins are limited by account and address together', () => {
  it('when a stranger fails 10 times for an account, then that address is refused, the owner still signs in from home and is told in words', async () => {
    t = await createTestApp({ trustProxy: 1 });
    const owner = demoEmail('admin');
    expect((await attempt(owner, DEMO_PASSWORD, '198.51.100.7')).status).toBe(200); // the owner's usual address
    for (let i = 0; i < 10; i += 1) expect((await attempt(owner, `wrong-${i}`, '203.0.113.66')).status).toBe(401);

    const refused = await attempt(owner, DEMO_PASSWORD, '203.0.113.66');
    expect(refused.status).toBe(429);
    expectErrorShape(refused.body, 'too_many_attempts');
    expect(refused.body.error.message).toMatch(/for this account from this address[\s\S]*Try again in 15 minutes/);
    expect(Number(refused.headers['retry-after'])).toBeGreaterThan(0);

    expect((await attempt(owner, DEMO_PASSWORD, '198.51.100.7')).status).toBe(200);
    expect((await attempt(demoEmail('sales'), DEMO_PASSWORD, '203.0.113.66')).status).toBe(200);
    const notes = await outboxFor(owner);
    expect(notes).toHaveLength(1);
    expect(notes[0].text).toMatch(/10 times with a wrong password, from an address you have not signed in from before/);
  });

  it('when the owner mistypes over and over at an address they use, then the answers slow down but the account is never locked', async () => {
    t = await createTestApp({ trustProxy: 1, signInLimits: { slowAfter: 2, baseDelayMs: 5, maxDelayMs: 40 } });
    const owner = demoEmail('engineer');
    expect((await attempt(owner, DEMO_PASSWORD)).status).toBe(200);
    const statuses: number[] = [];
    for (let i = 0; i < 14; i += 1) statuses.push((await attempt(owner, `typo-${i}`)).status);
    expect(new Set(statuses)).toEqual(new Set([401]));
    expect((await attempt(owner, DEMO_PASSWORD)).status).toBe(200);
    expect(await outboxFor(owner)).toHaveLength(0);
  });

  it('when someone at the shop address guesses across many accounts, then strangers there are refused but the team still signs in', async () => {
    t = await createTestApp({ trustProxy: 1, signInLimits: { perAddress: 5 } });
    const office = '192.0.2.10';
    for (const role of ['admin', 'engineer', 'fabricator', 'sales'] as const) expect((await attempt(demoEmail(role), DEMO_PASSWORD, office)).status).toBe(200);
    for (let i = 0; i < 5; i += 1) expect((await attempt(`someone-${i}@dilato.test`, 'wrong-password', office)).status).toBe(401);
    const stranger = await attempt('someone-else@dilato.test', 'wrong-password', office);
    expect(stranger.status).toBe(429);
    expect(stranger.body.error.message).toMatch(/from this address/);
    for (const role of ['admin', 'engineer', 'fabricator', 'sales'] as const) expect((await attempt(demoEmail(role), DEMO_PASSWORD, office)).status).toBe(200);
  });

  it('when guesses for one account come from many strange addresses, then all strange addresses are refused and the owner still signs in', async () => {
    t = await createTestApp({ trustProxy: 1, signInLimits: { perAccount: 6 } });
    const owner = demoEmail('sales');
    expect((await attempt(owner, DEMO_PASSWORD, '198.51.100.20')).status).toBe(200);
    for (let i = 0; i < 6; i += 1) expect((await attempt(owner, 'wrong-password', `203.0.113.${100 + i}`)).status).toBe(401);
    const res = await attempt(owner, 'wrong-password', '203.0.113.200');
    expect(res.status).toBe(429);
    expect(res.body.error.message).toMatch(/unfamiliar addresses/);
    expect((await attempt(owner, DEMO_PASSWORD, '198.51.100.20')).status).toBe(200);
  });
});

describe('proxy hops', () => {
  it('when TRUST_PROXY is 1 and a caller forges X-Forwarded-For, then the limit still keys on the address the proxy saw', async () => {
    t = await createTestApp({ trustProxy: 1 });
    const owner = demoEmail('fabricator');
    for (let i = 0; i < 10; i += 1) expect((await attempt(owner, `wrong-${i}`, '203.0.113.9', `10.0.0.${i}`)).status).toBe(401);
    expect((await attempt(owner, 'wrong', '203.0.113.9', '10.9.9.9')).status).toBe(429);
  });

  it('when TRUST_PROXY names the proxy address and the caller is not it, then X-Forwarded-For is ignored', async () => {
    t = await createTestApp({ trustProxy: ['10.1.2.3'] });
    const owner = demoEmail('fabricator');
    for (let i = 0; i < 10; i += 1) expect((await attempt(owner, `wrong-${i}`, `203.0.113.${i}`)).status).toBe(401);
    expect((await attempt(owner, 'wrong', '203.0.113.250')).status).toBe(429);
  });

  it('when TRUST_PROXY is false, then X-Forwarded-For is ignored', async () => {
    t = await createTestApp();
    const owner = demoEmail('fabricator');
    for (let i = 0; i < 10; i += 1) expect((await attempt(owner, `wrong-${i}`, `203.0.113.${i}`)).status).toBe(401);
    expect((await attempt(owner, 'wrong', '203.0.113.250')).status).toBe(429);
  });
});
