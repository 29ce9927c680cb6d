import type { Diagnostic } from '@grammar/diagnostics';
import type { RouteJson, SpeciesRole } from './analysis-types';
import { finding } from './diagnostic-codes';
import { routeEnthalpy } from './enthalpy';
import { equationText } from './equation-format';
import { Fraction } from './fraction';
import { chooseIntermediates } from './intermediates';
import { assignRoles } from './roles';
import { findRoutes, netOfRoute, type RouteSet } from './routes';
import type { RegisteredSpecies } from './species-registry';
import type { StepModel } from './step-model';
import type { Stoichiometry } from './stoichiometry';
import type { EnthalpyLookup } from './thermo';

export interface RouteAnalysis {
  intermediates: string[];
  explanation: string;
  routes: RouteJson[];
  overall: number | null;
  roles: Map<string, SpeciesRole>;
}

const NOTHING: ReadonlySet<string> = new Set();
const NO_ENTHALPY = { dH: null, fromSteps: null, fromNet: null };

interface RouteContext {
  steps: readonly StepModel[];
  stoichiometry: Stoichiometry;
  stepDH: readonly (number | null)[];
  /** Whether each step conserves its atoms, charge and sites: a route through one that does not has no ΔH. */
  stepBalanced: readonly boolean[];
  lookup: EnthalpyLookup;
  diagnostics: Diagnostic[];
}

function netText(net: ReadonlyMap<string, Fraction>): string {
  if (net.size === 0) return '(null cycle)';
  const reactants = [...net].filter(([, coef]) => coef.sign() < 0).map(([key, coef]) => ({ key, coef: coef.neg() }));
  const products = [...net].filter(([, coef]) => coef.sign() > 0).map(([key, coef]) => ({ key, coef }));
  return equationText(reactants, products);
}

function numbers(map: ReadonlyMap<string, Fraction>): Record<string, number> {
  return Object.fromEntries([...map].map(([key, value]) => [key, value.toNumber()]));
}

function routeJson(sigma: bigint[], flags: { direct: boolean; basis: boolean }, context: RouteContext): RouteJson {
  const { stoichiometry, steps } = context;
  const everything = netOfRoute(stoichiometry, sigma, NOTHING);
  const net = new Map([...everything].filter(([key]) => !stoichiometry.aside.has(key)));
  const aside = new Map([...everything].filter(([key]) => stoichiometry.aside.has(key)));
  const throughUnbalanced = sigma.some((value, index) => value !== 0n && !context.stepBalanced[index]);
  const enthalpy = throughUnbalanced ? NO_ENTHALPY : routeEnthalpy(sigma, context.stepDH, net, context.lookup);
  const multipliers: Record<string, number> = {};
  sigma.forEach((value, index) => value !== 0n && (multipliers[steps[index].id] = Number(value)));
  const kind = net.size > 0 ? 'productive' : 'null-cycle';
  return { multipliers, net: netText(net), netSpecies: numbers(net), aside: numbers(aside), kind, dH: enthalpy.dH, dHFromSteps: enthalpy.fromSteps, dHFromNet: enthalpy.fromNet, ...flags };
}

function reportRouteNotes(set: RouteSet, productive: boolean, maxRouteSteps: number, context: RouteContext): void {
  const at = context.steps[0];
  if (set.directComplete === null) {
    context.diagnostics.push(finding('direct-routes-skipped', at, `direct routes are listed for up to ${maxRouteSteps} steps; this mechanism has ${context.steps.length} (the route basis is still given)`));
  } else if (set.directComplete === false) {
    context.diagnostics.push(finding('direct-routes-limit', at, 'listing direct routes stopped at its work limit; the route basis is complete, the list of direct routes is not'));
  }
  if (!productive) context.diagnostics.push(finding('no-productive-route', at, 'every route is a null cycle: the steps add up to no net reaction with these intermediates'));
}

/** Intermediates, routes with net reactions and enthalpies, the overall route and the roles. */
export function analyseRoutes(
  context: RouteContext,
  species: readonly RegisteredSpecies[],
  declared: { intermediates: string[] | null; terminal: ReadonlySet<string> },
  maxRouteSteps: number,
): RouteAnalysis {
  const choice = chooseIntermediates(context.stoichiometry, species, declared, maxRouteSteps);
  const set = findRoutes(context.stoichiometry, choice.keys, maxRouteSteps);
  const routes = set.routes.map(({ sigma, direct, basis }) => routeJson(sigma, { direct, basis }, context));
  reportRouteNotes(set, routes.some((route) => route.kind === 'productive'), maxRouteSteps, context);
  const overallProductive = set.overall !== null && routes[set.overall].kind === 'productive';
  const roleIndex = overallProductive ? set.overall : routes.findIndex((route) => route.kind === 'productive');
  const sigma = roleIndex !== null && roleIndex >= 0 ? set.routes[roleIndex].sigma : null;
  const net = sigma ? netOfRoute(context.stoichiometry, sigma, context.stoichiometry.aside) : new Map<string, Fraction>();
  const roles = assignRoles(species, context.steps, sigma, net);
  return { intermediates: choice.keys, explanation: choice.explanation, routes, overall: set.overall, roles };
}
