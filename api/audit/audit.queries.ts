import type { Knex } from 'knex';

type Db = Knex | Knex.Transaction;

export interface AuditEntry {
  actorId: number | null;
  action: string;
  subjectType: string;
  subjectId: string | number;
  details?: Record<string, unknown>;
}

/** Every state change is recorded; callers pass their transaction so the record commits with the change. */
export async function insert(db: Db, entry: AuditEntry): Promise<void> {
  await db('audit_log').insert({
    actor_id: entry.actorId,
    action: entry.action,
    subject_type: entry.subjectType,
    subject_id: String(entry.subjectId),
    details: JSON.stringify(entry.details ?? {}),
  });
}

export async function findBySubject(db: Db, subjectType: string, subjectId: string | number) {
  return db('audit_log')
    .where({ subject_type: subjectType, subject_id: String(subjectId) })
    .orderBy('id')
    .select('id', 'actor_id as actorId', 'action', 'details', 'created_at as createdAt');
}
