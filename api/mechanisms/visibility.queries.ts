import type { Knex } from 'knex';
import type { Role } from '../users/users.schemas';

interface Viewer {
  id: number;
  roles: readonly Role[];
}

/**
 * Restricts a query over `mechanisms as <alias>` to what the viewer may see: public ones, and
 * private ones they own, collaborate on or were assigned to review; curators and admins see all.
 * The same rule as access.ts `canSee`, in SQL, for lists, search, queues and notifications.
 */
export function whereVisibleTo<T extends Knex.QueryBuilder>(query: T, viewer: Viewer, alias = 'm'): T {
  if (viewer.roles.includes('curator') || viewer.roles.includes('admin')) return query;
  return query.whereRaw(
    `(${alias}.visibility = 'public' or ${alias}.owner_id = ?
      or exists (select 1 from mechanism_collaborators c where c.mechanism_id = ${alias}.id and c.user_id = ?)
      or exists (select 1 from round_reviewers rr join review_rounds r on r.id = rr.round_id
                 where r.mechanism_id = ${alias}.id and rr.reviewer_id = ?))`,
    [viewer.id, viewer.id, viewer.id],
  ) as T;
}
