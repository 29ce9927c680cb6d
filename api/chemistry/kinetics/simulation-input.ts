import { KineticsInputError } from './errors';
import type { KineticModel } from './model';
import type { RouteInput, SimulationInput } from './simulation-types';

function speciesIndex(model: KineticModel, key: string, field: string): number {
  const index = model.species.indexOf(key);
  if (index < 0) throw new KineticsInputError(field, `unknown species "${key}"`);
  return index;
}

function positive(value: number | undefined, field: string): void {
  if (value !== undefined && !(Number.isFinite(value) && value > 0)) {
    throw new KineticsInputError(field, `must be a positive number, got ${value}`);
  }
}

/** Initial concentrations in species order, checked: known species, finite and not negative. */
export function initialVector(model: KineticModel, initial: Record<string, number>): Float64Array {
  const y0 = new Float64Array(model.species.length);
  for (const [key, value] of Object.entries(initial)) {
    const field = `initial.${key}`;
    const index = speciesIndex(model, key, field);
    if (!(Number.isFinite(value) && value >= 0)) throw new KineticsInputError(field, `must be a concentration ≥ 0, got ${value}`);
    y0[index] = value;
  }
  return y0;
}

/** 1 for each species to hold at its initial concentration; an unknown key is an error naming it. */
export function fixedMask(model: KineticModel, fixed: string[] = []): Uint8Array {
  const mask = new Uint8Array(model.species.length);
  fixed.forEach((key, k) => {
    mask[speciesIndex(model, key, `fixed[${k}]`)] = 1;
  });
  return mask;
}

/** σ per step for each route; an unknown label is an error naming it. */
export function routeMatrix(model: KineticModel, routes: RouteInput[] = []): number[][] {
  const labels = new Map(model.steps.map((step, s) => [step.label, s]));
  return routes.map((route, r) => {
    const sigma = new Array<number>(model.steps.length).fill(0);
    for (const [label, value] of Object.entries(route.multipliers)) {
      const s = labels.get(label);
      if (s === undefined) throw new KineticsInputError(`routes[${r}].multipliers.${label}`, 'no step has this label');
      sigma[s] = value;
    }
    return sigma;
  });
}

/** Checks the scalar inputs: temperature, pressure, span and tolerances. */
export function checkScalars(input: SimulationInput): void {
  positive(input.conditions.T, 'conditions.T');
  positive(input.conditions.P, 'conditions.P');
  if (input.conditions.M !== undefined && input.conditions.M !== null) positive(input.conditions.M, 'conditions.M');
  positive(input.rtol, 'rtol');
  positive(input.atol, 'atol');
  positive(input.maxWallMs, 'maxWallMs');
  positive(input.maxSteps, 'maxSteps');
  if (!Number.isFinite(input.tEnd)) throw new KineticsInputError('tEnd', `must be a finite time in s, got ${input.tEnd}`);
  if (input.composition && input.composition.length !== input.model.species.length) {
    throw new KineticsInputError('composition', `give one entry per species (${input.model.species.length})`);
  }
}
