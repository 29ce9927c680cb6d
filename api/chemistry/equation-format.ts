import { flatText } from './flat-text';
import { Fraction } from './fraction';

const ONE = Fraction.ONE;

/** A species and its coefficient, as shown in an equation. */
export interface ShownTerm {
  key: string;
  coef: Fraction;
}

function termText(term: ShownTerm, explicit: boolean): string {
  return explicit || !term.coef.equals(ONE) ? `${term.coef.toString()} ${term.key}` : term.key;
}

/** `2 Br• + O2` (coefficient 1 left out). */
export function sideText(terms: readonly ShownTerm[]): string {
  return terms.map((term) => termText(term, false)).join(' + ');
}

/** The display form of a step or net reaction: `Br• + O3 → BrO• + O2`, `⇌` when reversible. */
export function equationText(reactants: readonly ShownTerm[], products: readonly ShownTerm[], reversible = false): string {
  return flatText(sideText(reactants), reversible ? ' ⇌ ' : ' → ', sideText(products));
}

function sortedSide(terms: readonly ShownTerm[]): string {
  return [...terms]
    .sort((a, b) => (a.key < b.key ? -1 : a.key > b.key ? 1 : 0))
    .map((term) => termText(term, true))
    .join(' + ');
}

/**
 * The canonical equation used to match a step across revisions: species keys sorted on each
 * side, every coefficient explicit, ASCII arrows (`1 Br• + 1 O3 -> 1 BrO• + 1 O2`).
 */
export function normalisedText(reactants: readonly ShownTerm[], products: readonly ShownTerm[], reversible: boolean): string {
  return flatText(sortedSide(reactants), reversible ? ' <=> ' : ' -> ', sortedSide(products));
}
