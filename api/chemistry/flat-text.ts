/**
 * Joins parts into one flat string. A template literal or `+` keeps a long result as a tree of
 * concatenation nodes, several per string; the texts kept in a large analysis (equations,
 * messages) would then be tens of thousands of small objects for the collector to copy and mark.
 * `Array.prototype.join` writes one flat string instead.
 */
export function flatText(...parts: (string | number)[]): string {
  return parts.join('');
}
