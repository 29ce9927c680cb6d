import { Fraction } from './fraction';
import { ScratchList } from '@grammar/scratch-list';

const ONE = Fraction.ONE;

/**
 * A species and its coefficient, as shown in an equation; or a term whose texts were made ahead
 * by `termText` (coefficient 1 left out, and every coefficient), as the steps' terms are.
 */
export type ShownTerm = { key: string; coef: Fraction } | { key: string; readonly shown: string; readonly explicit: string };

/** `2 Br•`, or `Br•` for coefficient 1 unless `explicit` (`1 Br•`). */
export function termText(key: string, coef: Fraction, explicit: boolean): string {
  return explicit || !coef.equals(ONE) ? `${coef.toString()} ${key}` : key;
}

// The pieces of the equation being written, joined once into a flat string (see flat-text.ts): an
// equation is written for every step of a large text, so pieces are not first joined per term or
// per side. Equations are written synchronously, one at a time.
const pieces = new ScratchList<string>();

function addTerm(term: ShownTerm, explicit: boolean): void {
  if ('shown' in term) pieces.push(explicit ? term.explicit : term.shown);
  else pieces.push(termText(term.key, term.coef, explicit));
}

function addSide(terms: readonly ShownTerm[], explicit: boolean, count = terms.length): void {
  for (let index = 0; index < count; index += 1) {
    if (index > 0) pieces.push(' + ');
    addTerm(terms[index], explicit);
  }
}

function written(): string {
  const text = pieces.copy().join('');
  pieces.clear();
  return text;
}

/** The display form of a step or net reaction: `Br• + O3 → BrO• + O2`, `⇌` when reversible. */
export function equationText(reactants: readonly ShownTerm[], products: readonly ShownTerm[], reversible = false): string {
  addSide(reactants, false);
  pieces.push(reversible ? ' ⇌ ' : ' → ');
  addSide(products, false);
  return written();
}

// A side has a handful of terms: an insertion sort into a reused list spares the copy and the
// work arrays of `Array.prototype.sort` on every step.
const sorted: ShownTerm[] = [];

function addSortedSide(terms: readonly ShownTerm[]): void {
  for (let count = 0; count < terms.length; count += 1) {
    const term = terms[count];
    let index = count;
    while (index > 0 && sorted[index - 1].key > term.key) {
      sorted[index] = sorted[index - 1];
      index -= 1;
    }
    sorted[index] = term;
  }
  addSide(sorted, true, terms.length);
}

/**
 * The canonical equation used to match a step across revisions: species keys sorted on each
 * side, every coefficient explicit, ASCII arrows (`1 Br• + 1 O3 -> 1 BrO• + 1 O2`).
 */
export function normalisedText(reactants: readonly ShownTerm[], products: readonly ShownTerm[], reversible: boolean): string {
  addSortedSide(reactants);
  pieces.push(reversible ? ' <=> ' : ' -> ');
  addSortedSide(products);
  return written();
}
