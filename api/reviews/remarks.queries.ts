import type { Knex } from 'knex';

type Db = Knex | Knex.Transaction;

export interface RemarkRow {
  id: number;
  roundId: number;
  authorId: number;
  state: 'open' | 'settled';
  revisionId: number;
  stepLabel: string | null;
  stepNormalised: string;
  stepLine: number;
  matching: boolean;
}

const COLUMNS = [
  'id', 'round_id as roundId', 'author_id as authorId', 'state', 'revision_id as revisionId', 'step_label as stepLabel',
  'step_normalised as stepNormalised', 'step_line as stepLine', 'matching',
];

export interface NewRemark {
  roundId: number;
  authorId: number;
  body: string;
  bodyHtml: string;
  revisionId: number;
  label: string | null;
  normalised: string;
  line: number;
  context: string;
}

export async function insert(db: Db, values: NewRemark): Promise<number> {
  const [row] = await db('remarks')
    .insert({
      round_id: values.roundId, author_id: values.authorId, body: values.body, body_html: values.bodyHtml,
      revision_id: values.revisionId, step_label: values.label, step_normalised: values.normalised, step_line: values.line,
      original_revision_id: values.revisionId, original_label: values.label, original_normalised: values.normalised,
      original_line: values.line, original_context: values.context,
    })
    .returning('id');
  return row.id;
}

export async function findById(db: Db, id: number): Promise<RemarkRow | undefined> {
  return db('remarks').where({ id }).first(COLUMNS);
}

/** Open remarks that still match a step: the ones that follow a new revision. */
export async function findFollowing(db: Db, roundId: number): Promise<RemarkRow[]> {
  return db('remarks').where({ round_id: roundId, state: 'open', matching: true }).orderBy('id').select(COLUMNS);
}

export async function moveTo(db: Db, id: number, anchor: { revisionId: number; label: string | null; normalised: string; line: number }) {
  await db('remarks').where({ id }).update({
    revision_id: anchor.revisionId, step_label: anchor.label, step_normalised: anchor.normalised,
    step_line: anchor.line, updated_at: db.fn.now(),
  });
}

export async function markNoLongerMatching(db: Db, id: number): Promise<void> {
  await db('remarks').where({ id }).update({ matching: false, updated_at: db.fn.now() });
}

export async function settle(db: Db, id: number): Promise<void> {
  await db('remarks').where({ id }).update({ state: 'settled', updated_at: db.fn.now() });
}

export async function listForRound(db: Db, roundId: number) {
  return db('remarks as k')
    .join('users as u', 'u.id', 'k.author_id')
    .join('revisions as now', 'now.id', 'k.revision_id')
    .join('revisions as first', 'first.id', 'k.original_revision_id')
    .where('k.round_id', roundId)
    .orderBy('k.id')
    .select(
      'k.id', 'k.state', 'k.matching', 'k.body', 'k.body_html as bodyHtml', 'u.id as authorId', 'u.name as authorName',
      'now.number as revision', 'k.step_label as stepLabel', 'k.step_normalised as stepNormalised', 'k.step_line as stepLine',
      'first.number as originalRevision', 'k.original_label as originalLabel', 'k.original_normalised as originalNormalised',
      'k.original_line as originalLine', 'k.original_context as originalContext', 'k.created_at as createdAt',
    );
}

export async function insertReply(db: Db, values: { remarkId: number; authorId: number; body: string; bodyHtml: string }): Promise<number> {
  const [row] = await db('remark_replies')
    .insert({ remark_id: values.remarkId, author_id: values.authorId, body: values.body, body_html: values.bodyHtml })
    .returning('id');
  return row.id;
}

export async function repliesFor(db: Db, remarkIds: number[]) {
  if (remarkIds.length === 0) return [];
  return db('remark_replies as p').join('users as u', 'u.id', 'p.author_id').whereIn('p.remark_id', remarkIds).orderBy('p.id')
    .select('p.id', 'p.remark_id as remarkId', 'p.body', 'p.body_html as bodyHtml', 'u.id as authorId', 'u.name as authorName', 'p.created_at as createdAt');
}
