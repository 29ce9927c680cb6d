import type { RegisteredSpecies } from './species-registry';
import type { StepModel } from './step-model';

/**
 * Keys of the species both formed and consumed somewhere (a reversible step counts both ways),
 * less the terminal ones, read straight from the steps: the cheap first guess at the
 * intermediates for mechanisms too large for route analysis.
 */
export function formedAndConsumedKeys(steps: readonly StepModel[], species: readonly RegisteredSpecies[], terminal: ReadonlySet<string>): string[] {
  // One bit each for formed and consumed, by the species' position in the list (a large text has
  // tens of thousands of species and a quarter of a million terms; sets of keys were slower).
  const FORMED = 1;
  const CONSUMED = 2;
  const seen = new Uint8Array(species.length);
  for (const step of steps) {
    const both = step.reversible ? FORMED | CONSUMED : 0;
    for (const term of step.reactants) seen[term.species.order] |= CONSUMED | both;
    for (const term of step.products) seen[term.species.order] |= FORMED | both;
  }
  return species
    .filter((s) => s.kind !== 'photon' && s.kind !== 'third-body' && !terminal.has(s.key) && seen[s.order] === (FORMED | CONSUMED))
    .map((s) => s.key);
}
