import type { TermJson } from './analysis-types';
import type { ParticleNode, RateNode, StepNode, TermNode } from '@grammar/ast';
import type { Diagnostic } from '@grammar/diagnostics';
import { finding } from './diagnostic-codes';
import { termText } from './equation-format';
import { Fraction } from './fraction';
import { ScratchList } from '@grammar/scratch-list';
import type { SpeciesInfo } from './species-model';
import type { RegisteredSpecies, SpeciesRegistry } from './species-registry';

/**
 * One species on one side of a step, with equal terms merged (`A + A` is `2 A`). A term is also
 * the term of the analysis' JSON: its own enumerable fields are exactly a TermJson, and the fields
 * the engine works with are not (see SharedTerm), so that the steps and their JSON share one list
 * of terms (a large mechanism then holds no second list and no second object per term).
 */
export interface StepTerm extends TermJson {
  readonly key: string;
  readonly coef: number;
  readonly coefText: string;
  /** The coefficient, exactly. */
  readonly fraction: Fraction;
  readonly species: RegisteredSpecies;
  /** The term's text in equations, made once with the shared term (equation-format.ts). */
  readonly shown: string;
  readonly explicit: string;
}

/**
 * A well-formed step, ready for the checks and the routes. It keeps all that the checks need of
 * its parse tree, so that the tree itself can be dropped once the steps are built; its line and
 * column place the diagnostics about the whole step.
 */
export interface StepModel {
  /** Position among the analysed steps (0-based). */
  index: number;
  /** The label, or `#n` for the n-th step when it has none. */
  id: string;
  label: string | null;
  /** Where the step starts: at its label when it has one. */
  line: number;
  column: number;
  rate: RateNode | null;
  /** The first hν written among the products (a mistake reported by the step rules). */
  productPhoton: { line: number; column: number; text: string } | null;
  reversible: boolean;
  reactants: StepTerm[];
  products: StepTerm[];
  /** Every coefficient is a whole number (read once here; balance and the step rules ask for it). */
  wholeCoefficients: boolean;
}

