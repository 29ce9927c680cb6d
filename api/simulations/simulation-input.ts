import type { MechanismAnalysis } from '../chemistry/analyse';
import type { KineticModel, KineticStep } from '../chemistry/kinetics/model';
import type { SimulationInput } from '../chemistry/kinetics/simulation-types';
import type { ConcentrationUnit } from '../chemistry/kinetics/units';
import { AppError } from '../errors';
import type { SimulationInputs } from './simulations.schemas';

const UNITS: ConcentrationUnit[] = ['molecule cm^-3', 'mol L^-1', 'mol m^-2'];
// Photons and third bodies are not integrated: J carries the light, [M] comes from the conditions.
const NOT_INTEGRATED = new Set(['photon', 'third-body']);

export class NotSimulableError extends AppError {
  constructor(message: string, details?: unknown) {
    super(422, 'NOT_SIMULABLE', message, details);
  }
}

function unitOf(analysis: MechanismAnalysis): ConcentrationUnit {
  const unit = UNITS.find((u) => u === analysis.units.conc.trim());
  if (!unit) throw new NotSimulableError(`Concentration unit "${analysis.units.conc}" cannot be simulated; use one of ${UNITS.join(', ')}`);
  return unit;
}

function kineticStep(step: MechanismAnalysis['steps'][number], index: Map<string, number>): KineticStep {
  const terms = (side: typeof step.reactants) =>
    side.filter((term) => index.has(term.key)).map((term) => ({ index: index.get(term.key)!, coef: term.coef }));
  return {
    label: step.id,
    reactants: terms(step.reactants),
    products: terms(step.products),
    thirdBody: step.reactants.some((term) => term.key === 'M'),
    photolysis: step.photolysis,
    forward: step.rate!.forward!,
    reverse: step.reversible ? step.rate!.reverse : null,
    forwardAt: { line: step.rate!.line, column: step.rate!.column },
    stepClass: step.class,
  };
}

/**
 * The kinetics engine's input from an analysed mechanism and the person's run settings: species that
 * are integrated, steps with their rate texts, routes, catalysts and intermediates.
 */
export function buildSimulationInput(analysis: MechanismAnalysis, inputs: SimulationInputs): SimulationInput {
  const withoutRate = analysis.steps.filter((step) => !step.rate?.forward);
  if (withoutRate.length > 0) {
    throw new NotSimulableError(`Give a rate constant after @ for every step; missing at ${withoutRate.map((s) => `${s.id} (line ${s.line})`).join(', ')}`, {
      steps: withoutRate.map((s) => ({ id: s.id, line: s.line })),
    });
  }
  const species = analysis.species.filter((s) => !NOT_INTEGRATED.has(s.kind));
  const index = new Map(species.map((s, i) => [s.key, i]));
  const model: KineticModel = { species: species.map((s) => s.key), steps: analysis.steps.map((step) => kineticStep(step, index)), unit: unitOf(analysis) };
  const fromText = analysis.conditions;
  return {
    model,
    conditions: { T: inputs.conditions.T ?? fromText.T ?? 298.15, P: inputs.conditions.P ?? fromText.P ?? 1, M: inputs.conditions.M ?? fromText.M ?? null },
    initial: inputs.initial,
    fixed: inputs.fixed,
    tEnd: inputs.tEnd,
    output: { kind: inputs.spacing, points: inputs.points },
    light: inputs.light,
    rtol: inputs.rtol,
    atol: inputs.atol,
    routes: analysis.routes.map((route, i) => ({ name: `R${i + 1}`, multipliers: route.multipliers })),
    composition: species.map((s) => (s.opaque ? null : s.elements)),
    catalysts: analysis.species.filter((s) => s.role === 'catalyst').map((s) => ({ species: s.key })),
    intermediates: analysis.intermediates.filter((key) => index.has(key)),
    steadyState: inputs.steadyState,
  };
}
