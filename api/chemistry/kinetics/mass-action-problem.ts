import { massActionJacobian } from './jacobian';
import { lightBreakpoints, lightLevel, lightSlope, type LightProfile } from './light';
import { massActionDerivative } from './mass-action';
import type { RateSystem } from './rate-system';
import type { StiffProblem } from './solver/problem';

export interface ProblemSetup {
  /** 1 for species held at their initial concentration. */
  fixed: Uint8Array;
  light: LightProfile;
  t0: number;
  tEnd: number;
}

/**
 * The mass-action rate equations of a system as a stiff problem for the integrator: f and the
 * analytic sparse Jacobian, ∂f/∂t from the light profile when photolysis steps see a varying sun,
 * and breakpoints at the light's switching times.
 */
export function massActionProblem(system: RateSystem, setup: ProblemSetup): StiffProblem {
  const { fixed, light } = setup;
  const jacobian = massActionJacobian(system, fixed);
  const hasPhotolysis = system.steps.some((step) => step.photolysis);
  let probe: number | null = null;
  const level = (t: number) => lightLevel(light, t, probe ?? t);
  const problem: StiffProblem = {
    size: system.speciesCount,
    pattern: jacobian.pattern,
    frozen: fixed,
    nonNegative: true,
    breakpoints: hasPhotolysis ? lightBreakpoints(light, setup.t0, setup.tEnd) : [],
    derivative: (t, y, out) => massActionDerivative(system, y, level(t), out, fixed),
    jacobian: (t, y, values) => jacobian.fill(y, level(t), values),
    enterSegment: (start, end) => {
      probe = (start + end) / 2;
    },
  };
  if (hasPhotolysis && light.kind === 'diurnal') {
    problem.timeDerivative = (t, y, out) => massActionDerivative(system, y, lightSlope(light, t), out, fixed, true);
  }
  return problem;
}
