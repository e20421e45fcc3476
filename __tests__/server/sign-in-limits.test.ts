import { DEMO_PASSWORD } from '../../server/seed/demo-users';
import { client, createTestApp, demoEmail, expectErrorShape, type TestApp } from './test-app';

let t: TestApp;
afterEach(() => t.close());

async function attempt(email: string, password: string) {
  return client(t.app).post('/api/auth/sign-in').send({ email, password });
}

describe('failed sign-in limits', () => {
  it('when an account has 10 failures, then the 11th attempt gets 429 with a wait, even with the right password', async () => {
    t = await createTestApp();
    for (let i = 0; i < 10; i += 1) {
      expect((await attempt(demoEmail('admin'), `wrong-${i}`)).status).toBe(401);
    }
    const locked = await attempt(demoEmail('admin'), DEMO_PASSWORD);
    expect(locked.status).toBe(429);
    expectErrorShape(locked.body, 'too_many_attempts');
    expect(locked.body.error.message).toMatch(/Try again in \d+ minutes?/);
    expect(Number(locked.headers['retry-after'])).toBeGreaterThan(0);

    // The limit is per account: a colleague on the same address still signs in.
    expect((await attempt(demoEmail('sales'), DEMO_PASSWORD)).status).toBe(200);
  });

  it('when a whole team signs in successfully many times from one address, then nobody is locked out', async () => {
    t = await createTestApp({ signInLimits: { windowMs: 60_000, perAccount: 10, perAddress: 5 } });
    for (let i = 0; i < 12; i += 1) {
      const role = (['admin', 'engineer', 'fabricator', 'sales'] as const)[i % 4];
      expect((await attempt(demoEmail(role), DEMO_PASSWORD)).status).toBe(200);
    }
  });

  it('when one address fails across many accounts, then the address limit answers 429', async () => {
    t = await createTestApp({ signInLimits: { windowMs: 60_000, perAccount: 10, perAddress: 5 } });
    for (let i = 0; i < 5; i += 1) {
      expect((await attempt(`someone-${i}@dilato.test`, 'wrong-password')).status).toBe(401);
    }
    const res = await attempt('someone-else@dilato.test', 'wrong-password');
    expect(res.status).toBe(429);
    expectErrorShape(res.body, 'too_many_attempts');
  });
});
