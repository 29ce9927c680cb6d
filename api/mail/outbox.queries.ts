import type { Knex } from 'knex';

type Db = Knex | Knex.Transaction;

export interface OutboxRow {
  id: number;
  toAddress: string;
  subject: string;
  text: string;
  attempts: number;
}

export async function insert(
  db: Db,
  values: { userId: number; toAddress: string; kind: string; subject: string; text: string },
): Promise<void> {
  await db('mail_outbox').insert({
    user_id: values.userId, to_address: values.toAddress, kind: values.kind, subject: values.subject, text: values.text,
  });
}

/** Due messages, locked so that two deliverers never send the same one (SKIP LOCKED). */
export async function claimDue(db: Db, limit: number): Promise<OutboxRow[]> {
  return db('mail_outbox')
    .where('status', 'pending').where('next_attempt_at', '<=', db.fn.now())
    .orderBy('id').limit(limit).forUpdate().skipLocked()
    .select('id', 'to_address as toAddress', 'subject', 'text', 'attempts');
}

export async function markSent(db: Db, id: number): Promise<void> {
  await db('mail_outbox').where({ id }).update({ status: 'sent', sent_at: db.fn.now(), attempts: db.raw('attempts + 1') });
}

/** Backs off exponentially (1, 2, 4… minutes) and gives up after `maxAttempts`. */
export async function markFailed(db: Db, row: OutboxRow, error: string, maxAttempts: number): Promise<void> {
  const attempts = row.attempts + 1;
  await db('mail_outbox').where({ id: row.id }).update({
    attempts,
    last_error: error.slice(0, 1000),
    status: attempts >= maxAttempts ? 'failed' : 'pending',
    next_attempt_at: db.raw(`now() + interval '1 minute' * ?`, [2 ** (attempts - 1)]),
  });
}
