import type { AddressInfo } from 'node:net';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { CapturedMail } from './inbox.schemas';

export type { CapturedMail };

export interface FakeSmtp {
  port: number;
  messages: CapturedMail[];
  close(): Promise<void>;
}

/**
 * A local SMTP server for development and tests only: it accepts every message on loopback and
 * keeps it in memory for the admin inbox (GET /api/dev/inbox). Nothing is relayed anywhere.
 */
export function startFakeSmtp(port = 0, host = '127.0.0.1'): Promise<FakeSmtp> {
  const messages: CapturedMail[] = [];
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          messages.push({
            id: messages.length + 1,
            from: parsed.from?.text ?? '',
            to: session.envelope.rcptTo.map((rcpt) => rcpt.address),
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            receivedAt: new Date(),
          });
          callback();
        })
        .catch(callback);
    },
  });
  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => {
      const address = server.server.address() as AddressInfo;
      resolve({ port: address.port, messages, close: () => new Promise((done) => server.close(() => done())) });
    });
  });
}
