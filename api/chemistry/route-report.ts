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

interface RouteContext {
  steps: readonly StepModel[];
  stoichiometry: Stoichiometry;
  /** ΔH of each step; the steps are all balanced (route-steps.ts leaves the others out). */
  stepDH: readonly (number | null)[];
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

function routeJson(sigma: bigint[], flags: { direct: boolean | null; basis: boolean }, context: RouteContext): RouteJson {
  const { stoichiometry, steps } = context;
  const everything = netOfRoute(stoichiometry, sigma, NOTHING);
  const net = new Map([...everything].filter(([key]) => !stoichiometry.aside.has(key)));
  const aside = new Map([...everything].filter(([key]) => stoichiometry.aside.has(key)));
  const enthalpy = routeEnthalpy(sigma, context.stepDH, net, context.lookup);
  const multipliers: Record<string, number> = {};
  sigma.forEach((value, index) => value !== 0n && (multipliers[steps[index].id] = Number(value)));
  const kind = net.size > 0 ? 'productive' : 'null-cycle';
  const reversesOneWay = steps.filter((step, index) => sigma[index] < 0n && !step.reversible).map((step) => step.id);
  return { multipliers, net: netText(net), netSpecies: numbers(net), aside: numbers(aside), kind, dH: enthalpy.dH, dHFromSteps: enthalpy.fromSteps, dHFromNet: enthalpy.fromNet, ...flags, reversesOneWay };
}

/**
 * Productive routes that run a one-way step backwards, named once: such a route cannot occur as
 * written. (A null cycle that does, such as a step against its own duplicate, changes nothing.)
 */
function reportReversedRoutes(routes: readonly RouteJson[], context: RouteContext): void {
  const reversing = routes.map((route, index) => ({ route, number: index + 1 })).filter(({ route }) => route.kind === 'productive' && route.reversesOneWay.length > 0);
  if (reversing.length === 0) return;
  const listedRoutes = reversing.map(({ route, number }) => `route ${number} (${route.reversesOneWay.join(', ')})`).join('; ');
  const feasible = routes.some((route) => route.kind === 'productive' && route.reversesOneWay.length === 0);
  const hint = feasible ? '' : '; no productive route runs every one-way step forwards: a step may be missing (a termination, say), or pin the intermediates with %intermediates or %terminal';
  const message = `${reversing.length === 1 ? 'a route runs' : 'routes run'} a one-way step backwards, so ${reversing.length === 1 ? 'it cannot' : 'they cannot'} occur as written: ${listedRoutes}${hint}`;
  // Placed at the first step run backwards, where the author would look for the missing step.
  const at = context.steps.find((step) => step.id === reversing[0].route.reversesOneWay[0]) ?? context.steps[0];
  context.diagnostics.push(finding('route-reverses-one-way-step', at, message));
}

/** The route roles are read from: the overall route when productive, else the first productive route that runs no one-way step backwards, else the first productive one. */
function roleRoute(routes: readonly RouteJson[], overall: number | null): number | null {
  if (overall !== null && routes[overall].kind === 'productive') return overall;
  const forwards = routes.findIndex((route) => route.kind === 'productive' && route.reversesOneWay.length === 0);
  if (forwards >= 0) return forwards;
  const any = routes.findIndex((route) => route.kind === 'productive');
  // With null cycles only, the overall one still tells catalysts (first met as reactants) from intermediates.
  return any >= 0 ? any : overall;
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
  reportReversedRoutes(routes, context);
  const roleIndex = roleRoute(routes, set.overall);
  const sigma = roleIndex !== null ? set.routes[roleIndex].sigma : null;
  const net = sigma ? netOfRoute(context.stoichiometry, sigma, context.stoichiometry.aside) : new Map<string, Fraction>();
  const roles = assignRoles(species, context.steps, sigma, net, new Set(choice.keys));
  return { intermediates: choice.keys, explanation: choice.explanation, routes, overall: set.overall, roles };
}
