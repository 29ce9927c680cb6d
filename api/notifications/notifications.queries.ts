import type { Knex } from 'knex';
import { whereVisibleTo } from '../mechanisms/visibility.queries';
import type { Role } from '../users/users.schemas';

type Db = Knex | Knex.Transaction;

export async function insert(
  db: Db,
  values: { userId: number; mechanismId: number; kind: string; message: string; details: Record<string, unknown> },
): Promise<void> {
  await db('notifications').insert({
    user_id: values.userId, mechanism_id: values.mechanismId, kind: values.kind,
    message: values.message, details: JSON.stringify(values.details),
  });
}

/** A person's notifications about mechanisms they can still see (visibility may have changed since). */
export async function findForUser(db: Db, viewer: { id: number; roles: readonly Role[] }, unreadOnly: boolean) {
  const query = whereVisibleTo(
    db('notifications as n').join('mechanisms as m', 'm.id', 'n.mechanism_id').where('n.user_id', viewer.id),
    viewer,
  );
  if (unreadOnly) query.whereNull('n.read_at');
  return query.orderBy('n.id', 'desc').limit(200)
    .select('n.id', 'n.kind', 'n.message', 'n.details', 'm.slug as mechanismSlug', 'n.read_at as readAt', 'n.created_at as createdAt');
}

export async function markRead(db: Db, userId: number, id: number): Promise<boolean> {
  const count = await db('notifications').where({ id, user_id: userId }).update({ read_at: db.fn.now() });
  return count === 1;
}
