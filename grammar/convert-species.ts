import type { Token } from 'moo';
import type { FormulaPart, ParticleNode, SourceToken, SpeciesNode } from './ast';
import { diagnostic, PARSER_CODES, type Diagnostic } from './diagnostics';
import { scientificCoefficientMessage } from './syntax-errors';
import { flatten, type Cons, type RawMark, type RawPart, type RawParticle, type RawSpecies, type TokenRef } from './raw';

/** Where converted nodes come from: the line number, its text and its tokens. */
export interface LineContext {
  line: number;
  text: string;
  tokens: readonly Token[];
  diagnostics: Diagnostic[];
  /** Formulas already converted in this text, by formula text (shared, position-free). */
  formulas: Map<string, readonly FormulaPart[]>;
  /** Species already converted without findings in this text, by the species text. */
  shapes: Map<string, SpeciesShape>;
  /** Tokens the Earley parser may still read for this text (see limits.ts); −1 once spent. */
  budget: { tokens: number };
}

const NO_STATES: readonly string[] = Object.freeze([]);

/** The token a template reference stands for on this line. */
export function tokenOf(ref: TokenRef, context: LineContext): Token {
  return context.tokens[(ref as unknown as { token: number }).token];
}

export function sourceToken(ref: TokenRef, context: LineContext): SourceToken {
  const token = tokenOf(ref, context);
  return { text: token.text, line: context.line, column: token.col };
}

function tokenEnd(ref: TokenRef, context: LineContext): number {
  const token = tokenOf(ref, context);
  return token.offset + token.text.length;
}

function convertParts(list: Cons<RawPart>, context: LineContext, start: number): FormulaPart[] {
  return flatten(list).map((part): FormulaPart => {
    if (part.kind === 'word') {
      const token = tokenOf(part.token, context);
      return { kind: 'word', text: token.text, offset: token.offset - start };
    }
    const count = part.count ? tokenOf(part.count, context) : null;
    const open = tokenOf(part.open, context);
    return {
      kind: 'group',
      bracket: open.text === '[' ? '[' : '(',
      parts: convertParts(part.formula, context, start),
      count: count ? { text: count.text, offset: count.offset - start } : null,
      offset: open.offset - start,
    };
  });
}

function sharedFormula(formulaText: string, list: Cons<RawPart>, context: LineContext, start: number): readonly FormulaPart[] {
  let formula = context.formulas.get(formulaText);
  if (!formula) {
    formula = convertParts(list, context, start);
    context.formulas.set(formulaText, formula);
  }
  return formula;
}

function partEnd(part: RawPart, context: LineContext): number {
  if (part.kind === 'word') return tokenEnd(part.token, context);
  return tokenEnd(part.count ?? part.close, context);
}

function markEnd(mark: RawMark, context: LineContext): number {
  return tokenEnd(mark.kind === 'adsorbed' && mark.count ? mark.count : mark.token, context);
}

function partStart(part: RawPart, context: LineContext): number {
  return tokenOf(part.kind === 'word' ? part.token : part.open, context).offset;
}

function markError(context: LineContext, token: Token, message: string): void {
  const position = { line: context.line, column: token.col };
  context.diagnostics.push(diagnostic('error', PARSER_CODES.syntaxError, position, message, { found: token.text }));
}

/** Most surface sites one adsorbed species may occupy. */
const MAX_SITES = 100;

/** The count after `*`: a whole number of sites from 1 (`CO*0` or `O*0.5` is reported, read as 1). */
function siteCount(token: Token, context: LineContext): number {
  const count = Number(token.text);
  if (/^[1-9][0-9]*$/.test(token.text) && count <= MAX_SITES) return count;
  const message = `the site count after * must be a whole number from 1 to ${MAX_SITES}, not ${token.text}`;
  context.diagnostics.push(diagnostic('error', 'bad-count', { line: context.line, column: token.col }, message, { found: token.text }));
  return 1;
}

/** Reads the marks; a second charge or a second adsorbed mark is a syntax error. */
function readMarks(marks: RawMark[], context: LineContext) {
  let radicalMarks = 0;
  let charge: SourceToken | null = null;
  let sites = 0;
  for (const mark of marks) {
    const token = tokenOf(mark.token, context);
    if (mark.kind === 'radical') radicalMarks += 1;
    else if (mark.kind === 'charge') {
      if (charge) markError(context, token, 'a species has one charge; this one is written twice');
      charge = sourceToken(mark.token, context);
    } else {
      if (sites > 0) markError(context, token, 'the adsorbed mark is written twice; write *2 for two sites');
      sites = mark.count ? siteCount(tokenOf(mark.count, context), context) : 1;
    }
  }
  return { radicalMarks, charge, sites };
}

