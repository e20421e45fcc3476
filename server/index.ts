import fs from 'node:fs';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { createApp } from './app';
import { ConfigError, loadConfig } from './config';
import { answerClientErrors } from './http/request-guards';
import { openDatabase, withStartUpLock } from './db/data-source';
import { seed } from './seed/seed';
import { clearExpiredCounters } from './db/shared-counters';
import { startFakeSmtp } from './mail/fake-smtp';
import { Mailer } from './mail/mailer';
import { OutboxRepository } from './mail/outbox.repository';
import { startFakeProvider } from './payments/fake-provider';
import { createPaymentsClient } from './payments/payments-client';
import { openObjectStore } from './storage/object-store';

async function main() {
  const startedAt = Date.now();
  const config = loadConfig();
  if (config.storage.kind === 'folder') fs.mkdirSync(config.storage.dir, { recursive: true });

  const dataSource = await openDatabase(config.databasePath);
  const report = await withStartUpLock(dataSource, () => seed(dataSource, { demo: config.seedDemo, catalogue: config.seedCatalogue }));
  // Without SMTP_URL, e-mail goes to an SMTP server of our own that keeps it in the outbox.
  const fakeSmtp = config.smtpUrl ? null : await startFakeSmtp(new OutboxRepository(dataSource));
  const mailer = new Mailer(config.smtpUrl ?? fakeSmtp!.url);
  // Without the PAYMENTS_* keys, deposits go to a fake payment provider of our own (test cards only).
  const fakePayments = config.payments ? null : await startFakeProvider();
  const payments = config.payments
    ? { client: createPaymentsClient(config.payments.secretKey, config.payments.apiUrl), webhookSecret: config.payments.webhookSecret }
    : { client: createPaymentsClient(fakePayments!.secretKey, fakePayments!.url), webhookSecret: fakePayments!.webhookSecret };
  const objectStore = openObjectStore(config.storage);
  const app = createApp(dataSource, {
    uploadsDir: config.uploadsDir,
    objectStore,
    mailer,
    webDir: config.webDir,
    publicUrl: config.publicUrl,
    trustProxy: config.trustProxy,
    payments,
  });

  const server: Server = app.listen(config.port, () => {
    // PORT=0 takes any free port; the line below says which (scripts read it).
    const port = (server.address() as AddressInfo).port;
    fakePayments?.setWebhookTarget(`http://127.0.0.1:${port}/api/payments/webhook`);
    console.log(
      `[dilato] listening on http://localhost:${port} (data in ${config.dataDir}` +
        (config.storage.kind === 's3' ? `, data sheets in s3://${config.storage.bucket}/${config.storage.prefix}` : '') +
        '; ' +
        `seeded: ${report.alloys} alloys, ${report.sources} sources, ${report.flexParts} flex parts, ${report.weldRules} weld rules, ${report.demoUsers} demo users, ${report.demoJobs ?? 0} demo jobs; ready in ${Date.now() - startedAt} ms)` +
        (fakePayments ? `; payments: the embedded fake provider at ${fakePayments.url}` : ''),
    );
  });

  answerClientErrors(server);
  const sweep = setInterval(() => clearExpiredCounters(dataSource).catch((err) => console.error('[dilato] clearing old rate-limit counters:', err)), 60 * 60 * 1000);
  sweep.unref();

  const stop = () => {
    clearInterval(sweep);
    server.close(() => {
      mailer.close();
      objectStore.close();
      void Promise.all([fakeSmtp?.close(), fakePayments?.close(), dataSource.destroy()]).finally(() => process.exit(0));
    });
  };
  process.on('SIGTERM', stop);
  process.on('SIGINT', stop);
}

main().catch((err) => {
  if (err instanceof ConfigError) {
    console.error(err.message);
  } else {
    console.error('[dilato] could not start:', err);
  }
  process.exit(1);
});
