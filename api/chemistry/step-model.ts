import type { TermJson } from './analysis-types';
import type { RateNode, SourceToken, StepNode, TermNode } from '@grammar/ast';
import type { Diagnostic } from '@grammar/diagnostics';
import { finding } from './diagnostic-codes';
import { Fraction } from './fraction';
import type { SpeciesInfo } from './species-model';
import type { RegisteredSpecies, SpeciesRegistry } from './species-registry';

/** One species on one side of a step, with equal terms merged (`A + A` is `2 A`). */
export interface StepTerm {
  readonly species: RegisteredSpecies;
  readonly coef: Fraction;
  /** The species key again, so that a term can be shown as it is (equation-format.ts). */
  readonly key: string;
  /** The term as the analysis reports it, made once with the shared term. */
  readonly json: TermJson;
}

/**
 * Where a step was written: all that the checks need of its parse tree, so that the tree itself
 * can be dropped once the steps are built.
 */
export interface StepSource {
  line: number;
  column: number;
  label: SourceToken | null;
  rate: RateNode | null;
  /** The first hν written among the products (a mistake reported by the step rules). */
  productPhoton: { line: number; column: number; text: string } | null;
}

/** A well-formed step, ready for the checks and the routes. */
export interface StepModel {
  /** Position among the analysed steps (0-based). */
  index: number;
  /** The label, or `#n` for the n-th step when it has none. */
  id: string;
  label: string | null;
  source: StepSource;
  reversible: boolean;
  reactants: StepTerm[];
  products: StepTerm[];
  /** Reactants then products, for checks that look at every term. */
  terms: StepTerm[];
}

const coefficientCache = new Map<string, Fraction | null>();

function readCoefficient(text: string): Fraction | null {
  let value = coefficientCache.get(text);
  if (value === undefined) {
    value = Fraction.parse(text);
    if (value?.isZero()) value = null;
    if (coefficientCache.size < 10_000) coefficientCache.set(text, value);
  }
  return value;
}

interface ReadTerm {
  species: SpeciesInfo;
  coef: Fraction;
  node: TermNode;
}

function readSide(terms: readonly TermNode[], registry: SpeciesRegistry, diagnostics: Diagnostic[]): ReadTerm[] | null {
  const read: ReadTerm[] = [];
  let readable = true;
  for (const term of terms) {
    const species = registry.resolve(term.particle);
    const coef = term.coefficient ? readCoefficient(term.coefficient.text) : Fraction.ONE;
    if (!coef && term.coefficient) {
      const message = `coefficient ${term.coefficient.text} must be a positive number (integer, decimal or fraction)`;
      diagnostics.push(finding('bad-count', term.coefficient, message, { found: term.coefficient.text }));
    }
    if (!species || !coef) readable = false;
    else read.push({ species, coef, node: term });
  }
  return readable ? read : null;
}

// Steps share their terms: the same species with the same coefficient object (coefficients are
// read once per spelling) is one frozen term in every step of a text, which keeps the steps of a
// large mechanism, held until the whole text is analysed, small for the collector.
function sharedTerm(species: RegisteredSpecies, coef: Fraction): StepTerm {
  let term = species.terms.get(coef);
  if (!term) {
    const json = Object.freeze({ key: species.key, coef: coef.toNumber(), coefText: coef.toString() });
    species.terms.set(coef, (term = Object.freeze({ species, coef, key: species.key, json })));
  }
  return term;
}

/**
 * Lists the species of a readable side and merges equal terms (`A + A` is `2 A`). A side has a
 * handful of terms, so a scan is cheaper than a map per side.
 */
function mergeSide(terms: readonly ReadTerm[], registry: SpeciesRegistry): StepTerm[] {
  const merged: StepTerm[] = [];
  for (const { species, coef, node } of terms) {
    const index = merged.findIndex((term) => term.key === species.key);
    if (index >= 0) merged[index] = sharedTerm(merged[index].species, merged[index].coef.add(coef));
    else merged.push(sharedTerm(registry.register(species, node.particle), coef));
  }
  return merged;
}

function findPhoton(terms: readonly TermNode[]) {
  for (const term of terms) if (term.particle.kind === 'photon') return term.particle;
  return undefined;
}

/** Builds the step model, or null (with diagnostics) when a species or coefficient cannot be read. */
export function buildStep(node: StepNode, position: number, registry: SpeciesRegistry, diagnostics: Diagnostic[]): StepModel | null {
  const left = readSide(node.reactants, registry, diagnostics);
  const right = readSide(node.products, registry, diagnostics);
  if (!left || !right) return null;
  const reactants = mergeSide(left, registry);
  const products = mergeSide(right, registry);
  const label = node.label?.text ?? null;
  const photon = findPhoton(node.products);
  const productPhoton = photon ? { line: photon.line, column: photon.column, text: photon.text } : null;
  const source = { line: node.line, column: node.column, label: node.label, rate: node.rate, productPhoton };
  return { index: -1, id: label ?? `#${position}`, label, source, reversible: node.reversible, reactants, products, terms: [...reactants, ...products] };
}

/** Net stoichiometry of a step: products − reactants, per species key (zeros dropped). */
export function netOf(step: StepModel): Map<string, Fraction> {
  const net = new Map<string, Fraction>();
  for (const term of step.reactants) net.set(term.species.key, term.coef.neg());
  for (const term of step.products) {
    const value = (net.get(term.species.key) ?? Fraction.ZERO).add(term.coef);
    if (value.isZero()) net.delete(term.species.key);
    else net.set(term.species.key, value);
  }
  return net;
}
