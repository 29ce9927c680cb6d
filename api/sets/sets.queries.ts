import type { Knex } from 'knex';

type Db = Knex | Knex.Transaction;

export interface SetRow {
  id: number;
  ownerId: number;
  title: string;
  audience: string;
  createdAt: Date;
  updatedAt: Date;
}

export interface SetItemRow {
  position: number;
  mechanismId: number;
  revisionId: number;
  note: string;
}

const COLUMNS = ['id', 'owner_id as ownerId', 'title', 'audience', 'created_at as createdAt', 'updated_at as updatedAt'];

export async function findById(db: Db, id: number): Promise<SetRow | undefined> {
  return db('mechanism_sets').where({ id }).first(COLUMNS);
}

export async function findByOwnerAndTitle(db: Db, ownerId: number, title: string): Promise<SetRow | undefined> {
  return db('mechanism_sets').where({ owner_id: ownerId, title }).first(COLUMNS);
}

export async function listAll(db: Db): Promise<SetRow[]> {
  return db('mechanism_sets').select(COLUMNS).orderBy('updated_at', 'desc').orderBy('id', 'desc');
}

export async function insert(db: Db, values: { ownerId: number; title: string; audience: string }): Promise<number> {
  const [row] = await db('mechanism_sets').insert({ owner_id: values.ownerId, title: values.title, audience: values.audience }).returning('id');
  return row.id;
}

export async function update(db: Db, id: number, patch: Partial<{ title: string; audience: string }>): Promise<void> {
  await db('mechanism_sets').where({ id }).update({ ...patch, updated_at: db.fn.now() });
}

export async function remove(db: Db, id: number): Promise<void> {
  await db('mechanism_sets').where({ id }).delete();
}

export async function items(db: Db, setId: number): Promise<SetItemRow[]> {
  return db('mechanism_set_items').where({ set_id: setId }).orderBy('position')
    .select('position', 'mechanism_id as mechanismId', 'revision_id as revisionId', 'note');
}

/** Items of many sets at once (for lists). */
export async function itemsOfSets(db: Db, setIds: number[]): Promise<Array<SetItemRow & { setId: number }>> {
  if (setIds.length === 0) return [];
  return db('mechanism_set_items').whereIn('set_id', setIds).orderBy(['set_id', 'position'])
    .select('set_id as setId', 'position', 'mechanism_id as mechanismId', 'revision_id as revisionId', 'note');
}

export async function replaceItems(db: Db, setId: number, list: Omit<SetItemRow, 'position'>[]): Promise<void> {
  await db('mechanism_set_items').where({ set_id: setId }).delete();
  if (list.length === 0) return;
  await db('mechanism_set_items').insert(list.map((item, index) => ({
    set_id: setId, position: index + 1, mechanism_id: item.mechanismId, revision_id: item.revisionId, note: item.note,
  })));
}
