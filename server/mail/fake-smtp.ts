import { randomUUID } from 'node:crypto';
import type { AddressInfo } from 'node:net';
import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { OutboxRepository } from './outbox.repository';

function addresses(field: AddressObject | AddressObject[] | undefined): string {
  const list = Array.isArray(field) ? field : field ? [field] : [];
  return list.map((a) => a.text).join(', ');
}

export interface FakeSmtp {
  url: string;
  close: () => Promise<void>;
}

/**
 * The embedded default for e-mail: a real SMTP server on loopback that keeps every message it
 * receives in the database (the outbox), so that nothing leaves the machine.
 */
export async function startFakeSmtp(outbox: OutboxRepository, port = 0): Promise<FakeSmtp> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    banner: 'Dilato outbox',
    logger: false,
    size: 10 * 1024 * 1024,
    onData(stream, _session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (c: Buffer) => chunks.push(c));
      stream.on('end', async () => {
        try {
          const raw = Buffer.concat(chunks);
          const mail = await simpleParser(raw);
          await outbox.save(
            outbox.create({
              id: randomUUID(),
              messageId: mail.messageId ?? null,
              from: addresses(mail.from),
              to: addresses(mail.to),
              subject: mail.subject ?? '',
              text: mail.text ?? '',
              html: typeof mail.html === 'string' ? mail.html : '',
              sizeBytes: raw.length,
              receivedAt: new Date(),
            }),
          );
          callback();
        } catch (err) {
          callback(err as Error);
        }
      });
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => resolve());
  });
  const { port: bound } = server.server.address() as AddressInfo;
  return {
    url: `smtp://127.0.0.1:${bound}`,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
