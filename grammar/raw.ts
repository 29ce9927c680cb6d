/**
 * Shapes built by the postprocessors of steps.ne, as templates (line-templates.ts): each token is
 * a reference resolved against the tokens of the line being converted.
 */
export interface TokenRef {
  readonly __tokenRef: true;
}
export interface Cons<T> {
  head: T;
  tail: Cons<T> | null;
}

export type RawPart =
  | { kind: 'word'; token: TokenRef }
  | { kind: 'group'; open: TokenRef; formula: Cons<RawPart>; close: TokenRef; count: TokenRef | null };

export type RawMark =
  | { kind: 'radical'; token: TokenRef }
  | { kind: 'charge'; token: TokenRef }
  | { kind: 'adsorbed'; token: TokenRef; count: TokenRef | null };

export interface RawSpecies {
  kind: 'species';
  formula: Cons<RawPart>;
  states: Cons<TokenRef> | null;
  marks: Cons<RawMark> | null;
}

export type RawParticle = RawSpecies | { kind: 'photon' | 'third-body' | 'site' | 'electron'; token: TokenRef };

export interface RawTerm {
  coefficient: TokenRef | null;
  particle: RawParticle;
}

export interface RawStep {
  kind: 'step';
  label: TokenRef | null;
  reactants: Cons<RawTerm>;
  arrow: TokenRef;
  products: Cons<RawTerm>;
  rate: { at: TokenRef; forward: TokenRef; reverse: TokenRef | null } | null;
}

export type RawDirective =
  | { kind: 'title'; name: TokenRef; text: TokenRef }
  | { kind: 'assign'; name: TokenRef; assignments: Cons<{ key: TokenRef; value: TokenRef }> }
  | { kind: 'list'; name: TokenRef; list: Cons<RawParticle> }
  | { kind: 'declare'; name: TokenRef; word: TokenRef; species: RawSpecies | null };

export type RawLine = RawStep | RawDirective;

/**
 * Flattens a left-recursive cons list into source order: counted first, then filled from the
 * end, so that the list is made at its exact size (one grown by `push` keeps room for 16).
 */
export function flatten<T>(list: Cons<T> | null): T[] {
  let count = 0;
  for (let cell = list; cell; cell = cell.tail) count += 1;
  const items = new Array<T>(count);
  let index = count;
  for (let cell = list; cell; cell = cell.tail) items[--index] = cell.head;
  return items;
}
