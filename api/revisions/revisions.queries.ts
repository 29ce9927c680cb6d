import type { Knex } from 'knex';
import type { AnalysisView } from './analysis-view';

type Db = Knex | Knex.Transaction;

export interface RevisionRow {
  id: number;
  mechanismId: number;
  number: number;
  parentId: number | null;
  source: string;
  changeNote: string;
  authorId: number;
  analysis: AnalysisView;
  createdAt: Date;
}

// Exact integers from the engine (stoichiometric numbers) are small; JSON has no BigInt.
const bigIntsAsNumbers = (_key: string, value: unknown) => (typeof value === 'bigint' ? Number(value) : value);

const COLUMNS = [
  'id', 'mechanism_id as mechanismId', 'number', 'parent_id as parentId', 'source', 'change_note as changeNote',
  'author_id as authorId', 'analysis', 'created_at as createdAt',
];

export async function insert(db: Db, values: Omit<RevisionRow, 'id' | 'createdAt'>): Promise<RevisionRow> {
  const [row] = await db('revisions')
    .insert({
      mechanism_id: values.mechanismId,
      number: values.number,
      parent_id: values.parentId,
      source: values.source,
      change_note: values.changeNote,
      author_id: values.authorId,
      analysis: JSON.stringify(values.analysis, bigIntsAsNumbers),
    })
    .returning(COLUMNS);
  return row;
}

export async function insertSpecies(db: Db, revisionId: number, keys: string[]): Promise<void> {
  const unique = [...new Set(keys)];
  if (unique.length > 0) await db('revision_species').insert(unique.map((key) => ({ revision_id: revisionId, species_key: key })));
}

export async function findByNumber(db: Db, mechanismId: number, number: number): Promise<RevisionRow | undefined> {
  return db('revisions').where({ mechanism_id: mechanismId, number }).first(COLUMNS);
}

export async function findById(db: Db, id: number): Promise<RevisionRow | undefined> {
  return db('revisions').where({ id }).first(COLUMNS);
}

/** The history without the heavy columns: counts come from the stored analysis. */
export async function listForMechanism(db: Db, mechanismId: number) {
  return db('revisions as r')
    .join('users as u', 'u.id', 'r.author_id')
    .where('r.mechanism_id', mechanismId)
    .orderBy('r.number')
    .select(
      'r.id', 'r.number', 'r.change_note as changeNote', 'r.created_at as createdAt',
      'u.id as authorId', 'u.name as authorName',
      db.raw("jsonb_array_length(r.analysis->'steps') as \"stepCount\""),
      db.raw("(select count(*) from jsonb_array_elements(r.analysis->'diagnostics') d where d->>'severity' = 'error')::int as \"errorCount\""),
    );
}

export async function insertRejected(
  db: Db,
  values: { mechanismId: number; baseNumber: number; latestNumber: number; source: string; changeNote: string; authorId: number },
): Promise<number> {
  const [row] = await db('rejected_submissions')
    .insert({
      mechanism_id: values.mechanismId,
      base_number: values.baseNumber,
      latest_number: values.latestNumber,
      source: values.source,
      change_note: values.changeNote,
      author_id: values.authorId,
    })
    .returning('id');
  return row.id;
}

export async function listRejected(db: Db, mechanismId: number) {
  return db('rejected_submissions')
    .where({ mechanism_id: mechanismId })
    .orderBy('id', 'desc')
    .select('id', 'base_number as baseNumber', 'latest_number as latestNumber', 'source', 'change_note as changeNote',
      'author_id as authorId', 'created_at as createdAt');
}
