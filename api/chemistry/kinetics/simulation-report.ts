import { catalystFamily, chainLengths, turnoverFrequencies } from './analysis/chain-and-turnover';
import { speciesBudget } from './analysis/fluxes';
import { routeRates } from './analysis/route-rates';
import type { KineticModel } from './model';
import type { RateSystem } from './rate-system';
import type { RouteReport, SimulationInput, SimulationResult } from './simulation-types';

interface RunOutcome {
  system: RateSystem;
  sigma: number[][];
  states: Float64Array[];
  stepRates: number[][];
}

function initiationSteps(model: KineticModel): number[] {
  return model.steps.flatMap((step, s) => (step.stepClass === 'initiation' ? [s] : []));
}

function familyOf(input: SimulationInput, catalyst: { species: string; family?: string[] }): number[] {
  const { species } = input.model;
  const index = (key: string) => species.indexOf(key);
  if (catalyst.family) return catalyst.family.map(index).filter((i) => i >= 0);
  const candidates = (input.intermediates ?? []).map(index).filter((i) => i >= 0);
  const composition = input.composition ?? species.map(() => null);
  return catalystFamily(index(catalyst.species), candidates, composition);
}

function routeReports(input: SimulationInput, outcome: RunOutcome, fitted: number[][]): RouteReport[] {
  const initiation = initiationSteps(input.model);
  return (input.routes ?? []).map((route, r) => {
    const rates = fitted.map((atTime) => atTime[r]);
    const turnover = (input.catalysts ?? []).map((catalyst) => {
      const family = familyOf(input, catalyst);
      return { catalyst: catalyst.species, family: family.map((i) => input.model.species[i]), values: turnoverFrequencies(rates, outcome.states, family) };
    });
    return { name: route.name, rates, chainLength: chainLengths(rates, outcome.stepRates, initiation), turnover };
  });
}

/** The per-time analysis of a finished (or stopped) run: budgets, route rates, chain lengths, TOFs. */
export function analyseRun(input: SimulationInput, outcome: RunOutcome): Pick<SimulationResult, 'production' | 'loss' | 'byStep' | 'routes' | 'routeResidual'> {
  const { model } = input;
  const budget = speciesBudget(outcome.system, outcome.stepRates);
  const byStep = budget.byStep.map((flux) => ({ species: model.species[flux.species], step: model.steps[flux.step].label, rates: flux.rates }));
  const fit = routeRates(outcome.sigma, outcome.stepRates);
  const routes = fit ? routeReports(input, outcome, fit.rates) : [];
  return { production: budget.production, loss: budget.loss, byStep, routes, routeResidual: fit ? fit.residual : null };
}
