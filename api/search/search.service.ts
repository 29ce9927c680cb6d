import type { Knex } from 'knex';
import type { Viewer } from '../mechanisms/access';
import type { ListMechanismsQuery } from '../mechanisms/mechanisms.schemas';
import * as search from './search.queries';

/** The library list: filters, full-text search, species search, sorting and paging, visibility applied. */
export async function listMechanisms(db: Knex, viewer: Viewer, filters: ListMechanismsQuery) {
  if (filters.sort === 'relevance' && !filters.q) filters = { ...filters, sort: 'updated' };
  if (filters.species) filters = { ...filters, species: search.canonicalRadicalMarks(filters.species) };
  return search.findPage(db, viewer, filters);
}
