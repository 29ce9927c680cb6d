import type { Token } from 'moo';
import nearley from 'nearley';
import type { ParsedMechanism, StepNode } from './ast';
import { convertDirective, convertStep } from './convert-line';
import type { LineContext } from './convert-species';
import { diagnostic, PARSER_CODES } from './diagnostics';
import type { RawLine } from './raw';
import { ScratchList } from './scratch-list';
import { knownFailure, knownTemplate, rememberFailure, shapeOf, templateOf, type KnownFailure } from './line-templates';
import grammar, { lexer } from './steps.generated';
import { budgetSpent, lineTooLong, PARSE_TOKEN_BUDGET, textTooLarge, tooComplex } from './limits';
import { expectedAt, syntaxDiagnostic, unbalancedBracket } from './syntax-errors';

export type * from './ast';
export type { Diagnostic, Severity } from './diagnostics';

export { MAX_LINE_CHARS, MAX_LINE_TOKENS, MAX_NESTING, MAX_TEXT_CHARS, PARSE_TOKEN_BUDGET } from './limits';

const KNOWN_DIRECTIVES = ['title', 'units', 'conditions', 'terminal', 'intermediates', 'species'];
const BLANK_OR_COMMENT = /^\s*(?:#.*)?$/;
const DIRECTIVE_NAME = /^\s*%([A-Za-z_]*)/;

const compiled = nearley.Grammar.fromCompiled(grammar);
const NO_TOKENS: readonly Token[] = Object.freeze([]);

/** Receives each step as soon as its line is parsed (instead of the step list). */
export type StepSink = (step: StepNode) => void;

/**
 * Parses a mechanism text line by line with one compiled grammar. Never throws: every faulty
 * line becomes a diagnostic (line, column, code, what was found and expected) and the
 * well-formed lines are still returned. With `onStep`, steps go to it as they are read and
 * `steps` stays empty, so that a large text never holds every step's tree at once.
 */
export function parseMechanism(text: string, onStep?: StepSink): ParsedMechanism {
  const parsed: ParsedMechanism = { steps: [], directives: [], diagnostics: [], lineCount: 0 };
  if (typeof text !== 'string') {
    parsed.diagnostics.push(diagnostic('error', PARSER_CODES.inputTooLarge, { line: 1, column: 1 }, 'the mechanism must be text'));
    return parsed;
  }
  const tooLarge = textTooLarge(text);
  if (tooLarge) {
    parsed.diagnostics.push(tooLarge);
    return parsed;
  }
  const body = text.replace(/^\uFEFF/, '');
  // Splitting at a plain '\n' is much faster than at a pattern; carriage returns need the pattern.
  const lines = body.includes('\r') ? body.split(/\r\n|\n|\r/) : body.split('\n');
  parsed.lineCount = lines.length;
  const formulas = new Map();
  const shapes = new Map();
  const budget = { tokens: PARSE_TOKEN_BUDGET };
  // One context, moved from line to line (lines are read one after another; nothing keeps it).
  const context: LineContext = { line: 0, text: '', tokens: NO_TOKENS, diagnostics: parsed.diagnostics, formulas, shapes, budget };
  for (let index = 0; index < lines.length; index += 1) {
    context.line = index + 1;
    context.text = lines[index];
    context.tokens = NO_TOKENS;
    try {
      parseLine(context, parsed, onStep);
    } catch (error) {
      const message = `this line could not be read (${error instanceof Error ? error.message : String(error)})`;
      parsed.diagnostics.push(diagnostic('error', PARSER_CODES.syntaxError, { line: context.line, column: 1 }, message));
    }
  }
  return parsed;
}

function parseLine(context: LineContext, parsed: ParsedMechanism, onStep: StepSink | undefined): void {
  const { text, line } = context;
  const tooLong = lineTooLong(text, line);
  if (tooLong) {
    parsed.diagnostics.push(tooLong);
    return;
  }
  if (BLANK_OR_COMMENT.test(text)) return;
  if (!directiveIsKnown(context)) return;
  context.tokens = lexLine(text);
  const complex = tooComplex(context.tokens, line);
  if (complex) {
    parsed.diagnostics.push(complex);
    return;
  }
  const raw = runGrammar(context);
  if (!raw) return;
  if (raw.kind !== 'step') {
    parsed.directives.push(convertDirective(raw, context));
    return;
  }
  // A species written with a blank, two charges or two adsorbed marks is a syntax error found
  // while converting: such a line is reported, not analysed, like any other faulty line.
  const findings = context.diagnostics.length;
  const step = convertStep(raw, context);
  if (context.diagnostics.length > findings) return;
  if (onStep) onStep(step);
  else parsed.steps.push(step);
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

// The tokens of the line being lexed, copied out at their exact size (a list grown by `push`
// keeps room for 16, on every line of a large text).
const lexed = new ScratchList<Token>();

function lexLine(text: string): Token[] {
  lexed.clear();
  lexer.reset(text);
  for (let token = lexer.next(); token; token = lexer.next()) lexed.push(token);
  return lexed.copy();
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
  const shape = shapeOf(context.tokens);
  const known = knownTemplate(shape);
  if (known !== undefined) return known as RawLine;
  const tokens = context.tokens;
  const failed = knownFailure(shape);
  if (failed) return reportFailure(context, failed);
  if (context.budget.tokens < tokens.length) {
    if (context.budget.tokens >= 0) context.diagnostics.push(budgetSpent(context.line));
    context.budget.tokens = -1;
    return null;
  }
  context.budget.tokens -= tokens.length;
  const parser = new nearley.Parser(compiled, { lexer: replayLexer(tokens) });
  // nearley's own error text walks the whole parse table; only the position is needed here.
  Object.assign(parser, { reportError: () => 'syntax error', reportLexerError: () => 'syntax error' });
  const table = (parser as unknown as { table: unknown[] }).table;
  try {
    parser.feed(context.text);
  } catch (error) {
    const token = (error as { token?: Token }).token;
    const failure = { tokenIndex: token ? tokens.indexOf(token) : null, expected: expectedAt(parser, table.length - 2) };
    rememberFailure(shape, failure);
    return reportFailure(context, failure);
  }
  if (parser.results.length === 0) {
    const failure = { tokenIndex: null, expected: expectedAt(parser, table.length - 1) };
    rememberFailure(shape, failure);
    return reportFailure(context, failure);
  }
  return templateOf(shape, tokens, parser.results[0], parser.results.length === 1) as RawLine;
}

function reportFailure(context: LineContext, failure: KnownFailure): null {
  const token = failure.tokenIndex === null ? null : (context.tokens[failure.tokenIndex] ?? null);
  const bracket = unbalancedBracket(context.text, context.line);
  context.diagnostics.push(bracket ?? syntaxDiagnostic(context.line, token, context.text, failure.expected));
  return null;
}
