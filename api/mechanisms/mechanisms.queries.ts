import type { Knex } from 'knex';

type Db = Knex | Knex.Transaction;

export interface MechanismRow {
  id: number;
  slug: string;
  title: string;
  summary: string;
  tags: string[];
  visibility: 'public' | 'private';
  ownerId: number;
  referenceRevisionId: number | null;
  latestRevisionNumber: number;
  createdAt: Date;
  updatedAt: Date;
}

const COLUMNS = [
  'id', 'slug', 'title', 'summary', 'tags', 'visibility', 'owner_id as ownerId',
  'reference_revision_id as referenceRevisionId', 'latest_revision_number as latestRevisionNumber',
  'created_at as createdAt', 'updated_at as updatedAt',
];

export async function findBySlug(db: Db, slug: string): Promise<MechanismRow | undefined> {
  return db('mechanisms').where({ slug }).first(COLUMNS);
}

export async function findById(db: Db, id: number): Promise<MechanismRow | undefined> {
  return db('mechanisms').where({ id }).first(COLUMNS);
}

/** The new id, or null when the slug is taken (also by a concurrent insert). */
export async function insert(
  db: Db,
  values: { slug: string; title: string; summary: string; tags: string[]; visibility: string; ownerId: number },
): Promise<number | null> {
  const rows = await db('mechanisms')
    .insert({ slug: values.slug, title: values.title, summary: values.summary, tags: values.tags, visibility: values.visibility, owner_id: values.ownerId })
    .onConflict('slug').ignore()
    .returning('id');
  return rows[0]?.id ?? null;
}

export async function update(
  db: Db,
  id: number,
  patch: Partial<{ title: string; summary: string; tags: string[]; visibility: string }>,
): Promise<void> {
  await db('mechanisms').where({ id }).update({ ...patch, updated_at: db.fn.now() });
}

/** Compare-and-set: true only when the latest number was still `from` (one of two racing saves wins). */
export async function advanceLatest(db: Db, id: number, from: number): Promise<boolean> {
  const count = await db('mechanisms')
    .where({ id, latest_revision_number: from })
    .update({ latest_revision_number: from + 1, updated_at: db.fn.now() });
  return count === 1;
}

export async function setReference(db: Db, id: number, revisionId: number): Promise<void> {
  await db('mechanisms').where({ id }).update({ reference_revision_id: revisionId, updated_at: db.fn.now() });
}

export async function collaboratorIds(db: Db, mechanismId: number): Promise<number[]> {
  const rows = await db('mechanism_collaborators').where({ mechanism_id: mechanismId }).orderBy('user_id').select('user_id');
  return rows.map((row) => row.user_id);
}

export async function replaceCollaborators(db: Db, mechanismId: number, userIds: number[]): Promise<void> {
  await db('mechanism_collaborators').where({ mechanism_id: mechanismId }).delete();
  if (userIds.length > 0) {
    await db('mechanism_collaborators').insert(userIds.map((userId) => ({ mechanism_id: mechanismId, user_id: userId })));
  }
}

/** Assigned to any round of the mechanism, past or present. */
export async function isAssignedReviewer(db: Db, mechanismId: number, userId: number): Promise<boolean> {
  const row = await db('round_reviewers as rr')
    .join('review_rounds as r', 'r.id', 'rr.round_id')
    .where({ 'r.mechanism_id': mechanismId, 'rr.reviewer_id': userId })
    .first(db.raw('1 as found'));
  return Boolean(row);
}

export async function peopleByIds(db: Db, ids: number[]): Promise<Array<{ id: number; name: string }>> {
  if (ids.length === 0) return [];
  return db('users').whereIn('id', ids).orderBy('name').select('id', 'name');
}
