import type { Token } from 'moo';
import nearley from 'nearley';
import type { ParsedMechanism } from './ast';
import { convertDirective, convertStep } from './convert-line';
import type { LineContext } from './convert-species';
import { diagnostic, PARSER_CODES } from './diagnostics';
import type { RawLine } from './raw';
import { knownTemplate, signatureOf, templateOf } from './line-templates';
import grammar, { lexer } from './steps.generated';
import { expectedAt, syntaxDiagnostic, unbalancedBracket } from './syntax-errors';

export type * from './ast';
export type { Diagnostic, Severity } from './diagnostics';

/** Largest text accepted (characters): about 120k typical steps. */
export const MAX_TEXT_CHARS = 8_000_000;
/** Longest line accepted (characters); bounds the work spent on any one line. */
export const MAX_LINE_CHARS = 2_000;

const KNOWN_DIRECTIVES = ['title', 'units', 'conditions', 'terminal', 'intermediates', 'species'];
const BLANK_OR_COMMENT = /^\s*(?:#.*)?$/;
const DIRECTIVE_NAME = /^\s*%([A-Za-z_]*)/;

const compiled = nearley.Grammar.fromCompiled(grammar);

/**
 * Parses a mechanism text line by line with one compiled grammar. Never throws: every faulty
 * line becomes a diagnostic (line, column, code, what was found and expected) and the
 * well-formed lines are still returned.
 */
export function parseMechanism(text: string): ParsedMechanism {
  const parsed: ParsedMechanism = { steps: [], directives: [], diagnostics: [], lineCount: 0 };
  if (typeof text !== 'string') {
    parsed.diagnostics.push(diagnostic('error', PARSER_CODES.inputTooLarge, { line: 1, column: 1 }, 'the mechanism must be text'));
    return parsed;
  }
  if (text.length > MAX_TEXT_CHARS) {
    const message = `the text has ${text.length} characters; the limit is ${MAX_TEXT_CHARS}`;
    parsed.diagnostics.push(diagnostic('error', PARSER_CODES.inputTooLarge, { line: 1, column: 1 }, message));
    return parsed;
  }
  const lines = text.replace(/^\uFEFF/, '').split(/\r\n|\n|\r/);
  parsed.lineCount = lines.length;
  const formulas = new Map();
  for (let index = 0; index < lines.length; index += 1) {
    const context: LineContext = { line: index + 1, text: lines[index], tokens: [], diagnostics: parsed.diagnostics, formulas };
    try {
      parseLine(context, parsed);
    } catch (error) {
      const message = `this line could not be read (${error instanceof Error ? error.message : String(error)})`;
      parsed.diagnostics.push(diagnostic('error', PARSER_CODES.syntaxError, { line: context.line, column: 1 }, message));
    }
  }
  return parsed;
}

function parseLine(context: LineContext, parsed: ParsedMechanism): void {
  const { text, line } = context;
  if (text.length > MAX_LINE_CHARS) {
    const message = `the line has ${text.length} characters; the limit is ${MAX_LINE_CHARS}`;
    parsed.diagnostics.push(diagnostic('error', PARSER_CODES.lineTooLong, { line, column: MAX_LINE_CHARS + 1 }, message));
    return;
  }
  if (BLANK_OR_COMMENT.test(text)) return;
  if (!directiveIsKnown(context)) return;
  context.tokens = lexLine(text);
  const raw = runGrammar(context);
  if (!raw) return;
  if (raw.kind === 'step') parsed.steps.push(convertStep(raw, context));
  else parsed.directives.push(convertDirective(raw, context));
}

function directiveIsKnown(context: LineContext): boolean {
  const match = DIRECTIVE_NAME.exec(context.text);
  if (!match || KNOWN_DIRECTIVES.includes(match[1])) return true;
  const column = context.text.indexOf('%') + 1;
  const expected = KNOWN_DIRECTIVES.map((name) => `%${name}`);
  const message = `unknown directive %${match[1]}; known: ${expected.join(', ')}`;
  context.diagnostics.push(diagnostic('error', PARSER_CODES.unknownDirective, { line: context.line, column }, message, { found: `%${match[1]}`, expected }));
  return false;
}

function lexLine(text: string): Token[] {
  const tokens: Token[] = [];
  lexer.reset(text);
  for (let token = lexer.next(); token; token = lexer.next()) tokens.push(token);
  return tokens;
}

/** Hands nearley the tokens of one line that were already lexed. */
function replayLexer(tokens: readonly Token[]) {
  let next = 0;
  return {
    reset: () => undefined,
    next: () => tokens[next++],
    save: () => ({}),
    formatError: () => 'syntax error',
    has: () => true,
  };
}

/** Parses one line (or reuses the template of a line with the same token types); reports the first syntax error. */
function runGrammar(context: LineContext): RawLine | null {
  const signature = signatureOf(context.tokens);
  const known = knownTemplate(signature);
  if (known !== undefined) return known as RawLine;
  const tokens = context.tokens;
  const parser = new nearley.Parser(compiled, { lexer: replayLexer(tokens) });
  // nearley's own error text walks the whole parse table; only the position is needed here.
  Object.assign(parser, { reportError: () => 'syntax error', reportLexerError: () => 'syntax error' });
  const table = (parser as unknown as { table: unknown[] }).table;
  try {
    parser.feed(context.text);
  } catch (error) {
    const token = (error as { token?: Token }).token ?? null;
    reportSyntax(context, token, expectedAt(parser, table.length - 2));
    return null;
  }
  if (parser.results.length === 0) {
    reportSyntax(context, null, expectedAt(parser, table.length - 1));
    return null;
  }
  return templateOf(signature, tokens, parser.results[0], parser.results.length === 1) as RawLine;
}

function reportSyntax(context: LineContext, token: Token | null, expected: string[]): void {
  const bracket = unbalancedBracket(context.text, context.line);
  context.diagnostics.push(bracket ?? syntaxDiagnostic(context.line, token, context.text, expected));
}
