import type { StepJson } from './analysis-types';
import type { RegisteredSpecies } from './species-registry';
import type { StepModel, StepTerm } from './step-model';

/** Steps that pass a radical on: the count stays (propagation) or rises from a radical (branching). */
const CARRYING_CLASSES: ReadonlySet<StepJson['class']> = new Set(['propagation', 'branching']);

/** Sign of the net change of a reactant's species over its step (exact): −1 unless it is also a product. */
function reactantNetSign(term: StepTerm, products: readonly StepTerm[]): number {
  const across = products.find((item) => item.key === term.key);
  return across ? across.fraction.sub(term.fraction).sign() : -1;
}

/**
 * The chain carriers (common practice): radicals that one chain-carrying step consumes and another
 * (or the same one, read backwards) forms again, so that the chain goes on. In H2 + Br2 those are
 * Br• and H•; in a catalytic cycle Cl• + O3 → ClO• + O2, ClO• + O → Cl• + O2, they are Cl• and ClO•.
 * A step is read by its net change: a radical on both sides in the same amount (NO2• in
 * NO3• + NO2• → NO• + NO2• + O2) is a spectator there, neither consumed nor formed.
 * Listed in the species' order of first appearance.
 */
export function chainCarriers(steps: readonly StepModel[], stepJson: readonly StepJson[], species: readonly RegisteredSpecies[]): string[] {
  const consumed = new Set<string>();
  const formed = new Set<string>();
  const note = (term: StepTerm, sign: number, reversible: boolean) => {
    if (sign === 0 || !term.species.radical) return;
    if (sign < 0 || reversible) consumed.add(term.key);
    if (sign > 0 || reversible) formed.add(term.key);
  };
  for (const step of steps) {
    if (!CARRYING_CLASSES.has(stepJson[step.index].class)) continue;
    // Steps hold each species once per side (A + A is 2 A), so each term is its species' whole amount there.
    for (const term of step.reactants) note(term, reactantNetSign(term, step.products), step.reversible);
    for (const term of step.products) if (!step.reactants.some((item) => item.key === term.key)) note(term, 1, step.reversible);
  }
  return species.filter((item) => consumed.has(item.key) && formed.has(item.key)).map((item) => item.key);
}
