import type { StepModel, StepTerm } from './step-model';

/** Conservation of elements, charge and sites in one step (products − reactants). */
export interface StepBalance {
  /** Non-zero element differences only. */
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

// One scratch table for every step: a step is balanced synchronously, and a fresh Map per step
// was a large share of the engine's garbage on big mechanisms.
const elementTotals = new Map<string, number>();

// Shared by every step whose elements balance (frozen: it is never filled in).
const NO_IMBALANCE: Record<string, number> = Object.freeze({});

// Symbol, count, symbol, count… per composition, read once: walking the composition objects
// key by key (each species has its own shape) was the slowest part of balancing a large text.
const elementLists = new WeakMap<Record<string, number>, readonly (string | number)[]>();

function elementList(elements: Record<string, number>): readonly (string | number)[] {
  let list = elementLists.get(elements);
  if (!list) elementLists.set(elements, (list = Object.entries(elements).flat()));
  return list;
}

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
    const list = elementList(species.elements);
    for (let index = 0; index < list.length; index += 2) {
      const symbol = list[index] as string;
      elementTotals.set(symbol, (elementTotals.get(symbol) ?? 0) + weight * (list[index + 1] as number));
    }
    totals.charge += weight * species.charge;
    totals.sites += weight * species.sites;
  }
}

/** Element, charge and site balance of a step (exact: coefficients are scaled to whole numbers). */
export function balanceOf(step: StepModel): StepBalance {
  const scale = denominatorLcm(step);
  const totals: Totals = { charge: 0, sites: 0, opaque: false };
  elementTotals.clear();
  accumulate(step.reactants, -1, scale, totals);
  accumulate(step.products, 1, scale, totals);
  let imbalance: Record<string, number> | null = null;
  if (!totals.opaque) {
    for (const [symbol, total] of elementTotals) if (total !== 0) (imbalance ??= {})[symbol] = total / scale;
  }
  const chargeDelta = totals.charge / scale;
  const siteDelta = totals.sites / scale;
  const balanced = imbalance === null && chargeDelta === 0 && siteDelta === 0;
  return { imbalance: imbalance ?? NO_IMBALANCE, chargeDelta, siteDelta, balanced, elementsChecked: !totals.opaque };
}
