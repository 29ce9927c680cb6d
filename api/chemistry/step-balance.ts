import { ELEMENTS } from './elements';
import { ScratchList } from '@grammar/scratch-list';
import { termsOf, type StepModel, type StepTerm } from './step-model';

/** Conservation of elements, charge and sites in one step (products − reactants). */
export interface StepBalance {
  /** Non-zero element differences only, in the order the elements first appear in the step. */
  imbalance: Record<string, number>;
  chargeDelta: number;
  siteDelta: number;
  balanced: boolean;
  /** False when an opaque declared species makes element balance unknowable. */
  elementsChecked: boolean;
}

/** Least common multiple of the coefficient denominators, so that sums stay whole numbers (1 when all are whole). */
function denominatorLcm(step: StepModel): number {
  if (step.wholeCoefficients) return 1;
  let common = 1;
  for (const term of termsOf(step)) {
    if (term.fraction.isInteger()) continue;
    const den = Number(term.fraction.den);
    let a = common;
    let b = den;
    while (b !== 0) [a, b] = [b, a % b];
    common = (common / a) * den;
  }
  return common;
}

// One scratch table for every step, indexed by atomic number (a step is balanced synchronously);
// `touched` keeps the elements in order of first appearance and says which entries to reset.
const totalsByZ = new Float64Array(ELEMENTS.length + 1);
const touched = new ScratchList<number>();

function touchedHas(z: number): boolean {
  for (let index = 0; index < touched.size; index += 1) if (touched.at(index) === z) return true;
  return false;
}

interface Totals {
  charge: number;
  sites: number;
  opaque: boolean;
}

function accumulate(terms: readonly StepTerm[], sign: number, scale: number, totals: Totals): void {
  for (const { species, coef, fraction } of terms) {
    // Whole numbers below 2^53 add exactly in floating point; the coefficients were scaled to whole numbers.
    const weight = scale === 1 ? sign * coef : sign * Number(fraction.num) * (scale / Number(fraction.den));
    if (species.opaque) totals.opaque = true;
    const list = species.composition;
    for (let index = 0; index < list.length; index += 2) {
      const z = list[index];
      if (!touchedHas(z)) touched.push(z);
      totalsByZ[z] += weight * list[index + 1];
    }
    totals.charge += weight * species.charge;
    totals.sites += weight * species.sites;
  }
}

// Shared by every step whose elements balance (frozen: it is never filled in).
const NO_IMBALANCE: Record<string, number> = Object.freeze({});

/** The non-zero element totals, keyed by symbol; resets the scratch table. */
function collectImbalance(scale: number, opaque: boolean): Record<string, number> | null {
  let imbalance: Record<string, number> | null = null;
  for (let index = 0; index < touched.size; index += 1) {
    const z = touched.at(index);
    const total = totalsByZ[z];
    totalsByZ[z] = 0;
    // z 0 stands for a symbol missing from the periodic table; the formula reader reports those.
    if (total !== 0 && !opaque && z > 0) (imbalance ??= {})[ELEMENTS[z - 1].symbol] = total / scale;
  }
  touched.clear();
  return imbalance;
}

/** Element, charge and site balance of a step (exact: coefficients are scaled to whole numbers). */
export function balanceOf(step: StepModel): StepBalance {
  const scale = denominatorLcm(step);
  const totals: Totals = { charge: 0, sites: 0, opaque: false };
  accumulate(step.reactants, -1, scale, totals);
  accumulate(step.products, 1, scale, totals);
  const imbalance = collectImbalance(scale, totals.opaque);
  const chargeDelta = totals.charge / scale;
  const siteDelta = totals.sites / scale;
  const balanced = imbalance === null && chargeDelta === 0 && siteDelta === 0;
  return { imbalance: imbalance ?? NO_IMBALANCE, chargeDelta, siteDelta, balanced, elementsChecked: !totals.opaque };
}
