import type { MechanismAnalysis, RouteJson } from '@api/analysis/analysis.schemas';

export interface RouteRow {
  route: RouteJson;
  /** The route's number as the engine lists it (1-based). */
  number: number;
  overall: boolean;
  /** Stoichiometric numbers in step order, for the compact column. */
  multipliers: { step: string; sigma: number }[];
}

/** The routes with the overall route first, each with its stoichiometric numbers in step order. */
export function routeRows(analysis: MechanismAnalysis): RouteRow[] {
  const order = new Map(analysis.steps.map((step, index) => [step.id, index]));
  const rows = analysis.routes.map((route, index) => ({
    route,
    number: index + 1,
    overall: index === analysis.overall,
    multipliers: Object.entries(route.multipliers)
      .map(([step, sigma]) => ({ step, sigma }))
      .sort((a, b) => (order.get(a.step) ?? 0) - (order.get(b.step) ?? 0)),
  }));
  return rows.sort((a, b) => Number(b.overall) - Number(a.overall));
}
