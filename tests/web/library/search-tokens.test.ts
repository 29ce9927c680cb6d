import { describe, expect, it } from 'vitest';
import { formatSearch, parseSearch } from '@web/components/library/searchTokens';
import { apiQuery, chipsOf, filtersFromQuery, queryFromFilters, withoutChip } from '@web/components/library/libraryQuery';

describe('parseSearch', () => {
  it('keeps plain words as the full-text query', () => {
    expect(parseSearch('  bromine   ozone ')).toEqual({ text: 'bromine ozone' });
  });

  it('takes species: and tag: tokens out of the words', () => {
    expect(parseSearch('ozone species:BrO• loss tag:Surface')).toEqual({ text: 'ozone loss', species: 'BrO•', tag: 'surface' });
  });

  it('writes an ASCII radical mark as the canonical dot (step notation)', () => {
    expect(parseSearch('species:BrO.').species).toBe('BrO•');
  });

  it('accepts a quoted value and ignores an empty token', () => {
    expect(parseSearch('tag:"field station" species:')).toEqual({ text: '', tag: 'field station' });
  });

  it('reads tokens whatever the case of their name, but not inside a word', () => {
    expect(parseSearch('SPECIES:O(1D)')).toEqual({ text: '', species: 'O(1D)' });
    expect(parseSearch('subspecies:x')).toEqual({ text: 'subspecies:x' });
  });

  it('formats terms back into the same search', () => {
    const terms = { text: 'ozone', species: 'Fe^3+', tag: 'field station' };
    expect(parseSearch(formatSearch(terms))).toEqual(terms);
  });
});

describe('the library query in the address', () => {
  it('reads filters from the address, ignoring values it does not know', () => {
    const filters = filtersFromQuery({ q: 'tag:teaching', state: 'adopted', visibility: 'secret', page: '3', sort: 'title', mine: '1' });
    expect(filters).toEqual({ search: 'tag:teaching', state: 'adopted', visibility: null, mine: true, page: 3, sort: 'title', order: null });
    expect(filtersFromQuery(queryFromFilters(filters) as never)).toEqual(filters);
  });

  it('maps the search box onto the API parameters q, species and tag', () => {
    const filters = filtersFromQuery({ q: 'salt lake species:Br. tag:field-station', mine: '1' });
    expect(apiQuery(filters, 4)).toMatchObject({ q: 'salt lake', species: 'Br•', tag: 'field-station', author: 4, page: 1, pageSize: 20, sort: 'updated' });
  });

  it('shows each active filter as a chip, and removing one keeps the others', () => {
    const filters = filtersFromQuery({ q: 'ozone species:BrO•', state: 'none', page: '2' });
    expect(chipsOf(filters).map((chip) => chip.label)).toEqual(['“ozone”', 'contains BrO•', 'never reviewed']);
    const without = withoutChip(filters, 'species');
    expect(without.search).toBe('ozone');
    expect(without.state).toBe('none');
    expect(without.page).toBe(1);
  });
});
