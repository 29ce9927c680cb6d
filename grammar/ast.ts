import type { Diagnostic } from './diagnostics';

/** A piece of source text with its 1-based position. */
export interface SourceToken {
  text: string;
  line: number;
  column: number;
}

/**
 * A run of element symbols and counts as written (`CH3O2`), or a declared name (`RO2`).
 * Formula parts are placed by `offset`, 0-based within the species text, so that one parsed
 * formula serves every place the same species is written (add it to the species' column).
 */
export interface WordPart {
  kind: 'word';
  text: string;
  offset: number;
}

/** A bracketed group with an optional count: `(CH3)3`, `[PtCl4]`. */
export interface GroupPart {
  kind: 'group';
  bracket: '(' | '[';
  parts: FormulaPart[];
  count: { text: string; offset: number } | null;
  offset: number;
}

export type FormulaPart = WordPart | GroupPart;

/** A written species: formula, state tags and marks. */
export interface SpeciesNode {
  kind: 'species';
  /** The species exactly as written. */
  text: string;
  /** The formula part as written, without state tags and marks. */
  formulaText: string;
  /** Shared by every species written with the same formula text: do not change it. */
  formula: readonly FormulaPart[];
  /** State tags with their parentheses: `(3P)`, `(aq)`. */
  states: readonly string[];
  /** Number of radical marks (`•` or `.`). */
  radicalMarks: number;
  /** The charge mark (`^2+`), if any. */
  charge: SourceToken | null;
  /** Surface sites taken when adsorbed (`*` = 1, `*2` = 2); 0 when not adsorbed. */
  sites: number;
  line: number;
  column: number;
}

/** A reserved particle: a photon, the third body, an empty site or an electron. */
export interface ReservedNode {
  kind: 'photon' | 'third-body' | 'site' | 'electron';
  text: string;
  line: number;
  column: number;
}

export type ParticleNode = SpeciesNode | ReservedNode;

/** `[COEFFICIENT] PARTICLE` on one side of a step. */
export interface TermNode {
  coefficient: SourceToken | null;
  particle: ParticleNode;
}

/** The rate expression text after `@` (two for a reversible step: `@ FORWARD | REVERSE`). */
export interface RateNode {
  forward: string;
  reverse: string | null;
  line: number;
  column: number;
}

/** One step line. */
export interface StepNode {
  kind: 'step';
  line: number;
  column: number;
  label: SourceToken | null;
  arrow: SourceToken;
  reversible: boolean;
  reactants: TermNode[];
  products: TermNode[];
  rate: RateNode | null;
}

/** `key = value` inside `%units` or `%conditions`. */
export interface Assignment {
  key: SourceToken;
  value: SourceToken;
}

export type DirectiveNode =
  | { kind: 'title'; line: number; column: number; text: string }
  | { kind: 'units' | 'conditions'; line: number; column: number; assignments: Assignment[] }
  | { kind: 'terminal' | 'intermediates'; line: number; column: number; items: ParticleNode[] }
  | { kind: 'declaration'; line: number; column: number; name: SourceToken; species: SpeciesNode | null };

/** Everything the parser read from a mechanism text, with the problems it found. */
export interface ParsedMechanism {
  steps: StepNode[];
  directives: DirectiveNode[];
  diagnostics: Diagnostic[];
  lineCount: number;
}
