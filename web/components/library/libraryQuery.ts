import type { LocationQuery, LocationQueryRaw } from 'vue-router';
import type { LibraryQuery, LibrarySort, RoundState, Visibility } from '@web/services/mechanisms';
import { formatSearch, parseSearch } from './searchTokens';

/** The library's state lives in the address (shareable, back-button friendly); this reads and writes it. */
export interface LibraryFilters {
  search: string;
  state: RoundState | 'none' | null;
  visibility: Visibility | null;
  mine: boolean;
  page: number;
  sort: LibrarySort;
  order: 'asc' | 'desc' | null;
}

export const PAGE_SIZE = 20;
const STATES = ['open', 'revise-requested', 'endorsed', 'adopted', 'declined', 'withdrawn', 'none'];
const SORTS: LibrarySort[] = ['updated', 'created', 'title', 'relevance'];

const one = (value: LocationQuery[string]) => (Array.isArray(value) ? value[0] : value) ?? null;

export function filtersFromQuery(query: LocationQuery): LibraryFilters {
  const state = one(query.state);
  const visibility = one(query.visibility);
  const sort = one(query.sort) as LibrarySort | null;
  const order = one(query.order);
  const page = Number(one(query.page));
  return {
    search: one(query.q) ?? '',
    state: state && STATES.includes(state) ? (state as LibraryFilters['state']) : null,
    visibility: visibility === 'public' || visibility === 'private' ? visibility : null,
    mine: one(query.mine) === '1',
    page: Number.isInteger(page) && page > 0 ? page : 1,
    sort: sort && SORTS.includes(sort) ? sort : 'updated',
    order: order === 'asc' || order === 'desc' ? order : null,
  };
}

export function queryFromFilters(filters: LibraryFilters): LocationQueryRaw {
  const query: LocationQueryRaw = {};
  if (filters.search) query.q = filters.search;
  if (filters.state) query.state = filters.state;
  if (filters.visibility) query.visibility = filters.visibility;
  if (filters.mine) query.mine = '1';
  if (filters.page > 1) query.page = String(filters.page);
  if (filters.sort !== 'updated') query.sort = filters.sort;
  if (filters.order) query.order = filters.order;
  return query;
}

/** The API request for these filters; `me` is the signed-in person's id (for "only mine"). */
export function apiQuery(filters: LibraryFilters, me: number | null): LibraryQuery {
  const terms = parseSearch(filters.search);
  return {
    q: terms.text || undefined,
    species: terms.species,
    tag: terms.tag,
    author: filters.mine && me !== null ? me : undefined,
    state: filters.state ?? undefined,
    visibility: filters.visibility ?? undefined,
    sort: filters.sort,
    order: filters.order ?? undefined,
    page: filters.page,
    pageSize: PAGE_SIZE,
  };
}

export interface FilterChip {
  key: 'text' | 'species' | 'tag' | 'state' | 'visibility' | 'mine';
  label: string;
}

/** The active filters as removable chips. */
export function chipsOf(filters: LibraryFilters): FilterChip[] {
  const terms = parseSearch(filters.search);
  const chips: FilterChip[] = [];
  if (terms.text) chips.push({ key: 'text', label: `“${terms.text}”` });
  if (terms.species) chips.push({ key: 'species', label: `contains ${terms.species}` });
  if (terms.tag) chips.push({ key: 'tag', label: `tag: ${terms.tag}` });
  if (filters.state) chips.push({ key: 'state', label: filters.state === 'none' ? 'never reviewed' : `round: ${filters.state.replace('-', ' ')}` });
  if (filters.visibility) chips.push({ key: 'visibility', label: filters.visibility });
  if (filters.mine) chips.push({ key: 'mine', label: 'only mine' });
  return chips;
}

/** The filters without one chip's condition (back to the first page). */
export function withoutChip(filters: LibraryFilters, key: FilterChip['key']): LibraryFilters {
  const next = { ...filters, page: 1 };
  if (key === 'state') next.state = null;
  else if (key === 'visibility') next.visibility = null;
  else if (key === 'mine') next.mine = false;
  else {
    const terms = parseSearch(filters.search);
    if (key === 'text') terms.text = '';
    else delete terms[key];
    next.search = formatSearch(terms);
  }
  return next;
}
