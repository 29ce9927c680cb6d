import { Fraction } from './fraction';
import type { SpeciesInfo } from './species-model';
import type { StepModel, StepTerm } from './step-model';

/** A change that balances a step: a new coefficient for one term, a term removed, or an added species. */
export type BalancingFix =
  | { kind: 'coefficient'; side: 'reactants' | 'products'; key: string; from: Fraction; to: Fraction }
  | { kind: 'remove'; side: 'reactants' | 'products'; key: string; coef: Fraction }
  | { kind: 'add'; side: 'reactants' | 'products'; key: string; coef: Fraction };

type Vector = Map<string, Fraction>;
type Candidate = Pick<SpeciesInfo, 'key' | 'kind' | 'elements' | 'charge' | 'sites' | 'opaque'>;

function small(key: string, elements: Record<string, number>, charge = 0, sites = 0): Candidate {
  return { key, kind: key === '*' ? 'site' : key === 'e^-' ? 'electron' : 'species', elements, charge, sites, opaque: false };
}

/** Small species often forgotten in a step (common practice). */
const COMMON_SMALL_SPECIES: readonly Candidate[] = [
  small('H2O', { H: 2, O: 1 }),
  small('O2', { O: 2 }),
  small('H2', { H: 2 }),
  small('OH•', { O: 1, H: 1 }),
  small('HO2•', { H: 1, O: 2 }),
  small('H•', { H: 1 }),
  small('CO2', { C: 1, O: 2 }),
  small('CO', { C: 1, O: 1 }),
  small('N2', { N: 2 }),
  small('H^+', { H: 1 }, 1),
  small('OH^-', { O: 1, H: 1 }, -1),
  small('e^-', {}, -1),
  small('*', {}, 0, 1),
];

const CHARGE = '(charge)';
const SITES = '(sites)';

function composition(species: Candidate): Vector {
  const vector: Vector = new Map();
  for (const symbol in species.elements) vector.set(symbol, Fraction.of(species.elements[symbol]));
  if (species.charge !== 0) vector.set(CHARGE, Fraction.of(species.charge));
  if (species.sites !== 0) vector.set(SITES, Fraction.of(species.sites));
  return vector;
}

/** Products − reactants over elements, charge and sites, exactly. */
function difference(step: StepModel): Vector {
  const total: Vector = new Map();
  const add = (terms: StepTerm[], sign: Fraction) => {
    for (const term of terms) {
      for (const [dimension, count] of composition(term.species)) {
        total.set(dimension, (total.get(dimension) ?? Fraction.ZERO).add(count.mul(term.fraction).mul(sign)));
      }
    }
  };
  add(step.reactants, Fraction.ONE.neg());
  add(step.products, Fraction.ONE);
  for (const [dimension, value] of total) if (value.isZero()) total.delete(dimension);
  return total;
}

/** The k with k·vector = target, or null when no single multiple fits. */
function multipleOf(target: Vector, vector: Vector): Fraction | null {
  if (vector.size === 0) return null;
  let k: Fraction | null = null;
  for (const dimension of new Set([...target.keys(), ...vector.keys()])) {
    const want = target.get(dimension) ?? Fraction.ZERO;
    const have = vector.get(dimension);
    if (!have) {
      if (!want.isZero()) return null;
      continue;
    }
    const ratio = want.div(have);
    if (k && !k.equals(ratio)) return null;
    k = ratio;
  }
  return k;
}

function coefficientFixes(step: StepModel, diff: Vector): BalancingFix[] {
  const fixes: BalancingFix[] = [];
  const sides = [['reactants', step.reactants, Fraction.ONE], ['products', step.products, Fraction.ONE.neg()]] as const;
  for (const [side, terms, sign] of sides) {
    const target = new Map([...diff].map(([dimension, value]) => [dimension, value.mul(sign)]));
    for (const term of terms) {
      const delta = multipleOf(target, composition(term.species));
      const to = delta ? term.fraction.add(delta) : null;
      if (to && to.sign() > 0) fixes.push({ kind: 'coefficient', side, key: term.species.key, from: term.fraction, to });
      else if (to && to.isZero()) fixes.push({ kind: 'remove', side, key: term.species.key, coef: term.fraction });
    }
  }
  return fixes;
}

/**
 * Species added to one side. A species already on the other side is never added (`A + e^- → B +
 * e^-` is no fix): changing or removing its term there is the fix, and coefficientFixes offers it.
 */
function additionFixes(step: StepModel, diff: Vector, candidates: readonly Candidate[]): BalancingFix[] {
  const fixes: BalancingFix[] = [];
  for (const candidate of candidates) {
    const k = multipleOf(diff, composition(candidate));
    if (!k || k.isZero()) continue;
    const side = k.sign() > 0 ? 'reactants' : 'products';
    const opposite = side === 'reactants' ? step.products : step.reactants;
    if (opposite.some((term) => term.species.key === candidate.key)) continue;
    fixes.push({ kind: 'add', side, key: candidate.key, coef: k.sign() > 0 ? k : k.neg() });
  }
  return fixes;
}

function wholeNumbers(fix: BalancingFix): boolean {
  return fix.kind === 'coefficient' ? fix.to.isInteger() : fix.coef.isInteger();
}

/**
 * A small change that balances an unbalanced step: a new coefficient for one of its terms (or the
 * term removed), else one added species (the mechanism's own species first, then common small
 * ones). Whole-number changes are preferred. Null when no such change balances the step.
 */
export function suggestFix(step: StepModel, mechanismSpecies: readonly Candidate[]): BalancingFix | null {
  const diff = difference(step);
  if (diff.size === 0) return null;
  const usable = [...mechanismSpecies, ...COMMON_SMALL_SPECIES].filter((c) => !c.opaque && c.kind !== 'photon' && c.kind !== 'third-body');
  const fixes = [...coefficientFixes(step, diff), ...additionFixes(step, diff, usable)];
  return fixes.find(wholeNumbers) ?? fixes[0] ?? null;
}
