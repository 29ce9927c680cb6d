import type { RegisteredSpecies } from './species-registry';
import type { StepModel } from './step-model';

/**
 * Keys of the species both formed and consumed somewhere (a reversible step counts both ways),
 * less the terminal ones, read straight from the steps: the cheap first guess at the
 * intermediates for mechanisms too large for route analysis.
 */
export function formedAndConsumedKeys(steps: readonly StepModel[], species: readonly RegisteredSpecies[], terminal: ReadonlySet<string>): string[] {
  const formed = new Set<string>();
  const consumed = new Set<string>();
  for (const step of steps) {
    for (const term of step.reactants) consumed.add(term.species.key);
    for (const term of step.products) formed.add(term.species.key);
    if (!step.reversible) continue;
    for (const term of step.reactants) formed.add(term.species.key);
    for (const term of step.products) consumed.add(term.species.key);
  }
  return species
    .filter((s) => s.kind !== 'photon' && s.kind !== 'third-body' && !terminal.has(s.key) && formed.has(s.key) && consumed.has(s.key))
    .map((s) => s.key);
}
