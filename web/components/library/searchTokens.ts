/**
 * The library's search box: plain words for the full-text search, plus `species:KEY` and
 * `tag:NAME` tokens (a value may be quoted). Maps to the API's `q`, `species` and `tag`.
 */
export interface SearchTerms {
  text: string;
  species?: string;
  tag?: string;
}

const TOKEN = /(?:^|\s)(species|tag):(?:"([^"]*)"|(\S*))/gi;

/** The canonical species key: ASCII dots written as radical marks become `•` (step-notation.md). */
export function canonicalSpecies(value: string): string {
  return value.replace(/\./g, '•');
}

export function parseSearch(input: string): SearchTerms {
  const terms: SearchTerms = { text: '' };
  const text = input.replace(TOKEN, (_whole, name: string, quoted: string | undefined, bare: string | undefined) => {
    const value = (quoted ?? bare ?? '').trim();
    if (!value) return ' ';
    if (name.toLowerCase() === 'species') terms.species = canonicalSpecies(value);
    else terms.tag = value.toLowerCase();
    return ' ';
  });
  terms.text = text.replace(/\s+/g, ' ').trim();
  return terms;
}

const quoteIfNeeded = (value: string) => (/\s/.test(value) ? `"${value}"` : value);

/** The search box text for some terms: the inverse of {@link parseSearch}. */
export function formatSearch(terms: SearchTerms): string {
  return [
    terms.text,
    terms.species ? `species:${quoteIfNeeded(terms.species)}` : '',
    terms.tag ? `tag:${quoteIfNeeded(terms.tag)}` : '',
  ]
    .filter(Boolean)
    .join(' ');
}
