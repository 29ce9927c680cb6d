import { catalystFamily, chainLengths, turnoverFrequencies } from './analysis/chain-and-turnover';
import { speciesBudget } from './analysis/fluxes';
import { independentRoutes } from './analysis/independent-routes';
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

/** A route whose steps add up to nothing (every species' net change zero): it carries no chain. */
function isNullCycle(system: RateSystem, sigma: readonly number[]): boolean {
  const net = new Map<number, number>();
  system.steps.forEach((step, s) => {
    if (!sigma[s]) return;
    step.netIndex.forEach((species, k) => net.set(species, (net.get(species) ?? 0) + sigma[s] * step.netCoef[k]));
  });
  return [...net.values()].every((value) => Math.abs(value) < 1e-9);
}

function routeReports(input: SimulationInput, outcome: RunOutcome, kept: number[], fitted: number[][]): RouteReport[] {
  const initiation = initiationSteps(input.model);
  return kept.map((routeIndex, r) => {
    const route = (input.routes ?? [])[routeIndex];
    const rates = fitted.map((atTime) => atTime[r]);
    const turnover = (input.catalysts ?? []).map((catalyst) => {
      const family = familyOf(input, catalyst);
      return { catalyst: catalyst.species, family: family.map((i) => input.model.species[i]), values: turnoverFrequencies(rates, outcome.states, family) };
    });
    const chainLength = isNullCycle(outcome.system, outcome.sigma[routeIndex]) ? rates.map(() => null) : chainLengths(rates, outcome.stepRates, initiation);
    return { name: route.name, rates, chainLength, turnover };
  });
}

/**
 * The per-time analysis of a finished (or stopped) run: budgets, route rates, chain lengths, TOFs.
 * Routes that depend linearly on earlier ones are left out of the fit (their rates are not
 * defined) and named in routesLeftOut.
 */
export function analyseRun(input: SimulationInput, outcome: RunOutcome): Pick<SimulationResult, 'production' | 'loss' | 'byStep' | 'routes' | 'routeResidual' | 'routesLeftOut'> {
  const { model } = input;
  const budget = speciesBudget(outcome.system, outcome.stepRates);
  const byStep = budget.byStep.map((flux) => ({ species: model.species[flux.species], step: model.steps[flux.step].label, rates: flux.rates }));
  const kept = independentRoutes(outcome.sigma);
  const fit = routeRates(kept.map((r) => outcome.sigma[r]), outcome.stepRates);
  const routes = fit ? routeReports(input, outcome, kept, fit.rates) : [];
  const leftOut = (input.routes ?? []).filter((_, r) => !kept.includes(r)).map((route) => route.name);
  return { production: budget.production, loss: budget.loss, byStep, routes, routeResidual: fit ? fit.residual : null, routesLeftOut: leftOut };
}
