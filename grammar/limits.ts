import type { Token } from 'moo';
import { diagnostic, PARSER_CODES, type Diagnostic } from './diagnostics';

/** Largest text accepted (characters): about 120k typical steps. */
export const MAX_TEXT_CHARS = 8_000_000;
/** Longest line accepted (characters). */
export const MAX_LINE_CHARS = 2_000;
/** Most tokens on one line (a long real step has about 60). */
export const MAX_LINE_TOKENS = 300;
/** Deepest bracket nesting accepted inside a formula. */
export const MAX_NESTING = 8;
/**
 * Tokens the Earley parser may read per text (about 3 µs each, so at most about 10 s). Lines of a
 * shape seen before cost no parse; a lumped mechanism whose every line has its own shape needs
 * about 25 per line, so this reads 100 000 such lines, more than the text limit holds.
 */
export const PARSE_TOKEN_BUDGET = 3_000_000;

export function textTooLarge(text: string): Diagnostic | null {
  if (text.length <= MAX_TEXT_CHARS) return null;
  const message = `the text has ${text.length} characters; the limit is ${MAX_TEXT_CHARS}`;
  return diagnostic('error', PARSER_CODES.inputTooLarge, { line: 1, column: 1 }, message);
}

/** A line whose part before any comment is too long (a long comment costs one match and is kept). */
export function lineTooLong(text: string, line: number): Diagnostic | null {
  if (text.length <= MAX_LINE_CHARS) return null;
  const comment = text.indexOf('#');
  const code = comment >= 0 ? comment : text.length;
  if (code <= MAX_LINE_CHARS) return null;
  const message = `the line has ${code} characters before any comment; the limit is ${MAX_LINE_CHARS}`;
  return diagnostic('error', PARSER_CODES.lineTooLong, { line, column: MAX_LINE_CHARS + 1 }, message);
}

function deepestBracket(tokens: readonly Token[]): Token | null {
  let depth = 0;
  for (const token of tokens) {
    if (token.type === 'lparen' || token.type === 'lbracket') depth += 1;
    else if (token.type === 'rparen' || token.type === 'rbracket') depth -= 1;
    if (depth > MAX_NESTING) return token;
  }
  return null;
}

/** Bounds the parser's work on one line: too many tokens, or brackets nested too deep. */
export function tooComplex(tokens: readonly Token[], line: number): Diagnostic | null {
  if (tokens.length > MAX_LINE_TOKENS) {
    const message = `the line has ${tokens.length} tokens; the limit is ${MAX_LINE_TOKENS}`;
    return diagnostic('error', PARSER_CODES.lineTooLong, { line, column: tokens[MAX_LINE_TOKENS].col }, message);
  }
  const deep = deepestBracket(tokens);
  if (!deep) return null;
  const message = `brackets are nested more than ${MAX_NESTING} deep`;
  return diagnostic('error', PARSER_CODES.syntaxError, { line, column: deep.col }, message, { found: deep.text });
}

/** Said once when the token budget runs out; later lines of new shapes are skipped. */
export function budgetSpent(line: number): Diagnostic {
  const message = `the text has too many different line shapes to check (over ${PARSE_TOKEN_BUDGET} tokens parsed); lines from here on with a new shape are not read`;
  return diagnostic('error', PARSER_CODES.inputTooLarge, { line, column: 1 }, message);
}
