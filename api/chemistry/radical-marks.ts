import type { Diagnostic } from '@grammar/diagnostics';
import { finding } from './diagnostic-codes';
import { speciesKey } from './species-model';
import { counted } from './wording';
import type { RegisteredSpecies } from './species-registry';

/**
 * Radical bookkeeping per species, reported once at its first appearance: an odd electron
 * count without a mark (often deliberate: NO, NO2, ClO), or a mark on an even-electron species
 * without a state tag to say which state is meant.
 */
export function reportRadicalMarks(species: readonly RegisteredSpecies[], diagnostics: Diagnostic[]): void {
  for (const item of species) {
    if (item.kind !== 'species' || item.electrons === null) continue;
    const position = { line: item.firstLine, column: item.firstColumn };
    const odd = item.electrons % 2 === 1;
    if (odd && item.radicalMarks === 0) {
      const marked = speciesKey(item.name ?? item.formula, [], 1, item.charge, item.sites);
      const message = `${item.key} has ${counted(item.electrons, 'electron')}; mark it as a radical (${marked}) or ignore`;
      diagnostics.push(finding('odd-electrons-unmarked', position, message, { found: item.key, expected: [marked] }));
    } else if (!odd && item.radicalMarks > 0 && !item.stateTagged) {
      const message = `${item.key} has ${item.electrons} electrons (even); give the state a tag, e.g. ${item.formula}(3P), or drop the mark`;
      diagnostics.push(finding('even-electrons-marked', position, message, { found: item.key }));
    }
  }
}
