import type { Knex } from 'knex';
import { whereVisibleTo } from '../mechanisms/visibility.queries';
import type { ListMechanismsQuery } from '../mechanisms/mechanisms.schemas';
import type { Role } from '../users/users.schemas';

type Db = Knex | Knex.Transaction;
interface Viewer {
  id: number;
  roles: readonly Role[];
}

const ROUND_STATE = `(select r.state from review_rounds r where r.mechanism_id = m.id order by r.id desc limit 1)`;

const LATEST = 'rv.mechanism_id = m.id and rv.number = m.latest_revision_number';
/** Species keys use `•` for radical marks; `.` is its ASCII spelling (step-notation.md), the only dot a key has. */
export const canonicalRadicalMarks = (key: string) => key.replace(/\./g, '•');

/**
 * Plain words find a mechanism by its title and summary (stemmed full text), or by a species or a step
 * label its latest revision holds, so that the header's "mechanism, species or label" box finds `BrO•`,
 * `Br.` or `B3` without the library's `species:` token.
 */
function matchesWords(query: Knex.QueryBuilder, q: string) {
  return query
    .whereRaw("m.search @@ websearch_to_tsquery('english', ?)", [q])
    .orWhereExists((sub) =>
      sub.from('revisions as rv').join('revision_species as rs', 'rs.revision_id', 'rv.id')
        .whereRaw(LATEST).where('rs.species_key', canonicalRadicalMarks(q)))
    .orWhereExists((sub) =>
      sub.fromRaw("revisions as rv, jsonb_array_elements(rv.analysis->'steps') as step")
        .whereRaw(LATEST).whereRaw("lower(step->>'label') = lower(?)", [q]));
}

function filtered(db: Db, viewer: Viewer, filters: ListMechanismsQuery) {
  const query = whereVisibleTo(db('mechanisms as m'), viewer);
  if (filters.q) query.where((words) => matchesWords(words, filters.q!));
  if (filters.tag) query.whereRaw('? = any(m.tags)', [filters.tag]);
  if (filters.author) query.where('m.owner_id', filters.author);
  if (filters.visibility) query.where('m.visibility', filters.visibility);
  if (filters.state === 'none') query.whereRaw(`${ROUND_STATE} is null`);
  else if (filters.state) query.whereRaw(`${ROUND_STATE} = ?`, [filters.state]);
  // "Which mechanisms contain this species": its latest revision mentions it.
  if (filters.species) {
    query.whereExists((sub) =>
      sub.from('revisions as rv').join('revision_species as rs', 'rs.revision_id', 'rv.id')
        .whereRaw(LATEST).where('rs.species_key', filters.species!));
  }
  return query;
}

function ordered(query: Knex.QueryBuilder, filters: ListMechanismsQuery) {
  const direction = filters.order ?? (filters.sort === 'title' ? 'asc' : 'desc');
  if (filters.sort === 'relevance' && filters.q) {
    return query.orderByRaw(`ts_rank(m.search, websearch_to_tsquery('english', ?)) ${direction}, m.id`, [filters.q]);
  }
  const column = { updated: 'm.updated_at', created: 'm.created_at', title: 'm.title', relevance: 'm.updated_at' }[filters.sort];
  return query.orderBy([{ column, order: direction }, { column: 'm.id', order: direction }]);
}

/** One page of the mechanisms the viewer may see, with the total for the pager. */
export async function findPage(db: Db, viewer: Viewer, filters: ListMechanismsQuery) {
  const [{ total }] = await filtered(db, viewer, filters).count({ total: '*' });
  const rows = await ordered(filtered(db, viewer, filters), filters)
    .join('users as u', 'u.id', 'm.owner_id')
    .leftJoin('revisions as ref', 'ref.id', 'm.reference_revision_id')
    .limit(filters.pageSize)
    .offset((filters.page - 1) * filters.pageSize)
    .select(
      'm.id', 'm.slug', 'm.title', 'm.tags', 'm.visibility', 'm.latest_revision_number as latestRevisionNumber',
      'm.updated_at as updatedAt', 'u.id as ownerId', 'u.name as ownerName', 'ref.number as referenceRevision',
      db.raw(`${ROUND_STATE} as "roundState"`),
      db.raw(`(select jsonb_array_length(rv.analysis->'steps') from revisions rv
               where rv.mechanism_id = m.id and rv.number = m.latest_revision_number) as "stepCount"`),
      db.raw(`(select count(*)::int from revision_species rs join revisions rv on rv.id = rs.revision_id
               where rv.mechanism_id = m.id and rv.number = m.latest_revision_number) as "speciesCount"`),
    );
  return { items: rows, total: Number(total), page: filters.page, pageSize: filters.pageSize };
}