function speciesEnd(parts: RawPart[], states: TokenRef[], marks: RawMark[], context: LineContext): number {
  if (marks.length > 0) return markEnd(marks[marks.length - 1], context);
  if (states.length > 0) return tokenEnd(states[states.length - 1], context);
  return partEnd(parts[parts.length - 1], context);
}

function reportBlank(text: string, start: number, context: LineContext): void {
  const blank = text.search(/\s/);
  if (blank < 0) return;
  // `1e400 O2` reads as the number 1 and a species `e400 O2`: the number's exponent is the slip.
  const mantissa = /\d+(?:\.\d+)?$/.exec(context.text.slice(0, start))?.[0];
  const exponent = /^[eE][+-]?\d+/.exec(text)?.[0];
  if (mantissa && exponent) {
    const message = scientificCoefficientMessage(mantissa + exponent);
    context.diagnostics.push(diagnostic('error', PARSER_CODES.syntaxError, { line: context.line, column: start - mantissa.length + 1 }, message, { found: mantissa + exponent }));
    return;
  }
  const position = { line: context.line, column: start + blank + 1 };
  const message = `a species is written without blanks: "${text}"`;
  context.diagnostics.push(diagnostic('error', PARSER_CODES.syntaxError, position, message, { found: text, expected: [text.replace(/\s+/g, '')] }));
}

/**
 * A species node without its position. The same species text always converts to the same
 * node apart from where it was written, and a mechanism repeats a few species over many steps.
 */
export interface SpeciesShape {
  /** The species text of the first place it was written, which every later place shares. */
  text: string;
  formulaText: string;
  formula: readonly FormulaPart[];
  states: readonly string[];
  radicalMarks: number;
  charge: { text: string; offset: number } | null;
  sites: number;
}

function firstOf<T>(list: Cons<T>): T {
  let cell = list;
  while (cell.tail) cell = cell.tail;
  return cell.head;
}

/** Where a species starts and ends, read from the last cells of its lists (no flattening). */
function speciesSpan(raw: RawSpecies, context: LineContext): { start: number; end: number } {
  const start = partStart(firstOf(raw.formula), context);
  if (raw.marks) return { start, end: markEnd(raw.marks.head, context) };
  if (raw.states) return { start, end: tokenEnd(raw.states.head, context) };
  return { start, end: partEnd(raw.formula.head, context) };
}

function fromShape(shape: SpeciesShape, start: number, context: LineContext): SpeciesNode {
  const { text, formulaText, formula, states, radicalMarks, charge, sites } = shape;
  const chargeToken = charge ? { text: charge.text, line: context.line, column: start + 1 + charge.offset } : null;
  return { kind: 'species', text, formulaText, formula, states, radicalMarks, charge: chargeToken, sites, line: context.line, column: start + 1 };
}

/** Turns a parsed species into its AST node; reports blanks inside it. */
export function convertSpecies(raw: RawSpecies, context: LineContext): SpeciesNode {
  const span = speciesSpan(raw, context);
  const text = context.text.slice(span.start, span.end);
  // The node takes the shape's copy of the text: later lookups by the same string object (the
  // species registry's) then match it without comparing characters, and this slice dies young.
  const shape = context.shapes.get(text);
  if (shape) return fromShape(shape, span.start, context);
  const findings = context.diagnostics.length;
  const node = convertNewSpecies(raw, context);
  if (context.diagnostics.length === findings) {
    const { formulaText, formula, states, radicalMarks, sites } = node;
    const charge = node.charge ? { text: node.charge.text, offset: node.charge.column - node.column } : null;
    context.shapes.set(node.text, { text: node.text, formulaText, formula, states, radicalMarks, charge, sites });
  }
  return node;
}

function convertNewSpecies(raw: RawSpecies, context: LineContext): SpeciesNode {
  const parts = flatten(raw.formula);
  const states = flatten(raw.states);
  const marks = flatten(raw.marks);
  const start = partStart(parts[0], context);
  const end = speciesEnd(parts, states, marks, context);
  const text = context.text.slice(start, end);
  reportBlank(text, start, context);
  const formulaText = context.text.slice(start, partEnd(parts[parts.length - 1], context));
  const { radicalMarks, charge, sites } = readMarks(marks, context);
  return {
    kind: 'species',
    text,
    formulaText,
    formula: sharedFormula(formulaText, raw.formula, context, start),
    states: states.length === 0 ? NO_STATES : states.map((ref) => tokenOf(ref, context).text),
    radicalMarks,
    charge,
    sites,
    line: context.line,
    column: start + 1,
  };
}

/** Turns a parsed particle (species or reserved word) into its AST node. */
export function convertParticle(raw: RawParticle, context: LineContext): ParticleNode {
  if (raw.kind === 'species') return convertSpecies(raw, context);
  const token = tokenOf(raw.token, context);
  return { kind: raw.kind, text: token.text, line: context.line, column: token.col };
}
