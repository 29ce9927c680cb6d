import { stepRates } from '../mass-action';
import type { RateSystem } from '../rate-system';

/** Net rate of every step at every output time: rates[time][step]. */
export function stepRatesOverTime(system: RateSystem, states: ArrayLike<number>[], lightLevels: number[]): number[][] {
  const out = new Float64Array(system.steps.length);
  return states.map((state, k) => Array.from(stepRates(system, state, lightLevels[k], out)));
}

/** What one step does to one species over time: ν_is · r_s (positive = production). */
export interface SpeciesStepFlux {
  species: number;
  step: number;
  rates: number[];
}

/** Production and loss of each species, split by step, at every output time. */
export interface SpeciesBudget {
  byStep: SpeciesStepFlux[];
  /** production[time][species] = Σ_s max(0, ν_is r_s); loss likewise with the negative terms. */
  production: number[][];
  loss: number[][];
}

/** Splits each species' rate of change into the contributions of the steps that form or consume it. */
export function speciesBudget(system: RateSystem, rates: number[][]): SpeciesBudget {
  const byStep: SpeciesStepFlux[] = [];
  const production = rates.map(() => new Array<number>(system.speciesCount).fill(0));
  const loss = rates.map(() => new Array<number>(system.speciesCount).fill(0));
  system.steps.forEach((step, s) => {
    step.netIndex.forEach((species, j) => {
      const contribution = rates.map((atTime) => step.netCoef[j] * atTime[s]);
      contribution.forEach((value, k) => {
        if (value > 0) production[k][species] += value;
        else loss[k][species] -= value;
      });
      byStep.push({ species, step: s, rates: contribution });
    });
  });
  return { byStep, production, loss };
}
