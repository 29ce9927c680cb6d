import type { Knex } from 'knex';

type Db = Knex | Knex.Transaction;

function roundsWithMechanism(db: Db) {
  return db('review_rounds as r')
    .join('mechanisms as m', 'm.id', 'r.mechanism_id')
    .join('revisions as rv', 'rv.id', 'r.revision_id');
}

const ROUND_COLUMNS = ['r.id', 'r.state', 'm.slug', 'm.title', 'rv.number as revision', 'r.updated_at as updatedAt'];

/**
 * Rounds in progress where the person is assigned and has not yet given a verdict on the current
 * revision. Being assigned makes a private mechanism visible to them, so no further filter applies.
 */
function myReviews(db: Db, reviewerId: number) {
  return roundsWithMechanism(db)
    .join('round_reviewers as rr', 'rr.round_id', 'r.id')
    .where('rr.reviewer_id', reviewerId)
    .whereIn('r.state', ['open', 'revise-requested', 'endorsed'])
    .whereNotExists((sub) => sub.from('verdicts as v').whereRaw('v.round_id = r.id and v.revision_id = r.revision_id and v.reviewer_id = ?', [reviewerId]));
}

/** Endorsed rounds waiting for a curator (curators see every mechanism). */
const toAdopt = (db: Db) => roundsWithMechanism(db).where('r.state', 'endorsed');

export async function listMyReviews(db: Db, reviewerId: number) {
  return myReviews(db, reviewerId).orderBy('r.updated_at').select(ROUND_COLUMNS);
}

export async function listToAdopt(db: Db) {
  return toAdopt(db).orderBy('r.updated_at').select(ROUND_COLUMNS);
}

export async function countMyReviews(db: Db, reviewerId: number): Promise<number> {
  const [{ count }] = await myReviews(db, reviewerId).count({ count: '*' });
  return Number(count);
}

export async function countToAdopt(db: Db): Promise<number> {
  const [{ count }] = await toAdopt(db).count({ count: '*' });
  return Number(count);
}
