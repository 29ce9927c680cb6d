import type { Parser } from 'nearley';
import { diagnostic, PARSER_CODES, type Diagnostic } from './diagnostics';
import { lookAlikeAt } from './look-alikes';

/** nearley's parse table is not in its typings; this is the part read here. */
interface ParseTable {
  table: { states: { rule: { symbols: unknown[] }; dot: number }[] }[];
}

// At the start of a line every directive is possible: one entry names them all.
const ANY_DIRECTIVE = 'a directive (%title, %units, %conditions, %terminal, %intermediates, %species)';

const TOKEN_NAMES: Record<string, string> = {
  label: 'a label',
  colon: "':'",
  arrow: 'an arrow (->, →, <=>, ⇌)',
  at: "'@'",
  photon: 'hν',
  electron: 'e^-',
  stateTag: 'a state tag such as (3P)',
  lparen: "'('",
  rparen: "')'",
  lbracket: "'['",
  rbracket: "']'",
  number: 'a number',
  word: 'a formula or declared name',
  thirdBody: 'M',
  radical: 'a radical mark (• or .)',
  charge: 'a charge such as ^+ or ^2-',
  star: "'*'",
  plus: "'+'",
  comma: "','",
  equals: "'='",
  rateText: 'a rate expression',
  bar: "'|'",
  text: 'a title',
  value: 'a value',
  titleDirective: ANY_DIRECTIVE,
  assignDirective: ANY_DIRECTIVE,
  listDirective: ANY_DIRECTIVE,
  speciesDirective: ANY_DIRECTIVE,
};

/** Token kinds the parser could have accepted at table column `index`, in plain words. */
export function expectedAt(parser: Parser, index: number): string[] {
  const column = (parser as unknown as ParseTable).table[index];
  const names = new Set<string>();
  for (const state of column?.states ?? []) {
    const symbol = state.rule.symbols[state.dot] as { type?: string } | undefined;
    if (symbol && typeof symbol === 'object' && symbol.type) names.add(TOKEN_NAMES[symbol.type] ?? symbol.type);
  }
  return [...names];
}

const PAIRS: Record<string, string> = { ')': '(', ']': '[' };

/** The first bracket without a partner before any `@` or `#`, if there is one. */
export function unbalancedBracket(line: string, lineNumber: number): Diagnostic | null {
  const open: { char: string; index: number }[] = [];
  for (let index = 0; index < line.length; index += 1) {
    const char = line[index];
    if (char === '@' || char === '#') break;
    if (char === '(' || char === '[') open.push({ char, index });
    else if (char === ')' || char === ']') {
      const last = open.pop();
      if (!last || last.char !== PAIRS[char]) return bracketDiagnostic(lineNumber, index, char, last ? closerOf(last.char) : null);
    }
  }
  const left = open.pop();
  return left ? bracketDiagnostic(lineNumber, left.index, left.char, null) : null;
}

function closerOf(opener: string): string {
  return opener === '(' ? ')' : ']';
}

function bracketDiagnostic(line: number, index: number, found: string, expected: string | null): Diagnostic {
  const opening = found === '(' || found === '[';
  const message = opening
    ? `'${found}' is never closed`
    : expected
      ? `'${found}' closes nothing here; expected '${expected}'`
      : `'${found}' has no opening bracket`;
  const expectedList = opening ? [`'${closerOf(found)}'`] : expected ? [`'${expected}'`] : [];
  return diagnostic('error', PARSER_CODES.unbalancedBrackets, { line, column: index + 1 }, message, { found, expected: expectedList });
}

/** A character as a message shows it: quoted, or by its code point when it cannot be seen (U+00A0). */
function visible(char: string): string {
  const code = char.codePointAt(0) ?? 0;
  const invisible = code < 0x20 || (code >= 0x7f && code <= 0xa0) || (code >= 0x2000 && code <= 0x200f) || code === 0x202f || code === 0xfeff;
  return invisible && char.length === 1 ? `U+${code.toString(16).toUpperCase().padStart(4, '0')}` : `'${char}'`;
}

/** The reserved words, for a syntax error where one stands in a place of a name (`%species M = N2`). */
const RESERVED_WORDS: Record<string, string> = {
  thirdBody: 'any third body',
  photon: 'a photon',
  electron: 'an electron',
};

// A number in scientific notation standing where a coefficient stands (before any `@`): at the
// start of a side, after a label's colon, a `+` or an arrow.
const SCIENTIFIC_COEFFICIENT = /(?:^|[:+>→⇌]|\s)\s*(\d+(?:\.\d+)?[eE][+-]?\d+)\s+\S/;

/** A coefficient written in scientific notation (`1e-3 O2`), which the notation does not read, with its column. */
export function scientificCoefficient(lineText: string): { text: string; column: number } | null {
  const equation = lineText.split('@')[0];
  const match = SCIENTIFIC_COEFFICIENT.exec(equation);
  if (!match) return null;
  return { text: match[1], column: match.index + match[0].indexOf(match[1]) + 1 };
}

/** The message for a coefficient in scientific notation. */
export function scientificCoefficientMessage(text: string): string {
  return `coefficient ${text} is in scientific notation; a coefficient is a whole number, decimal or fraction (scientific notation belongs to rate expressions after @)`;
}

function directiveLine(lineText: string): boolean {
  return lineText.trimStart().startsWith('%');
}

// An arrow anywhere before the rate: without one, "the line ends too early" says too little.
const ANY_ARROW = /->|→|<=>|⇌/;

/** A syntax error at a token (or at the end of the line when `token` is null). */
export function syntaxDiagnostic(
  line: number,
  token: { text: string; col: number; type?: string } | null,
  lineText: string,
  expected: string[],
): Diagnostic {
  const scientific = scientificCoefficient(lineText);
  if (scientific) {
    return diagnostic('error', PARSER_CODES.syntaxError, { line, column: scientific.column }, scientificCoefficientMessage(scientific.text), { found: scientific.text, expected });
  }
  // An invalid token runs to the end of the line: the character is its first code point (whole, even outside the BMP).
  const found = token ? (token.type === 'invalid' ? String.fromCodePoint(token.text.codePointAt(0) ?? 0) : token.text) : 'end of line';
  const shown = visible(found);
  const column = token ? token.col : lineText.trimEnd().length + 1;
  const noArrow = !token && !directiveLine(lineText) && !ANY_ARROW.test(lineText.split('@')[0]);
  const what = token?.type === 'invalid' ? `unexpected character ${shown}` : token ? `unexpected '${found}'` : noArrow ? 'the line ends too early: the step has no arrow between its reactants and products' : 'the line ends too early';
  const lookAlike = token && !(directiveLine(lineText) && found === '=') ? lookAlikeAt(lineText.slice(token.col - 1)) : null;
  // Only where a name was wanted and the reserved word itself was not: `%species M = N2`, not `O + M M`.
  const nameWanted = expected.includes(TOKEN_NAMES.word) && !expected.includes(TOKEN_NAMES[token?.type ?? ''] ?? '');
  const reserved = token && !lookAlike && nameWanted ? RESERVED_WORDS[token.type ?? ''] : undefined;
  const hint = lookAlike ? ` (write ${lookAlike.write === ' ' ? 'a plain space' : `'${lookAlike.write}'`} for ${lookAlike.found === found ? shown : `'${lookAlike.found}'`})` : reserved ? ` (${found} is reserved: ${reserved})` : '';
  const message = expected.length > 0 ? `${what}${hint}; expected ${expected.join(', ')}` : `${what}${hint}`;
  return diagnostic('error', PARSER_CODES.syntaxError, { line, column }, message, { found, expected });
}
