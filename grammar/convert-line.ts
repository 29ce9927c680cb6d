import type { DirectiveNode, StepNode, TermNode } from './ast';
import { convertParticle, convertSpecies, sourceToken, tokenOf, type LineContext } from './convert-species';
import { flatten, type Cons, type RawDirective, type RawStep, type RawTerm, type TokenRef } from './raw';

const REVERSIBLE_ARROWS = new Set(['<=>', '⇌']);

function convertSide(list: Cons<RawTerm>, context: LineContext): TermNode[] {
  return flatten(list).map((term) => ({
    coefficient: term.coefficient ? sourceToken(term.coefficient, context) : null,
    particle: convertParticle(term.particle, context),
  }));
}

/** Turns a parsed step line into its AST node. */
export function convertStep(raw: RawStep, context: LineContext): StepNode {
  const rate = raw.rate;
  const reactants = convertSide(raw.reactants, context);
  const first = reactants[0];
  return {
    kind: 'step',
    line: context.line,
    column: raw.label ? tokenOf(raw.label, context).col : (first.coefficient?.column ?? first.particle.column),
    label: raw.label ? sourceToken(raw.label, context) : null,
    arrow: sourceToken(raw.arrow, context),
    reversible: REVERSIBLE_ARROWS.has(tokenOf(raw.arrow, context).text),
    reactants,
    products: convertSide(raw.products, context),
    rate: rate
      ? {
          forward: tokenOf(rate.forward, context).text.trim(),
          reverse: rate.reverse ? tokenOf(rate.reverse, context).text.trim() : null,
          line: context.line,
          column: tokenOf(rate.at, context).col,
        }
      : null,
  };
}

const ASSIGN_KINDS: Record<string, 'units' | 'conditions'> = { '%units': 'units', '%conditions': 'conditions' };
const LIST_KINDS: Record<string, 'terminal' | 'intermediates'> = { '%terminal': 'terminal', '%intermediates': 'intermediates' };

function trimmed(ref: TokenRef, context: LineContext) {
  const token = sourceToken(ref, context);
  return { ...token, text: token.text.trim() };
}

/** Turns a parsed directive line into its AST node. */
export function convertDirective(raw: RawDirective, context: LineContext): DirectiveNode {
  const name = tokenOf(raw.name, context);
  const position = { line: context.line, column: name.col };
  switch (raw.kind) {
    case 'title':
      return { kind: 'title', ...position, text: tokenOf(raw.text, context).text.trim() };
    case 'assign':
      return {
        kind: ASSIGN_KINDS[name.text],
        ...position,
        assignments: flatten(raw.assignments).map(({ key, value }) => ({ key: trimmed(key, context), value: trimmed(value, context) })),
      };
    case 'list':
      return { kind: LIST_KINDS[name.text], ...position, items: flatten(raw.list).map((item) => convertParticle(item, context)) };
    case 'declare':
      return {
        kind: 'declaration',
        ...position,
        name: sourceToken(raw.word, context),
        species: raw.species ? convertSpecies(raw.species, context) : null,
      };
  }
}
