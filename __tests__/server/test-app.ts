import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { createApp, type AppOptions } from '../../server/app';
import { DEMO_PASSWORD, DEMO_USERS } from '../../server/seed/demo-users';
import { startFakeSmtp } from '../../server/mail/fake-smtp';
import { Mailer } from '../../server/mail/mailer';
import { OutboxRepository } from '../../server/mail/outbox.repository';
import { startFakeProvider, type FakeProvider } from '../../server/payments/fake-provider';
import { createPaymentsClient } from '../../server/payments/payments-client';
import { FolderObjectStore } from '../../server/storage/folder-object-store';
import type { ObjectStore } from '../../server/storage/object-store';
import type { Role } from '../../shared/schemas/auth';
import { openTestDatabase } from './test-database';

export const HOST = 'dilato.test';
export const ORIGIN = `http://${HOST}`;

export interface TestApp {
  app: ReturnType<typeof createApp>;
  dataSource: DataSource;
  /** The database's URL or path (a file only when `reopenable`). */
  databaseUrl: string;
  uploadsDir: string;
  /** Where the app keeps data sheets: the uploads folder unless the test passed another store. */
  objectStore: ObjectStore;
  /** The fake payment provider the app's SDK talks to; its webhooks reach the app through supertest. */
  payments: FakeProvider;
  close: () => Promise<void>;
}

type TestOptions = Partial<AppOptions> & { demo?: boolean; catalogue?: boolean; reopenable?: boolean };

/**
 * A real app on a real database (in-memory SQLite, or a fresh PostgreSQL database when the suite runs
 * with DATABASE_URL; see `test-database.ts`), migrated and seeded like a first start
 * (reference catalogue and demo shop), with its own uploads folder.
 */
export async function createTestApp(options: TestOptions = {}): Promise<TestApp> {
  const database = await openTestDatabase({ reopenable: options.reopenable, seed: { demo: options.demo ?? true, catalogue: options.catalogue ?? true } });
  const dataSource = database.dataSource;
  const uploadsDir = options.uploadsDir ?? fs.mkdtempSync(path.join(os.tmpdir(), 'dilato-uploads-'));
  const smtp = await startFakeSmtp(new OutboxRepository(dataSource));
  const mailer = new Mailer(smtp.url);
  const payments = await startFakeProvider();
  const objectStore = options.objectStore ?? new FolderObjectStore(uploadsDir);
  const app = createApp(dataSource, {
    ...options,
    uploadsDir,
    objectStore,
    mailer: options.mailer ?? mailer,
    payments: { client: createPaymentsClient(payments.secretKey, payments.url), webhookSecret: payments.webhookSecret },
  });
  payments.setWebhookTarget((payload, signature) =>
    request(app).post('/api/payments/webhook').set('Host', HOST).set('Content-Type', 'application/json').set('Stripe-Signature', signature).send(payload),
  );
  return {
    app,
    dataSource,
    databaseUrl: database.url,
    uploadsDir,
    objectStore,
    payments,
    close: async () => {
      mailer.close();
      objectStore.close();
      await payments.close();
      await smtp.close();
      await database.close();
      fs.rmSync(uploadsDir, { recursive: true, force: true });
    },
  };
}

type Method = 'get' | 'post' | 'patch' | 'put' | 'delete';

/** A cookie-keeping client that speaks as a browser on Dilato's own origin would. */
export function client(app: TestApp['app']) {
  const agent = request.agent(app);
  const send = (method: Method, url: string) => agent[method](url).set('Host', HOST).set('Origin', ORIGIN);
  return {
    agent,
    get: (url: string) => send('get', url),
    post: (url: string) => send('post', url),
    patch: (url: string) => send('patch', url),
    put: (url: string) => send('put', url),
    delete: (url: string) => send('delete', url),
  };
}

export function demoEmail(role: Role): string {
  const user = DEMO_USERS.find((u) => u.role === role);
  if (!user) throw new Error(`no demo user for ${role}`);
  return user.email;
}

/** A client already signed in as the demo user of the role. */
export async function signedIn(app: TestApp['app'], role: Role) {
  const c = client(app);
  const res = await c.post('/api/auth/sign-in').send({ email: demoEmail(role), password: DEMO_PASSWORD });
  if (res.status !== 200) throw new Error(`sign-in as ${role} failed: ${res.status} ${JSON.stringify(res.body)}`);
  return c;
}

export function expectErrorShape(body: unknown, code: string) {
  expect(body).toEqual({
    error: expect.objectContaining({ code, message: expect.any(String) }),
  });
  const error = (body as { error: Record<string, unknown> }).error;
  expect(Object.keys(error).every((k) => ['code', 'message', 'fields', 'words'].includes(k))).toBe(true);
  expect(error.code).toMatch(/^[a-z][a-z0-9_]*$/);
}
