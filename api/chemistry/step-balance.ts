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

/** Least common multiple of the coefficient denominators, so that sums stay whole numbers. */
function denominatorLcm(step: StepModel): number {
  let common = 1;
  for (const term of step.terms) {
    const den = Number(term.coef.den);
    let a = common;
    let b = den;
    while (b !== 0) [a, b] = [b, a % b];
    common = (common / a) * den;
  }
  return common;
}

interface Totals {
  elements: Map<string, number>;
  charge: number;
  sites: number;
  opaque: boolean;
}

function accumulate(terms: readonly StepTerm[], sign: number, scale: number, totals: Totals): void {
  for (const { species, coef } of terms) {
    // Whole numbers below 2^53 add exactly in floating point; the coefficients were scaled to whole numbers.
    const weight = sign * Number(coef.num) * (scale / Number(coef.den));
    if (species.opaque) totals.opaque = true;
    for (const symbol in species.elements) {
      totals.elements.set(symbol, (totals.elements.get(symbol) ?? 0) + weight * species.elements[symbol]);
    }
    totals.charge += weight * species.charge;
    totals.sites += weight * species.sites;
  }
}

/** Element, charge and site balance of a step (exact: coefficients are scaled to whole numbers). */
export function balanceOf(step: StepModel): StepBalance {
  const scale = denominatorLcm(step);
  const totals: Totals = { elements: new Map(), charge: 0, sites: 0, opaque: false };
  accumulate(step.reactants, -1, scale, totals);
  accumulate(step.products, 1, scale, totals);
  const imbalance: Record<string, number> = {};
  if (!totals.opaque) for (const [symbol, total] of totals.elements) if (total !== 0) imbalance[symbol] = total / scale;
  const chargeDelta = totals.charge / scale;
  const siteDelta = totals.sites / scale;
  const balanced = Object.keys(imbalance).length === 0 && chargeDelta === 0 && siteDelta === 0;
  return { imbalance, chargeDelta, siteDelta, balanced, elementsChecked: !totals.opaque };
}
