import * as mathjs from 'mathjs';
import { buildRateSystem } from '@api/chemistry/kinetics/build-system';
import { lightLevel, type LightProfile } from '@api/chemistry/kinetics/light';
import { massActionDerivative } from '@api/chemistry/kinetics/mass-action';
import type { KineticModel } from '@api/chemistry/kinetics/model';

export interface PeerRun {
  ms: number;
  reachedTime: number;
  finished: boolean;
}

class CapReached extends Error {}

type OdeRight = (t: number, y: number[]) => number[];
type SolveOde = (f: OdeRight, span: number[], y0: number[], options: Record<string, unknown>) => unknown;
// solveODE is part of mathjs 15 but missing from its type declarations.
const { solveODE } = mathjs as unknown as { solveODE: SolveOde };

/**
 * The same rate equations integrated by mathjs solveODE (explicit Dormand–Prince RK45, a
 * non-stiff method) under a wall-clock cap: the right-hand side throws once the cap has passed, and
 * the last time it was asked for is how far the peer got. solveODE controls the absolute error,
 * so its tolerance is rtol × the largest initial concentration, and it starts from a step of
 * 1e-6 s (its default first step is the whole span).
 */
export function runPeer(model: KineticModel, y0: number[], tEnd: number, light: LightProfile, rtol: number, capMs: number): PeerRun {
  const { system } = buildRateSystem(model, { T: 298, P: 1 });
  if (!system) throw new Error('the bench mechanism does not compile');
  const frozen = new Uint8Array(y0.length);
  const out = new Float64Array(y0.length);
  const start = performance.now();
  let reachedTime = 0;
  const derivative = (t: number, y: number[]) => {
    if (performance.now() - start > capMs) throw new CapReached();
    reachedTime = t;
    massActionDerivative(system, y, lightLevel(light, t), out, frozen);
    return Array.from(out);
  };
  try {
    solveODE(derivative, [0, tEnd], y0, { method: 'RK45', tol: rtol * Math.max(...y0), firstStep: 1e-6, maxIter: 1e12 });
    return { ms: performance.now() - start, reachedTime: tEnd, finished: true };
  } catch (error) {
    if (!(error instanceof CapReached)) throw error;
    return { ms: performance.now() - start, reachedTime, finished: false };
  }
}
