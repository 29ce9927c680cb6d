import type { Knex } from 'knex';
import { whereVisibleTo } from '../mechanisms/visibility.queries';
import type { Viewer } from '../mechanisms/access';
import type { MechanismChoice } from './sets.schemas';

type Db = Knex | Knex.Transaction;

// `%`, `_` and `\` typed by a person are letters to find, not LIKE patterns.
const likePattern = (text: string) => `%${text.replace(/[\\%_]/g, (ch) => `\\${ch}`)}%`;

/**
 * Mechanisms the viewer may put in a set (those they can see), whose title or address holds the
 * typed text anywhere (a picker searches as one types, so a stemmed full-text match would miss
 * "brom"), titles starting with it first.
 */
export async function findChoices(db: Db, viewer: Viewer, text: string, limit: number): Promise<MechanismChoice[]> {
  const query = whereVisibleTo(db('mechanisms as m'), viewer)
    .join('users as u', 'u.id', 'm.owner_id')
    .leftJoin('revisions as ref', 'ref.id', 'm.reference_revision_id');
  if (text) query.where((match) => match.whereILike('m.title', likePattern(text)).orWhereILike('m.slug', likePattern(text)));
  return query
    .orderByRaw('(m.title ilike ?) desc', [`${likePattern(text).slice(1)}`])
    .orderBy('m.title').orderBy('m.id')
    .limit(limit)
    .select('m.slug', 'm.title', 'm.visibility', 'u.name as ownerName', 'm.latest_revision_number as latestRevision', 'ref.number as referenceRevision');
}
