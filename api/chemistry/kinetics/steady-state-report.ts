import { solveSteadyState, type SteadyState } from './analysis/steady-state';
import { massActionDerivative } from './mass-action';
import { massActionProblem } from './mass-action-problem';
import type { RateSystem } from './rate-system';
import type { SteadyStateReport } from './simulation-types';
import { integrateStiff } from './solver/integrate';

export interface SteadyStateSetup {
  system: RateSystem;
  species: string[];
  start: Float64Array;
  /** Species held at their values in `start`: the fixed species, and all but the intermediates when those are named. */
  held: Uint8Array;
  light: number;
  rtol: number;
  atol: number;
  /** A time long enough to relax to steady state when Newton alone does not converge. */
  relaxTime: number;
  /** Cancellation and wall-time budget of the run, honoured by the relaxing integration too. */
  shouldStop?: () => boolean;
  maxWallMs?: number;
}

function relaxed(setup: SteadyStateSetup): Float64Array {
  const light = { kind: 'constant' as const, level: setup.light };
  const problem = massActionProblem(setup.system, { fixed: setup.held, light, t0: 0, tEnd: setup.relaxTime });
  const { shouldStop, maxWallMs } = setup;
  const limits = { maxSteps: 20_000, shouldStop, maxWallMs };
  const run = integrateStiff(problem, setup.start, { t0: 0, tEnd: setup.relaxTime, outputTimes: [setup.relaxTime], rtol: setup.rtol, atol: setup.atol, ...limits });
  return run.states.at(-1) ?? setup.start;
}

/** The species still moving fastest (relative to their size) at a point that is not steady, with the way they move. */
function stillChanging(state: SteadyState, setup: SteadyStateSetup): string {
  const rates = new Float64Array(setup.species.length);
  massActionDerivative(setup.system, state.concentrations, setup.light, rates, setup.held);
  const moving = setup.species
    // Moving means changing by more than the tolerance over the relaxation time, as in the solver's own test.
    .map((key, i) => ({ key, rate: rates[i], relative: (Math.abs(rates[i]) * setup.relaxTime) / (setup.atol + setup.rtol * Math.abs(state.concentrations[i])) }))
    .filter((item, i) => !setup.held[i] && item.relative > 1)
    .sort((a, b) => b.relative - a.relative)
    .slice(0, 3);
  if (moving.length === 0) return '';
  return ` At the last estimate ${moving.map((item) => `${item.key} is still ${item.rate > 0 ? 'rising' : 'falling'}`).join(', ')}; the values shown are the last estimate, not a steady state.`;
}

function report(state: SteadyState, setup: SteadyStateSetup, method: SteadyStateReport['method']): SteadyStateReport {
  const concentrations = Object.fromEntries(setup.species.map((key, i) => [key, state.concentrations[i]]));
  const solvedFor = setup.species.filter((_, i) => !setup.held[i]);
  const message = state.converged || state.message === null ? state.message : `${capitalised(state.message)}.${stillChanging(state, setup)}`;
  return { ...state, message, concentrations, solvedFor, method };
}

function capitalised(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/**
 * The steady state near the end of a run, at a constant light level: Newton from the final state,
 * and when that fails, a long integration at that light level followed by Newton again. With the
 * intermediates named, only they are solved for (the quasi-steady state of an open system whose
 * reactants and products keep changing); otherwise every species that is not fixed.
 */
export function steadyStateNear(setup: SteadyStateSetup): SteadyStateReport {
  const options = { fixed: setup.held, light: setup.light, rtol: setup.rtol, atol: setup.atol, horizon: setup.relaxTime };
  const direct = solveSteadyState(setup.system, { ...options, start: setup.start });
  if (direct.converged) return report(direct, setup, 'newton');
  const polished = solveSteadyState(setup.system, { ...options, start: relaxed(setup) });
  return report(polished, setup, 'integrate-then-newton');
}
