import { analyseMechanism } from '../chemistry/analyse';
import { simulate } from '../chemistry/kinetics/simulate';
import type { SimulationHooks, SimulationResult } from '../chemistry/kinetics/simulation-types';
import { buildSimulationInput } from './simulation-input';
import type { SimulationInputs } from './simulations.schemas';

/** Analyses the text and runs the kinetics engine: the whole job of one simulation thread. */
export function runSimulation(text: string, inputs: SimulationInputs, hooks: SimulationHooks): SimulationResult {
  const analysis = analyseMechanism(text);
  return simulate(buildSimulationInput(analysis, inputs, text), hooks);
}
