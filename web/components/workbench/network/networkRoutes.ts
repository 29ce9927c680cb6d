import type { RouteJson, StepJson } from '@api/analysis/analysis.schemas';

export interface RouteHighlight {
  /** False when no route is chosen: nothing is faded then. */
  active: boolean;
  /** Stoichiometric number of each step of the route (σ ≠ 0). */
  sigma: Map<string, number>;
  /** Species the route's steps touch. */
  species: Set<string>;
  /** Species the route forms and consumes again (net zero): the catalytic cycle runs through them. */
  cycleSpecies: Set<string>;
}

const NOTHING: RouteHighlight = { active: false, sigma: new Map(), species: new Set(), cycleSpecies: new Set() };

/** Σ σ·ν of each species over the route, with reactants counted negative. */
function netChange(steps: StepJson[], sigma: Map<string, number>): Map<string, number> {
  const net = new Map<string, number>();
  const add = (key: string, amount: number) => net.set(key, (net.get(key) ?? 0) + amount);
  for (const step of steps) {
    const s = sigma.get(step.id);
    if (s === undefined) continue;
    step.reactants.forEach((term) => add(term.key, -s * term.coef));
    step.products.forEach((term) => add(term.key, s * term.coef));
  }
  return net;
}

/**
 * What a route lights up: its steps with σ, the species they touch, and the cycle species —
 * those whose net change over the route is zero (to 1e-9, the coefficients being small rationals).
 */
export function routeHighlight(steps: StepJson[], route: RouteJson | null): RouteHighlight {
  if (!route) return NOTHING;
  const sigma = new Map(Object.entries(route.multipliers).filter(([, value]) => value !== 0));
  const net = netChange(steps, sigma);
  const cycleSpecies = new Set([...net].filter(([, change]) => Math.abs(change) < 1e-9).map(([key]) => key));
  return { active: true, sigma, species: new Set(net.keys()), cycleSpecies };
}

/** The label of a route in the picker: "Overall · 2 O3 → 3 O2", "Route 2 · null cycle". */
export function routeOptionLabel(route: RouteJson, index: number, overall: number | null): string {
  const name = index === overall ? 'Overall' : `Route ${index + 1}`;
  return `${name} · ${route.kind === 'null-cycle' ? 'null cycle' : route.net}`;
}
