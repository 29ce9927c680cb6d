import { ELEMENTS, elementBySymbol } from './elements';
import type { StepModel, StepTerm } from './step-model';

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
  let common = 1;
  for (const term of step.terms) {
    if (term.coef.isInteger()) continue;
    const den = Number(term.coef.den);
    let a = common;
    let b = den;
    while (b !== 0) [a, b] = [b, a % b];
    common = (common / a) * den;
  }
  return common;
}

// Atomic number, count, atomic number, count… per composition, read once. Balancing a large
// text is then array arithmetic: walking each composition's keys (every species has its own
// object shape) and summing in a Map per step were the slowest part of the check.
const compositions = new WeakMap<Record<string, number>, Int32Array | number[]>();

function compositionOf(elements: Record<string, number>): Int32Array | number[] {
  let list = compositions.get(elements);
  if (!list) {
    const pairs: number[] = [];
    for (const symbol of Object.keys(elements)) pairs.push(elementBySymbol(symbol)?.z ?? 0, elements[symbol]);
    // Counts outside 32-bit integers (never in chemistry, but the type allows them) keep plain numbers.
    list = pairs.every((value) => Number.isInteger(value) && Math.abs(value) < 2 ** 31) ? Int32Array.from(pairs) : pairs;
    compositions.set(elements, list);
  }
  return list;
}

// One scratch table for every step, indexed by atomic number (a step is balanced synchronously);
// `touched` keeps the elements in order of first appearance and says which entries to reset.
const totalsByZ = new Float64Array(ELEMENTS.length + 1);
const touched: number[] = [];

interface Totals {
  charge: number;
  sites: number;
  opaque: boolean;
}

function accumulate(terms: readonly StepTerm[], sign: number, scale: number, totals: Totals): void {
  for (const { species, coef } of terms) {
    // Whole numbers below 2^53 add exactly in floating point; the coefficients were scaled to whole numbers.
    const weight = scale === 1 ? sign * coef.toNumber() : sign * Number(coef.num) * (scale / Number(coef.den));
    if (species.opaque) totals.opaque = true;
    const list = compositionOf(species.elements);
    for (let index = 0; index < list.length; index += 2) {
      const z = list[index];
      if (!touched.includes(z)) touched.push(z);
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
  for (const z of touched) {
    const total = totalsByZ[z];
    totalsByZ[z] = 0;
    // z 0 stands for a symbol missing from the periodic table; the formula reader reports those.
    if (total !== 0 && !opaque && z > 0) (imbalance ??= {})[ELEMENTS[z - 1].symbol] = total / scale;
  }
  touched.length = 0;
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
