import type { StepJson } from './analysis-types';
import type { RegisteredSpecies } from './species-registry';
import type { StepModel, StepTerm } from './step-model';

/** Steps that pass a radical on: the count stays (propagation) or rises from a radical (branching). */
const CARRYING_CLASSES: ReadonlySet<StepJson['class']> = new Set(['propagation', 'branching']);

function mark(terms: readonly StepTerm[], into: Set<string>): void {
  for (const term of terms) if (term.species.radical) into.add(term.key);
}

/**
 * The chain carriers (common practice): radicals that one chain-carrying step consumes and another
 * (or the same one, read backwards) forms again, so that the chain goes on. In H2 + Br2 those are
 * Br• and H•; in a catalytic cycle Cl• + O3 → ClO• + O2, ClO• + O → Cl• + O2, they are Cl• and ClO•.
 * Listed in the species' order of first appearance.
 */
export function chainCarriers(steps: readonly StepModel[], stepJson: readonly StepJson[], species: readonly RegisteredSpecies[]): string[] {
  const consumed = new Set<string>();
  const formed = new Set<string>();
  for (const step of steps) {
    if (!CARRYING_CLASSES.has(stepJson[step.index].class)) continue;
    mark(step.reactants, consumed);
    mark(step.products, formed);
    if (step.reversible) {
      mark(step.products, consumed);
      mark(step.reactants, formed);
    }
  }
  return species.filter((item) => consumed.has(item.key) && formed.has(item.key)).map((item) => item.key);
}
