import type { Knex } from 'knex';
import { ForbiddenError, NotFoundError } from '../errors';
import type { Viewer } from '../mechanisms/access';
import { whereVisibleTo } from '../mechanisms/visibility.queries';
import * as sets from './sets.queries';

type Db = Knex | Knex.Transaction;

/** The ids among `mechanismIds` the viewer may see (access.ts `canSee`, in SQL). */
export async function visibleMechanismIds(db: Db, viewer: Viewer, mechanismIds: number[]): Promise<Set<number>> {
  if (mechanismIds.length === 0) return new Set();
  const query = db('mechanisms as m').whereIn('m.id', [...new Set(mechanismIds)]);
  const rows: Array<{ id: number }> = await whereVisibleTo(query, viewer).select('m.id');
  return new Set(rows.map((row) => row.id));
}

/**
 * A set and its items, readable only by someone who may see every mechanism in it; otherwise it
 * answers like a missing set (404), so a private mechanism's presence does not leak. Its owner
 * always reads it (to mend it), but exports still check each mechanism.
 */
export async function loadReadableSet(db: Db, viewer: Viewer, id: number) {
  const set = await sets.findById(db, id);
  if (!set) throw new NotFoundError('set', id);
  const items = await sets.items(db, id);
  const visible = await visibleMechanismIds(db, viewer, items.map((item) => item.mechanismId));
  if (set.ownerId !== viewer.id && !items.every((item) => visible.has(item.mechanismId))) throw new NotFoundError('set', id);
  return { set, items, visible };
}

export async function loadOwnSet(db: Db, viewer: Viewer, id: number) {
  const loaded = await loadReadableSet(db, viewer, id);
  if (loaded.set.ownerId !== viewer.id) throw new ForbiddenError('Only the instructor who built this set may change it');
  return loaded;
}
