import { Fraction } from './fraction';
import { nullSpace, type SparseRow } from './integer-matrix';
import { isAside, speciesKey, type SpeciesInfo } from './species-model';
import type { StepModel, StepTerm } from './step-model';

/**
 * A change that balances a step: a new coefficient for one term, new whole coefficients for every
 * species term (hν and M keep theirs), a term removed, or an added species.
 */
export type BalancingFix =
  | { kind: 'coefficient'; side: 'reactants' | 'products'; key: string; from: Fraction; to: Fraction }
  | { kind: 'coefficients'; reactants: Fraction[]; products: Fraction[] }
  | { kind: 'remove'; side: 'reactants' | 'products'; key: string; coef: Fraction }
  | { kind: 'add'; side: 'reactants' | 'products'; key: string; coef: Fraction }
  | { kind: 'replace'; side: 'reactants' | 'products'; key: string; by: string };

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

/**
 * New coefficients for all the species of the step, when exactly one set of positive whole numbers
 * balances it (CH4 + O2 → CO2 + H2O becomes CH4 + 2 O2 → CO2 + 2 H2O): the exact null space of
 * its composition matrix, reactant columns negated, must be one vector of a single sign.
 */
function rebalanced(step: StepModel): BalancingFix | null {
  const terms = [...step.reactants, ...step.products];
  if (terms.some((term) => term.species.opaque)) return null;
  const columns = terms.map((term, index) => ({ term, index, sign: index < step.reactants.length ? -1n : 1n })).filter(({ term }) => !isAside(term.species));
  const rows = new Map<string, SparseRow>();
  columns.forEach(({ term, sign }, column) => {
    for (const [dimension, count] of composition(term.species)) {
      const row = rows.get(dimension) ?? new Map<number, bigint>();
      row.set(column, sign * count.num); // counts of atoms, charge and sites are whole numbers
      rows.set(dimension, row);
    }
  });
  const basis = nullSpace([...rows.values()], columns.length);
  if (basis.length !== 1) return null;
  const [vector] = basis;
  const positive = vector.every((value) => value > 0n);
  if (!positive && !vector.every((value) => value < 0n)) return null;
  const coefficients = terms.map((term) => term.fraction);
  columns.forEach(({ index }, column) => {
    coefficients[index] = Fraction.of(Number(positive ? vector[column] : -vector[column]));
  });
  return { kind: 'coefficients', reactants: coefficients.slice(0, step.reactants.length), products: coefficients.slice(step.reactants.length) };
}

function wholeNumbers(fix: BalancingFix): boolean {
  if (fix.kind === 'coefficients' || fix.kind === 'replace') return true;
  return fix.kind === 'coefficient' ? fix.to.isInteger() : fix.coef.isInteger();
}

/** How far a single-term fix moves the coefficient (2 O2 → O2 is a smaller change than O → 3 O). */
function size(fix: BalancingFix): Fraction {
  if (fix.kind === 'coefficient') {
    const change = fix.to.sub(fix.from);
    return change.sign() < 0 ? change.neg() : change;
  }
  return fix.kind === 'remove' ? fix.coef : Fraction.ZERO;
}

function smallestFirst(fixes: BalancingFix[]): BalancingFix[] {
  return fixes.map((fix, order) => ({ fix, order })).sort((a, b) => size(a.fix).sub(size(b.fix)).sign() || a.order - b.order).map(({ fix }) => fix);
}

function sameElements(a: Candidate, b: Candidate): boolean {
  const symbols = Object.keys(a.elements);
  return symbols.length === Object.keys(b.elements).length && symbols.every((symbol) => a.elements[symbol] === b.elements[symbol]);
}

/**
 * When only charge or sites are off, one species written with the wrong charge is the usual slip
 * (`IO(aq)` for `IO(aq)^-`): a species of the mechanism with the same elements whose charge and
 * sites make up the difference replaces it.
 */
