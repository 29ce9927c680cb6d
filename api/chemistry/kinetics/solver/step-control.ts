import type { StepWork } from './rodas4-step';

/** Step-size factors of rodas.f (Hairer & Wanner): safety 0.9, growth at most 6, shrink at most 5. */
const SAFETY = 0.9;
const MAX_GROWTH = 6;
const MAX_SHRINK = 5;

/** Tolerances: componentwise scale sk = atol + rtol · max(|y0|, |y1|). */
export interface Tolerances {
  rtol: number;
  atol: number;
}

/** Root-mean-square of the embedded error estimate u_6 / sk over the free components. */
export function errorNorm(work: StepWork, y: Float64Array, tolerances: Tolerances, frozen: Uint8Array): number {
  const estimate = work.stages[5];
  let sum = 0;
  let count = 0;
  for (let i = 0; i < y.length; i++) {
    if (frozen[i]) continue;
    const scale = tolerances.atol + tolerances.rtol * Math.max(Math.abs(y[i]), Math.abs(work.yNew[i]));
    sum += (estimate[i] / scale) ** 2;
    count++;
  }
  return count === 0 ? 0 : Math.sqrt(sum / count);
}

/** The next step size after a step with error norm `error` (order 4: exponent 1/4). */
export function nextStepSize(h: number, error: number, afterRejection: boolean): number {
  if (!Number.isFinite(error)) return h / MAX_SHRINK;
  const divisor = Math.min(MAX_SHRINK, Math.max(1 / MAX_GROWTH, error ** 0.25 / SAFETY));
  const proposed = h / divisor;
  return afterRejection ? Math.min(proposed, h) : proposed;
}

/** A first step from the size of y and f (Hairer, Nørsett & Wanner, Solving ODEs I, II.4, simplified). */
export function initialStepSize(y: Float64Array, f: Float64Array, tolerances: Tolerances, span: number): number {
  let ySize = 0;
  let fSize = 0;
  for (let i = 0; i < y.length; i++) {
    const scale = tolerances.atol + tolerances.rtol * Math.abs(y[i]);
    ySize += (y[i] / scale) ** 2;
    fSize += (f[i] / scale) ** 2;
  }
  const guess = ySize < 1e-10 || fSize < 1e-10 ? 1e-6 : 0.01 * Math.sqrt(ySize / fSize);
  return Math.min(guess, span);
}
