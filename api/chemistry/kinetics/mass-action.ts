import type { RateSystem, SystemStep } from './rate-system';

/** x^e for mass-action terms; a non-positive base with a non-integer or zero-crossing power gives 0. */
export function massActionPower(x: number, e: number): number {
  if (e === 0) return 1;
  if (e === 1) return x;
  if (e === 2) return x * x;
  if (x <= 0) return 0;
  return Math.pow(x, e);
}

/** k · Π c_i^ν_i over one side of a step. */
export function sideRate(k: number, index: Int32Array, coef: Float64Array, c: ArrayLike<number>): number {
  let rate = k;
  for (let j = 0; j < index.length; j++) rate *= massActionPower(c[index[j]], coef[j]);
  return rate;
}

/** Net rate of one step (forward − reverse); `light` scales the forward rate of a photolysis step. */
export function stepRate(step: SystemStep, c: ArrayLike<number>, light: number): number {
  const kForward = step.photolysis ? step.kForward * light : step.kForward;
  const forward = sideRate(kForward, step.reactantIndex, step.reactantCoef, c);
  if (step.kReverse === 0) return forward;
  return forward - sideRate(step.kReverse, step.productIndex, step.productCoef, c);
}

/** Net rate of every step, in concentration per second, written into `out`. */
export function stepRates(system: RateSystem, c: ArrayLike<number>, light: number, out: Float64Array): Float64Array {
  for (let s = 0; s < system.steps.length; s++) out[s] = stepRate(system.steps[s], c, light);
  return out;
}

/**
 * dc/dt = Σ_s ν_s r_s, with the rows of frozen (fixed) species kept at zero. With
 * `photolysisOnly`, only photolysis steps contribute: used with `light` = dL/dt for ∂f/∂t.
 */
export function massActionDerivative(
  system: RateSystem,
  c: ArrayLike<number>,
  light: number,
  out: Float64Array,
  frozen: Uint8Array,
  photolysisOnly = false,
): void {
  out.fill(0);
  for (const step of system.steps) {
    if (photolysisOnly && !step.photolysis) continue;
    const rate = photolysisOnly
      ? sideRate(step.kForward * light, step.reactantIndex, step.reactantCoef, c)
      : stepRate(step, c, light);
    if (rate === 0) continue;
    for (let j = 0; j < step.netIndex.length; j++) out[step.netIndex[j]] += step.netCoef[j] * rate;
  }
  for (let i = 0; i < out.length; i++) if (frozen[i]) out[i] = 0;
}
