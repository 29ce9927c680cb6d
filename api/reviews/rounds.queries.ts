import type { Knex } from 'knex';
import type { RoundState, Verdict } from './round-state';

type Db = Knex | Knex.Transaction;

export interface RoundRow {
  id: number;
  mechanismId: number;
  revisionId: number;
  openedRevisionId: number;
  state: RoundState;
  endorsementsNeeded: number;
  openedBy: number;
  createdAt: Date;
  closedAt: Date | null;
}

const COLUMNS = [
  'id', 'mechanism_id as mechanismId', 'revision_id as revisionId', 'opened_revision_id as openedRevisionId',
  'state', 'endorsements_needed as endorsementsNeeded', 'opened_by as openedBy', 'created_at as createdAt', 'closed_at as closedAt',
];

/** The new id, or null when the mechanism already has a round in progress (review_rounds_one_active). */
export async function insert(db: Db, values: { mechanismId: number; revisionId: number; endorsementsNeeded: number; openedBy: number }): Promise<number | null> {
  const rows = await db('review_rounds')
    .insert({
      mechanism_id: values.mechanismId, revision_id: values.revisionId, opened_revision_id: values.revisionId,
      endorsements_needed: values.endorsementsNeeded, opened_by: values.openedBy,
    })
    .onConflict(db.raw("(mechanism_id) where state in ('open','revise-requested','endorsed')"))
    .ignore()
    .returning('id');
  return rows[0]?.id ?? null;
}

/** Locks the round row: state changes on one round are serialised. */
export async function findByIdForUpdate(db: Db, id: number): Promise<RoundRow | undefined> {
  return db('review_rounds').where({ id }).forUpdate().first(COLUMNS);
}

export async function findById(db: Db, id: number): Promise<RoundRow | undefined> {
  return db('review_rounds').where({ id }).first(COLUMNS);
}

export async function findActiveForMechanism(db: Db, mechanismId: number): Promise<RoundRow | undefined> {
  return db('review_rounds').where({ mechanism_id: mechanismId }).whereIn('state', ['open', 'revise-requested', 'endorsed']).first(COLUMNS);
}

export async function listForMechanism(db: Db, mechanismId: number) {
  return db('review_rounds as r')
    .join('revisions as rv', 'rv.id', 'r.revision_id')
    .where('r.mechanism_id', mechanismId)
    .orderBy('r.id', 'desc')
    .select('r.id', 'r.state', 'rv.number as revision', 'r.created_at as createdAt', 'r.closed_at as closedAt');
}

export async function update(db: Db, id: number, patch: { state?: RoundState; revisionId?: number }): Promise<void> {
  const closing = patch.state && !['open', 'revise-requested', 'endorsed'].includes(patch.state);
  await db('review_rounds').where({ id }).update({
    ...(patch.state ? { state: patch.state } : {}),
    ...(patch.revisionId ? { revision_id: patch.revisionId } : {}),
    ...(closing ? { closed_at: db.fn.now() } : {}),
    updated_at: db.fn.now(),
  });
}

export async function reviewers(db: Db, roundId: number): Promise<Array<{ id: number; name: string; email: string }>> {
  return db('round_reviewers as rr').join('users as u', 'u.id', 'rr.reviewer_id')
    .where('rr.round_id', roundId).orderBy('u.name').select('u.id', 'u.name', 'u.email');
}

export async function assignReviewer(db: Db, roundId: number, reviewerId: number, assignedBy: number): Promise<boolean> {
  const rows = await db('round_reviewers')
    .insert({ round_id: roundId, reviewer_id: reviewerId, assigned_by: assignedBy })
    .onConflict(['round_id', 'reviewer_id']).ignore().returning('reviewer_id');
  return rows.length === 1;
}

export async function upsertVerdict(db: Db, values: { roundId: number; revisionId: number; reviewerId: number; verdict: Verdict; comment: string }) {
  await db('verdicts')
    .insert({ round_id: values.roundId, revision_id: values.revisionId, reviewer_id: values.reviewerId, verdict: values.verdict, comment: values.comment })
    .onConflict(['round_id', 'revision_id', 'reviewer_id'])
    .merge(['verdict', 'comment', 'created_at']);
}

export async function verdicts(db: Db, roundId: number, revisionId?: number) {
  const query = db('verdicts as v').join('users as u', 'u.id', 'v.reviewer_id').join('revisions as rv', 'rv.id', 'v.revision_id')
    .where('v.round_id', roundId).orderBy('v.id')
    .select('v.reviewer_id as reviewerId', 'u.name as reviewerName', 'rv.number as revision', 'v.verdict', 'v.comment', 'v.created_at as createdAt');
  if (revisionId) query.where('v.revision_id', revisionId);
  return query;
}
