import type { Diagnostic } from '@grammar/diagnostics';
import { finding } from './diagnostic-codes';
import { speciesKey } from './species-model';
import { counted } from './wording';
import type { RegisteredSpecies } from './species-registry';

/** The key with one radical mark, where the notation puts it: after the state tags, before charge and sites (`IO(aq)•`). */
function markedKey(item: RegisteredSpecies): string {
  if (item.name) return speciesKey(item.name, [], 1, item.charge, item.sites);
  const chargeAndSites = speciesKey('', [], 0, item.charge, item.sites);
  return `${item.key.slice(0, item.key.length - chargeAndSites.length)}•${chargeAndSites}`;
}

/** A state tag that would name the state: a term symbol for an atom (3P), its own for a molecule. */
function tagHint(item: RegisteredSpecies): string {
  const symbols = Object.entries(item.elements);
  const atom = symbols.length === 1 && symbols[0][1] === 1;
  const tagged = (tag: string) => speciesKey(item.name ?? item.formula, [tag], item.radicalMarks, item.charge, item.sites);
  if (atom) return `e.g. ${tagged('(3P)')}`;
  return `with its term symbol, as in O2(a1Δg) or ${tagged('(3B1)')}`;
}

/** The state tag that names a triplet (a term symbol of multiplicity 3: (3P), (3Σg-), (3B1)), if any. */
function tripletTag(item: RegisteredSpecies): string | null {
  const match = /\(3[A-Z\u0391-\u03A9][^()]*\)/.exec(item.key);
  return match ? match[0] : null;
}

/**
 * Radical bookkeeping per species, reported once at its first appearance: an odd electron
 * count without a mark (often deliberate: NO, NO2, ClO), or a mark on an even-electron species
 * without a state tag to say which state is meant, or an even number of marks on an odd-electron
 * species (OH••: an odd count has 1, 3… unpaired electrons); and, as a note, a triplet state
 * written without marks (O(3P)), which the notation counts as a radical only when marked.
 */
export function reportRadicalMarks(species: readonly RegisteredSpecies[], diagnostics: Diagnostic[]): void {
  for (const item of species) {
    if (item.kind !== 'species' || item.electrons === null) continue;
    const position = { line: item.firstLine, column: item.firstColumn };
    const odd = item.electrons % 2 === 1;
    const triplet = !odd && item.radicalMarks === 0 ? tripletTag(item) : null;
    if (odd && item.radicalMarks === 0) {
      const marked = markedKey(item);
      const message = `${item.key} has ${counted(item.electrons, 'electron')}; mark it as a radical (${marked}) or ignore`;
      diagnostics.push(finding('odd-electrons-unmarked', position, message, { found: item.key, expected: [marked] }));
    } else if (odd && item.radicalMarks % 2 === 0) {
      // The key holds its marks in one run (formula, tags, marks, charge, sites).
      const marked = item.key.replace(/•+/, '•');
      const message = `${item.key} shows ${item.radicalMarks} unpaired electrons, but ${counted(item.electrons, 'electron')} leave an odd number unpaired; write ${marked}`;
      diagnostics.push(finding('radical-marks-parity', position, message, { found: item.key, expected: [marked] }));
    } else if (triplet) {
      const marked = item.key.replace(triplet, `${triplet}••`);
      const message = `${item.key} is tagged as a triplet but has no radical mark, so step classes and chain carriers do not count it as a radical; write ${marked} to count its two unpaired electrons`;
      diagnostics.push(finding('triplet-unmarked', position, message, { found: item.key, expected: [marked] }));
    } else if (!odd && item.radicalMarks > 0 && !item.stateTagged) {
      const marks = item.radicalMarks === 1 ? 'mark' : 'marks';
      const message = `${item.key} has ${item.electrons} electrons (even); to count it as a radical give the state a tag and keep the ${marks} (${tagHint(item)}), or drop the ${marks}`;
      diagnostics.push(finding('even-electrons-marked', position, message, { found: item.key }));
    }
  }
}
