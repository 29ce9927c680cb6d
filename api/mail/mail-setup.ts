import type { Knex } from 'knex';
import type { AppEnv } from '../env';
import type { Logger } from '../logger';
import { deliverOutbox } from './deliver-outbox';
import { startFakeSmtp, type FakeSmtp } from './fake-smtp';
import { createMailTransport, type MailTransport } from './mail-transport';

const RETRY_EVERY_MS = 60_000;

/** The fake SMTP server runs in development unless FAKE_SMTP=off, and never in production unless FAKE_SMTP=on. */
export const useFakeSmtp = (env: AppEnv) => env.FAKE_SMTP === 'on' || (env.NODE_ENV !== 'production' && env.FAKE_SMTP !== 'off');

/**
 * The server's mail: nodemailer to SMTP_HOST:SMTP_PORT, the local fake SMTP on that port in
 * development, and a timer that retries messages whose first delivery failed.
 */
export async function setUpMail(env: AppEnv, db: Knex, logger: Logger) {
  let fake: FakeSmtp | null = null;
  if (useFakeSmtp(env)) {
    // A second server process (or another local SMTP) may hold the port: mail then goes there.
    fake = await startFakeSmtp(env.SMTP_PORT, '127.0.0.1').catch((error: Error) => {
      logger.warn(`Fake SMTP not started on port ${env.SMTP_PORT} (${error.message}); mail goes to whatever listens there`);
      return null;
    });
    if (fake) logger.info(`Fake SMTP on 127.0.0.1:${fake.port}; captured mail at /api/dev/inbox (development only)`);
  }
  const transport: MailTransport = createMailTransport({
    host: env.SMTP_HOST,
    port: env.SMTP_PORT,
    from: env.MAIL_FROM,
    publicUrl: env.PUBLIC_URL ?? `http://127.0.0.1:${env.PORT}`,
  });
  const retry = setInterval(() => {
    deliverOutbox(db, transport).catch((error) => logger.warn({ err: error }, 'mail outbox delivery failed'));
  }, RETRY_EVERY_MS);
  retry.unref();
  return {
    transport,
    devInbox: fake?.messages ?? null,
    async stop() {
      clearInterval(retry);
      transport.close();
      await fake?.close();
    },
  };
}
