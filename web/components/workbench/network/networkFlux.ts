import type { SimulationResult } from '@api/simulations/simulations.schemas';

export interface StepFluxes {
  /** Time-averaged |net rate| of each step, in the mechanism's concentration unit per second. */
  byStep: Map<string, number>;
  max: number;
}

/** The trapezoid average of |rate| over the run, which weighs a log-spaced grid by time, not by point. */
function averageMagnitude(times: number[], rates: number[]): number {
  const span = times[times.length - 1] - times[0];
  if (!(span > 0)) return Math.abs(rates[rates.length - 1] ?? 0);
  let area = 0;
  for (let i = 1; i < times.length; i += 1) {
    area += ((Math.abs(rates[i]) + Math.abs(rates[i - 1])) / 2) * (times[i] - times[i - 1]);
  }
  return area / span;
}

/** Each step's time-averaged flux from a simulation result (null when there is no usable result). */
export function stepFluxesOf(result: SimulationResult | null): StepFluxes | null {
  if (!result || result.times.length === 0) return null;
  const byStep = new Map<string, number>();
  result.steps.forEach((step, j) => {
    byStep.set(step, averageMagnitude(result.times, result.stepRates.map((row) => row[j])));
  });
  const max = Math.max(0, ...byStep.values());
  return max > 0 ? { byStep, max } : null;
}

export const WIDTH = { plain: 1.5, route: 4, cycle: 5, fluxMin: 1, fluxMax: 12 } as const;
/** Fluxes spread over many decades: widths follow log10 over the top six. */
const FLUX_DECADES = 6;

/** An edge's width: from its flux relative to the largest when simulated, else from its route role. */
export function edgeWidth(edge: { flux: number | null; maxFlux: number | null; inRoute: boolean; inCycle: boolean }): number {
  if (edge.flux !== null && edge.maxFlux) {
    const relative = Math.max(Math.abs(edge.flux) / edge.maxFlux, 10 ** -FLUX_DECADES);
    const fraction = 1 + Math.log10(Math.min(relative, 1)) / FLUX_DECADES;
    return Number((WIDTH.fluxMin + fraction * (WIDTH.fluxMax - WIDTH.fluxMin)).toFixed(2));
  }
  if (edge.inCycle) return WIDTH.cycle;
  return edge.inRoute ? WIDTH.route : WIDTH.plain;
}
