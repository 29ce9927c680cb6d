const IDENTIFIER = /^[A-Za-z_]\w*$/;

function escapeForRegExp(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}

/**
 * The 1-based column of the first occurrence of a token in an expression. mathjs trees carry no
 * positions, so a refused node is pointed at by finding its token again: an identifier only as a
 * whole word, a pattern by its first match, anything else as plain text. Falls back to column 1 when the token is not found.
 */
export function locateToken(text: string, token: string | RegExp): number {
  if (token instanceof RegExp) {
    const match = token.exec(text);
    return match ? match.index + 1 : 1;
  }
  if (token === '') return 1;
  if (IDENTIFIER.test(token)) {
    const match = new RegExp(`(?<![\\w.])${escapeForRegExp(token)}(?!\\w)`).exec(text);
    return match ? match.index + 1 : 1;
  }
  const at = text.indexOf(token);
  return at >= 0 ? at + 1 : 1;
}
