import type { StepJson } from './analysis-types';
import type { RegisteredSpecies } from './species-registry';
import { netOf, type StepModel } from './step-model';

/** Steps that pass a radical on: the count stays (propagation) or rises from a radical (branching). */
const CARRYING_CLASSES: ReadonlySet<StepJson['class']> = new Set(['propagation', 'branching']);

/**
 * The chain carriers (common practice): radicals that one chain-carrying step consumes and another
 * (or the same one, read backwards) forms again, so that the chain goes on. In H2 + Br2 those are
 * Br• and H•; in a catalytic cycle Cl• + O3 → ClO• + O2, ClO• + O → Cl• + O2, they are Cl• and ClO•.
 * A step is read by its net change: a radical on both sides in the same amount (NO2• in
 * NO3• + NO2• → NO• + NO2• + O2) is a spectator there, neither consumed nor formed.
 * Listed in the species' order of first appearance.
 */
export function chainCarriers(steps: readonly StepModel[], stepJson: readonly StepJson[], species: readonly RegisteredSpecies[]): string[] {
  const radicals = new Set(species.filter((item) => item.radical).map((item) => item.key));
  const consumed = new Set<string>();
  const formed = new Set<string>();
  for (const step of steps) {
    if (!CARRYING_CLASSES.has(stepJson[step.index].class)) continue;
    for (const [key, change] of netOf(step)) {
      if (!radicals.has(key)) continue;
      const sign = change.sign();
      if (sign < 0 || step.reversible) consumed.add(key);
      if (sign > 0 || step.reversible) formed.add(key);
    }
  }
  return species.filter((item) => consumed.has(item.key) && formed.has(item.key)).map((item) => item.key);
}
