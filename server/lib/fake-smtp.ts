import { randomUUID } from 'node:crypto';
import type { AddressInfo } from 'node:net';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { DevMail } from '../../shared/schemas/dev-mail';

const MAILBOX_LIMIT = 500;

/** A local stand-in for the hosted SMTP service: accepts every message and keeps the newest in memory. */
export interface FakeSmtp {
  port: number;
  messages(): DevMail[];
  close(): Promise<void>;
}

export async function startFakeSmtp(port: number, host = '127.0.0.1'): Promise<FakeSmtp> {
  const inbox: DevMail[] = [];
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          const addresses = (value: typeof parsed.to) =>
            (Array.isArray(value) ? value : value ? [value] : []).flatMap((group) =>
              group.value.map((entry) => entry.address ?? ''),
            );
          inbox.unshift({
            id: randomUUID(),
            from: parsed.from?.text ?? '',
            to: addresses(parsed.to),
            subject: parsed.subject ?? '(no subject)',
            text: (parsed.text ?? '').trimEnd(),
            html: typeof parsed.html === 'string' ? parsed.html : null,
            receivedAt: new Date().toISOString(),
          });
          inbox.splice(MAILBOX_LIMIT);
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => resolve());
  });
  const address = server.server.address() as AddressInfo;
  return {
    port: address.port,
    messages: () => [...inbox],
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
