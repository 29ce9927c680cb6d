import type { Composition } from './element-drift';

/**
 * Chain length at each time: the route rate divided by the initiation rate (the summed net rates
 * of the initiation steps, per initiation event as in Houston's treatment; a definition per
 * radical formed would halve it for I → 2 R). Null where there is no initiation.
 */
export function chainLengths(routeRate: number[], stepRates: number[][], initiationSteps: number[]): (number | null)[] {
  return routeRate.map((rate, k) => {
    const initiation = initiationSteps.reduce((sum, s) => sum + stepRates[k][s], 0);
    return initiation > 0 ? rate / initiation : null;
  });
}

/**
 * Turnover frequency of a catalyst at each time: the route rate divided by the total concentration
 * of the catalyst's forms (the catalyst and the intermediates that carry it). Null where the forms
 * are all absent.
 */
export function turnoverFrequencies(routeRate: number[], states: ArrayLike<number>[], family: number[]): (number | null)[] {
  return routeRate.map((rate, k) => {
    const amount = family.reduce((sum, i) => sum + states[k][i], 0);
    return amount > 0 ? rate / amount : null;
  });
}

/**
 * The forms of a catalyst: itself plus every candidate (intermediate) that contains each element
 * of the catalyst (Br• → BrO•; NO → NO2; Cl• → ClO•, but not O(3P)). With an unknown composition
 * only the catalyst itself is counted.
 */
export function catalystFamily(catalyst: number, candidates: number[], composition: Composition[]): number[] {
  const own = composition[catalyst];
  if (!own) return [catalyst];
  const elements = Object.keys(own).filter((element) => own[element] > 0);
  const carriers = candidates.filter((i) => {
    const counts = composition[i];
    return i !== catalyst && counts !== null && elements.every((element) => (counts[element] ?? 0) > 0);
  });
  return [catalyst, ...carriers];
}
