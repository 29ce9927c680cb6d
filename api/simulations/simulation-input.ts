import type { MechanismAnalysis } from '../chemistry/analyse';
import { kineticsFromAnalysis } from '../chemistry/kinetics/from-analysis';
import type { SimulationInput } from '../chemistry/kinetics/simulation-types';
import { AppError } from '../errors';
import type { SimulationInputs } from './simulations.schemas';

export class NotSimulableError extends AppError {
  constructor(message: string, details?: unknown) {
    super(422, 'NOT_SIMULABLE', message, details);
  }
}

/**
 * The kinetics engine's input from an analysed mechanism and the person's run settings; a mechanism
 * that cannot be simulated (a step without a rate, an unsupported unit) is refused with where and why.
 */
export function buildSimulationInput(analysis: MechanismAnalysis, inputs: SimulationInputs, sourceText?: string): SimulationInput {
  const setup = kineticsFromAnalysis(analysis, sourceText);
  if (!setup.model) {
    const errors = setup.diagnostics.filter((d) => d.severity === 'error');
    const where = errors.map((d) => (d.label ? `${d.label} (line ${d.line})` : d.message)).join(', ');
    throw new NotSimulableError(`This mechanism cannot be simulated yet: ${where}`, { diagnostics: errors });
  }
  return {
    model: setup.model,
    conditions: {
      T: inputs.conditions.T ?? setup.conditions.T,
      P: inputs.conditions.P ?? setup.conditions.P,
      M: inputs.conditions.M ?? setup.conditions.M,
    },
    initial: inputs.initial,
    fixed: inputs.fixed,
    tEnd: inputs.tEnd,
    output: { kind: inputs.spacing, points: inputs.points },
    light: inputs.light,
    rtol: inputs.rtol,
    atol: inputs.atol,
    routes: setup.routes,
    composition: setup.composition,
    catalysts: setup.catalysts.map((species) => ({ species })),
    intermediates: setup.intermediates.filter((key) => setup.model!.species.includes(key)),
    steadyState: inputs.steadyState,
  };
}
