import type { RegisteredSpecies } from './species-registry';

/**
 * Keys of the species both formed and consumed somewhere (a reversible step counts both ways),
 * less the terminal ones: the cheap first guess at the intermediates for mechanisms too large for
 * route analysis. The steps marked their species as they were built (step-model.ts), so this
 * needs no second pass over a quarter of a million terms.
 */
export function formedAndConsumedKeys(species: readonly RegisteredSpecies[], terminal: ReadonlySet<string>): string[] {
  return species
    .filter((s) => s.kind !== 'photon' && s.kind !== 'third-body' && !terminal.has(s.key) && s.formed && s.consumed)
    .map((s) => s.key);
}
