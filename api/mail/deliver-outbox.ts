import type { Knex } from 'knex';
import type { MailTransport } from './mail-transport';
import * as outbox from './outbox.queries';

const BATCH = 20;
const MAX_ATTEMPTS = 8;

/**
 * Sends due outbox messages, one batch per transaction, until none is left. A failed send leaves
 * the message pending with a later attempt time: the state change that wrote it stays committed.
 */
export async function deliverOutbox(db: Knex, transport: MailTransport): Promise<number> {
  let sent = 0;
  for (;;) {
    const claimed = await db.transaction(async (trx) => {
      const due = await outbox.claimDue(trx, BATCH);
      for (const message of due) {
        try {
          await transport.send({ to: message.toAddress, subject: message.subject, text: message.text });
          await outbox.markSent(trx, message.id);
          sent += 1;
        } catch (error) {
          await outbox.markFailed(trx, message, (error as Error).message, MAX_ATTEMPTS);
        }
      }
      return due.length;
    });
    if (claimed < BATCH) return sent;
  }
}

/** Runs deliveries one at a time; a kick during a run schedules one more run after it. */
export function createOutboxDeliverer(db: Knex, transport: MailTransport, onError: (error: unknown) => void = () => {}) {
  let running: Promise<void> | null = null;
  let again = false;
  const run = async (): Promise<void> => {
    do {
      again = false;
      await deliverOutbox(db, transport).catch(onError);
    } while (again);
    running = null;
  };
  return {
    kick(): Promise<void> {
      if (running) again = true;
      else running = run();
      return running;
    },
  };
}