/** Reactants then products, for the few checks that look at every term of one step. */
export function termsOf(step: StepModel): StepTerm[] {
  return step.reactants.concat(step.products);
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

// The terms of the step being built, both sides, read before any is listed (a step is built
// synchronously, one at a time): reused lists instead of an object per term.
const readSpecies = new ScratchList<SpeciesInfo>();
const readCoefs = new ScratchList<Fraction>();
const readParticles = new ScratchList<ParticleNode>();

/** Reads one side into the lists above; false (with diagnostics) when a term cannot be read. */
function readSide(terms: readonly TermNode[], registry: SpeciesRegistry, diagnostics: Diagnostic[]): boolean {
  let readable = true;
  for (const term of terms) {
    const species = registry.resolve(term.particle);
    const coef = term.coefficient ? readCoefficient(term.coefficient.text) : Fraction.ONE;
    if (!coef && term.coefficient) {
      const message = `coefficient ${term.coefficient.text} must be a positive number (integer, decimal or fraction)`;
      diagnostics.push(finding('bad-count', term.coefficient, message, { found: term.coefficient.text }));
    }
    if (!species || !coef) readable = false;
    else {
      readSpecies.push(species);
      readCoefs.push(coef);
      readParticles.push(term.particle);
    }
  }
  return readable;
}

/** Empties the lists above (their count only: a step's build starts here, whatever the last one left). */
function forgetRead(): void {
  readSpecies.clear();
  readCoefs.clear();
  readParticles.clear();
}

// Steps share their terms: the same species with the same coefficient object (coefficients are
// read once per spelling) is one frozen term in every step of a text, which keeps the steps of a
// large mechanism, held until the whole text is analysed, small for the collector.
// A term written without a coefficient (most of them) is kept on the species itself, which spares
// the lookup in the species' table of terms.
function sharedTerm(species: RegisteredSpecies, coef: Fraction): StepTerm {
  if (coef === Fraction.ONE) return (species.unitTerm ??= newTerm(species, coef));
  let term = species.terms.get(coef);
  if (!term) species.terms.set(coef, (term = newTerm(species, coef)));
  return term;
}

/**
 * A shared term. Its public fields are the TermJson; the engine's are private fields read through
 * getters, so they are neither enumerable nor serialised, and cost no more to make or read than
 * ordinary fields (defining non-enumerable properties one by one cost microseconds per term).
 */
class SharedTerm implements StepTerm {
  readonly key: string;
  readonly coef: number;
  readonly coefText: string;
  readonly #fraction: Fraction;
  readonly #species: RegisteredSpecies;
  readonly #shown: string;
  readonly #explicit: string;

  constructor(species: RegisteredSpecies, fraction: Fraction) {
    this.key = species.key;
    this.coef = fraction.toNumber();
    this.coefText = fraction.toString();
    this.#fraction = fraction;
    this.#species = species;
    this.#shown = termText(species.key, fraction, false);
    this.#explicit = termText(species.key, fraction, true);
  }

  get fraction(): Fraction {
    return this.#fraction;
  }

  get species(): RegisteredSpecies {
    return this.#species;
  }

  get shown(): string {
    return this.#shown;
  }

  get explicit(): string {
    return this.#explicit;
  }
}

function newTerm(species: RegisteredSpecies, fraction: Fraction): StepTerm {
  return Object.freeze(new SharedTerm(species, fraction));
}

function allWhole(terms: readonly StepTerm[]): boolean {
  for (const term of terms) if (!term.fraction.isInteger()) return false;
  return true;
}

// The merged terms of one side, copied out at their exact size (a list grown by `push` keeps
// room for 16 terms, and the steps of a large text are all held until the end).
const merged = new ScratchList<StepTerm>();

/**
 * Lists the species of the read terms from..to and merges equal terms (`A + A` is `2 A`). A side
 * has a handful of terms, so a scan is cheaper than a map per side.
 */
function mergeSide(from: number, to: number, registry: SpeciesRegistry): StepTerm[] {
  merged.clear();
  for (let read = from; read < to; read += 1) {
    const species = readSpecies.at(read);
    const coef = readCoefs.at(read);
    let index = merged.size - 1;
    while (index >= 0 && merged.at(index).key !== species.key) index -= 1;
    if (index >= 0) merged.items[index] = sharedTerm(merged.at(index).species, merged.at(index).fraction.add(coef));
    else merged.push(sharedTerm(registry.register(species, readParticles.at(read)), coef));
  }
  return merged.copy();
}

/** Marks which species the step consumes and forms (a reversible step both ways), while they are at hand. */
function markFormedAndConsumed(reactants: readonly StepTerm[], products: readonly StepTerm[], reversible: boolean): void {
  for (const { species } of reactants) {
    species.consumed = true;
    if (reversible) species.formed = true;
  }
  for (const { species } of products) {
    species.formed = true;
    if (reversible) species.consumed = true;
  }
}

function findPhoton(terms: readonly TermNode[]) {
  for (const term of terms) if (term.particle.kind === 'photon') return term.particle;
  return undefined;
}

/** Builds the step model, or null (with diagnostics) when a species or coefficient cannot be read. */
export function buildStep(node: StepNode, position: number, registry: SpeciesRegistry, diagnostics: Diagnostic[]): StepModel | null {
  forgetRead();
  const left = readSide(node.reactants, registry, diagnostics);
  const split = readSpecies.size;
  const right = readSide(node.products, registry, diagnostics);
  if (!left || !right) return null;
  const reactants = mergeSide(0, split, registry);
  const products = mergeSide(split, readSpecies.size, registry);
  markFormedAndConsumed(reactants, products, node.reversible);
  const label = node.label?.text ?? null;
  const photon = findPhoton(node.products);
  const productPhoton = photon ? { line: photon.line, column: photon.column, text: photon.text } : null;
  const wholeCoefficients = allWhole(reactants) && allWhole(products);
  return {
    index: -1,
    id: label ?? `#${position}`,
    label,
    line: node.line,
    column: node.column,
    rate: node.rate,
    productPhoton,
    reversible: node.reversible,
    reactants,
    products,
    wholeCoefficients,
  };
}

/** Net stoichiometry of a step: products − reactants, per species key (zeros dropped). */
export function netOf(step: StepModel): Map<string, Fraction> {
  const net = new Map<string, Fraction>();
  for (const term of step.reactants) net.set(term.species.key, term.fraction.neg());
  for (const term of step.products) {
    const value = (net.get(term.species.key) ?? Fraction.ZERO).add(term.fraction);
    if (value.isZero()) net.delete(term.species.key);
    else net.set(term.species.key, value);
  }
  return net;
}
