import { SMTPServer } from 'smtp-server';
import { simpleParser, type AddressObject } from 'mailparser';
import type { DataSource } from 'typeorm';
import { OutboxMessage } from '../db/entities/outbox-message.entity';

const addressText = (a: AddressObject | AddressObject[] | undefined) =>
  (Array.isArray(a) ? a.map((x) => x.text).join(', ') : (a?.text ?? '')).slice(0, 500);

/**
 * A loopback SMTP server that keeps every message in the outbox table, so admins (and tests)
 * can read what Grovewalk sent without a real mail account.
 */
export async function startFakeSmtp(dataSource: DataSource, port: number): Promise<{ port: number; close(): Promise<void> }> {
  const server = new SMTPServer({
    secure: false,
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    size: 5 * 1024 * 1024,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then(async (mail) => {
          await dataSource.getRepository(OutboxMessage).insert({
            to: addressText(mail.to),
            from: addressText(mail.from),
            subject: (mail.subject ?? '(no subject)').slice(0, 500),
            text: mail.text ?? '',
            html: typeof mail.html === 'string' ? mail.html : null,
            receivedAt: new Date(),
          });
          callback();
        })
        .catch((err: Error) => callback(err));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => {
      server.off('error', reject);
      resolve();
    });
  });
  const address = server.server.address();
  return { port: typeof address === 'object' && address ? address.port : port, close: () => new Promise<void>((r) => server.close(() => r())) };
}