function replacementFixes(step: StepModel, diff: Vector, mechanismSpecies: readonly Candidate[]): BalancingFix[] {
  if ([...diff.keys()].some((dimension) => dimension !== CHARGE && dimension !== SITES)) return [];
  const fixes: BalancingFix[] = [];
  const sides = [['reactants', step.reactants, Fraction.ONE.neg(), step.products], ['products', step.products, Fraction.ONE, step.reactants]] as const;
  for (const [side, terms, sign, opposite] of sides) {
    for (const term of terms) {
      if (isAside(term.species) || term.species.opaque) continue;
      for (const other of [...mechanismSpecies, ...chargedForms(term.species)]) {
        if (other.key === term.species.key || other.opaque || !sameElements(other, term.species)) continue;
        // Fe^3+ → Fe^2+ is not fixed by writing Fe^2+ on both sides.
        if (opposite.some((written) => written.key === other.key)) continue;
        // Replacing changes the total by sign · coef · (other − this) in charge and sites.
        const chargeChange = term.fraction.mul(Fraction.of(other.charge - term.species.charge)).mul(sign);
        const siteChange = term.fraction.mul(Fraction.of(other.sites - term.species.sites)).mul(sign);
        const charge = (diff.get(CHARGE) ?? Fraction.ZERO).add(chargeChange);
        const sites = (diff.get(SITES) ?? Fraction.ZERO).add(siteChange);
        if (charge.isZero() && sites.isZero()) fixes.push({ kind: 'replace', side, key: term.species.key, by: other.key });
      }
    }
  }
  return fixes;
}

/**
 * An odd-electron species written without a radical mark whose charge was left out: one more or
 * one less electron makes it closed-shell, as in `IO(aq)` for the hypoiodite `IO(aq)^-`.
 */
function chargedForms(species: StepTerm['species']): Candidate[] {
  if (species.kind !== 'species' || species.name || species.radicalMarks > 0 || species.electrons === null || species.electrons % 2 === 0) return [];
  const chargeAndSites = speciesKey('', [], 0, species.charge, species.sites);
  const base = species.key.slice(0, species.key.length - chargeAndSites.length);
  return [species.charge - 1, species.charge + 1].map((charge) => ({ ...small(`${base}${speciesKey('', [], 0, charge, species.sites)}`, species.elements, charge, species.sites) }));
}

/**
 * A free electron is offered only where it can be meant: in a mechanism that already writes
 * electrons, or for a step that is off in charge alone (a half-reaction, Fe^3+ → Fe^2+). Elsewhere
 * (a homogeneous step that is also off in atoms) a free electron is no fix a chemist would make.
 */
function offeredSmallSpecies(mechanismSpecies: readonly Candidate[], diff: Vector): readonly Candidate[] {
  const chargeOnly = diff.size === 1 && diff.has(CHARGE);
  const electrons = chargeOnly || mechanismSpecies.some((species) => species.kind === 'electron');
  return electrons ? COMMON_SMALL_SPECIES : COMMON_SMALL_SPECIES.filter((species) => species.kind !== 'electron');
}

/**
 * A small change that balances an unbalanced step, in this order of preference: a species of the
 * mechanism written with the right charge or sites in place of one with the wrong ones; a new whole
 * coefficient for one of its terms (or the term removed), the smallest change first; new whole
 * coefficients for all its species, when only one such set exists; one added species in a whole
 * amount (the mechanism's own species first, then common small ones; a free electron only where
 * the mechanism writes electrons); then, for a step already written with fractions, the same changes
 * in fractions. Null when no such change balances the step.
 */
export function suggestFix(step: StepModel, mechanismSpecies: readonly Candidate[]): BalancingFix | null {
  const diff = difference(step);
  if (diff.size === 0) return null;
  const replaced = replacementFixes(step, diff, mechanismSpecies);
  if (replaced.length > 0) return replaced[0];
  const usable = [...mechanismSpecies, ...offeredSmallSpecies(mechanismSpecies, diff)].filter((c) => !c.opaque && !isAside(c));
  const single = smallestFirst(coefficientFixes(step, diff));
  const added = additionFixes(step, diff, usable);
  const whole = single.find(wholeNumbers) ?? rebalanced(step) ?? added.find(wholeNumbers);
  if (whole) return whole;
  // A fraction is a fix only for a step already written with fractions (a lumped step): in an
  // elementary one (Cl• + O3 → ClO• + O3 given 4/3 O3) it hides the real slip.
  const lumped = [...step.reactants, ...step.products].some((term) => !term.fraction.isInteger());
  return lumped ? (single[0] ?? added[0] ?? null) : null;
}
