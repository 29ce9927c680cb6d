import type { SparsePattern } from './sparse-pattern';

/** A stiff initial-value problem y' = f(t, y) with a sparse analytic Jacobian. */
export interface StiffProblem {
  size: number;
  pattern: SparsePattern;
  derivative(t: number, y: Float64Array, out: Float64Array): void;
  /** Writes ∂f/∂y at (t, y) as values over `pattern`. */
  jacobian(t: number, y: Float64Array, values: Float64Array): void;
  /** Writes ∂f/∂t; absent for autonomous problems. */
  timeDerivative?(t: number, y: Float64Array, out: Float64Array): void;
  /** Concentrations: negative values are clipped (small) or make the step retry (large). */
  nonNegative?: boolean;
  /** Components that never change (fixed species): left out of the error norm. */
  frozen?: Uint8Array;
  /** Times where f is not smooth (light switched on or off): no step crosses them. */
  breakpoints?: number[];
  /** Told the interval the next step lies in, so piecewise inputs can be judged inside it. */
  enterSegment?(start: number, end: number): void;
}
