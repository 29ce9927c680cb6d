import { massActionJacobian } from '../jacobian';
import { massActionDerivative } from '../mass-action';
import type { RateSystem } from '../rate-system';
import { factorLu, solveLu } from '../solver/dense-lu';
import { scatterToDense } from '../solver/sparse-pattern';
import { conservationLaws, type ConservationLaw } from './conservation-laws';

export interface SteadyStateOptions {
  /** Starting point, usually the end of an integration; also fixes the conserved totals. */
  start: Float64Array;
  fixed: Uint8Array;
  /** Light level (0–1) the photolysis steps see. */
  light: number;
  rtol: number;
  atol: number;
  /**
   * A point where no species would move by more than its tolerance over this many seconds counts
   * as steady even when the Jacobian there is singular (exhausted reactants); default 0 (off).
   */
  horizon?: number;
  maxIterations?: number;
}

export interface SteadyState {
  converged: boolean;
  concentrations: Float64Array;
  iterations: number;
  /** Largest |dc/dt| over the free species at the returned point. */
  residual: number;
  conservationLaws: number;
  message: string | null;
}

interface NewtonSystem {
  size: number;
  residual(c: Float64Array, out: Float64Array): void;
  factorJacobian(c: Float64Array): boolean;
  solve(b: Float64Array): void;
}

/**
 * The rate equations with each conservation law's pivot row replaced by the law itself
 * (w · c = w · c_start) and fixed species pinned (c_i = c_start,i), so that the Jacobian is not
 * singular because of conserved totals.
 */
function newtonSystem(system: RateSystem, options: SteadyStateOptions, laws: ConservationLaw[]): NewtonSystem {
  const n = system.speciesCount;
  const { start, fixed, light } = options;
  const jacobian = massActionJacobian(system, fixed);
  const values = new Float64Array(jacobian.pattern.columns.length);
  const matrix = new Float64Array(n * n);
  const pivots = new Int32Array(n);
  const targets = laws.map((law) => law.weights.reduce((sum, w, i) => sum + w * start[i], 0));
  const residual = (c: Float64Array, out: Float64Array): void => {
    massActionDerivative(system, c, light, out, fixed);
    for (let i = 0; i < n; i++) if (fixed[i]) out[i] = c[i] - start[i];
    laws.forEach((law, k) => {
      out[law.pivot] = law.weights.reduce((sum, w, i) => sum + w * c[i], 0) - targets[k];
    });
  };
  const factorJacobian = (c: Float64Array): boolean => {
    jacobian.fill(c, light, values);
    matrix.fill(0);
    scatterToDense(jacobian.pattern, values, matrix, 1);
    for (let i = 0; i < n; i++) if (fixed[i]) matrix[i * n + i] = 1;
    for (const law of laws) matrix.set(law.weights, law.pivot * n);
    return factorLu(matrix, n, pivots);
  };
  return { size: n, residual, factorJacobian, solve: (b) => solveLu(matrix, n, pivots, b) };
}

function scaledSize(step: Float64Array, c: Float64Array, options: SteadyStateOptions): number {
  let largest = 0;
  for (let i = 0; i < step.length; i++) largest = Math.max(largest, Math.abs(step[i]) / (options.atol + options.rtol * Math.abs(c[i])));
  return largest;
}

function newtonStep(newton: NewtonSystem, c: Float64Array): Float64Array {
  const step = new Float64Array(newton.size);
  newton.residual(c, step);
  newton.solve(step);
  return step.map((value) => -value);
}

/** Halves λ until the simplified Newton correction at c + λΔ shrinks (Deuflhard's monotonicity test). */
function dampedUpdate(newton: NewtonSystem, c: Float64Array, step: Float64Array, options: SteadyStateOptions): Float64Array | null {
  const size = scaledSize(step, c, options);
  for (let lambda = 1; lambda >= 1 / 1024; lambda /= 2) {
    const trial = c.map((value, i) => Math.max(0, value + lambda * step[i]));
    const next = newtonStep(newton, trial);
    if (scaledSize(next, trial, options) <= (1 - lambda / 4) * size) return trial;
  }
  return null;
}

/** True when every free species would change by less than atol + rtol·|c| over the horizon. */
function negligibleChange(system: RateSystem, c: Float64Array, options: SteadyStateOptions): boolean {
  const horizon = options.horizon ?? 0;
  if (horizon <= 0) return false;
  const rates = new Float64Array(system.speciesCount);
  massActionDerivative(system, c, options.light, rates, options.fixed);
  return rates.every((rate, i) => Math.abs(rate) * horizon <= options.atol + options.rtol * Math.abs(c[i]));
}

function largestRate(system: RateSystem, c: Float64Array, options: SteadyStateOptions): number {
  const rates = new Float64Array(system.speciesCount);
  massActionDerivative(system, c, options.light, rates, options.fixed);
  return rates.reduce((largest, value) => Math.max(largest, Math.abs(value)), 0);
}

/**
 * Steady state of the rate equations by a damped Newton iteration from `start`, with fixed species
 * held and conserved totals kept at their starting values. Converged when the Newton correction is
 * within the tolerances in every species, or when the rates are negligible over `horizon`.
 */
export function solveSteadyState(system: RateSystem, options: SteadyStateOptions): SteadyState {
  const laws = conservationLaws(system, options.fixed);
  const newton = newtonSystem(system, options, laws);
  let c: Float64Array = Float64Array.from(options.start);
  const finish = (converged: boolean, iterations: number, message: string | null): SteadyState => ({
    converged, concentrations: c, iterations, residual: largestRate(system, c, options), conservationLaws: laws.length, message,
  });
  for (let iteration = 1; iteration <= (options.maxIterations ?? 50); iteration++) {
    if (negligibleChange(system, c, options)) return finish(true, iteration - 1, null);
    if (!newton.factorJacobian(c)) return finish(false, iteration, 'the rate equations do not pin every species down here (a singular Jacobian): a species may be formed with nothing to remove it, or a whole family of states may be steady');
    const step = newtonStep(newton, c);
    if (scaledSize(step, c, options) <= 1) {
      c = c.map((value, i) => Math.max(0, value + step[i]));
      return finish(true, iteration, null);
    }
    const next = dampedUpdate(newton, c, step, options);
    if (next === null) return finish(false, iteration, 'the damped Newton iteration stalled');
    c = next;
  }
  return finish(false, options.maxIterations ?? 50, 'no convergence within the iteration limit');
}
