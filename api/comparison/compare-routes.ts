import type { AnalysisView, RouteView } from '../revisions/analysis-view';
import { sameEnthalpy, type Change } from './compare-steps';

export interface RouteRef {
  net: string;
  steps: string[];
  kind: string;
  dH: number | null;
}

export interface RouteComparison {
  added: RouteRef[];
  removed: RouteRef[];
  changed: Array<{ net: string; steps: string[]; multipliers?: Change<Record<string, number>>; dH?: Change<number | null> }>;
}

export interface SetChange {
  added: string[];
  removed: string[];
}

// A route is identified by its net reaction and the steps it uses: several routes may share a net.
const stepsUsed = (route: RouteView) => Object.keys(route.multipliers).sort();
const routeKey = (route: RouteView) => `${route.net} via ${stepsUsed(route).join(', ')}`;
const sameMultipliers = (a: Record<string, number>, b: Record<string, number>) =>
  JSON.stringify(Object.entries(a).sort()) === JSON.stringify(Object.entries(b).sort());

/** Routes whose net reaction appeared, disappeared, or kept its net but changed numbers or ΔH. */
export function compareRoutes(before: readonly RouteView[], after: readonly RouteView[]): RouteComparison {
  const mapOf = (routes: readonly RouteView[]) => new Map(routes.map((route) => [routeKey(route), route] as const));
  const a = mapOf(before);
  const b = mapOf(after);
  const refOf = (route: RouteView): RouteRef => ({ net: route.net, steps: stepsUsed(route), kind: route.kind, dH: route.dH });
  const changed: RouteComparison['changed'] = [];
  for (const [key, old] of a) {
    const now = b.get(key);
    if (!now) continue;
    const entry: RouteComparison['changed'][number] = { net: old.net, steps: stepsUsed(old) };
    if (!sameMultipliers(old.multipliers, now.multipliers)) entry.multipliers = { from: old.multipliers, to: now.multipliers };
    if (!sameEnthalpy(old.dH, now.dH)) entry.dH = { from: old.dH, to: now.dH };
    if (entry.multipliers || entry.dH) changed.push(entry);
  }
  return {
    added: [...b].filter(([key]) => !a.has(key)).map(([, route]) => refOf(route)),
    removed: [...a].filter(([key]) => !b.has(key)).map(([, route]) => refOf(route)),
    changed,
  };
}

function setChange(before: string[], after: string[]): SetChange {
  return { added: after.filter((x) => !before.includes(x)), removed: before.filter((x) => !after.includes(x)) };
}

const withRole = (analysis: AnalysisView, role: string) => analysis.species.filter((s) => s.role === role).map((s) => s.key);

/** Catalysts, intermediates and species that entered or left the mechanism. */
export function compareRoles(before: AnalysisView, after: AnalysisView) {
  return {
    catalysts: setChange(withRole(before, 'catalyst'), withRole(after, 'catalyst')),
    intermediates: setChange(withRole(before, 'intermediate'), withRole(after, 'intermediate')),
    species: setChange(before.species.map((s) => s.key), after.species.map((s) => s.key)),
  };
}
