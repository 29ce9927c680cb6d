import type { FormulaPart } from '@grammar/ast';
import { elementBySymbol } from './elements';
import { didYouMean } from './formula-spelling';

/** A problem inside a species, placed by its 0-based offset in the species text. */
export interface FormulaProblem {
  code: 'unknown-element' | 'bad-count' | 'undeclared-name' | 'bad-declaration';
  offset: number;
  found: string;
  message: string;
}

export interface FormulaCounts {
  elements: Map<string, number>;
  problems: FormulaProblem[];
}

const SYMBOL_RUN = /^(?:[A-Z][a-z]?[0-9]*)+$/;
const SYMBOL_WITH_COUNT = /([A-Z][a-z]?)([0-9]*)/g;

/** True when a word reads as element symbols with counts (`CH3O2`), known symbols or not. */
export function looksLikeFormula(word: string): boolean {
  return SYMBOL_RUN.test(word);
}

/**
 * The largest count after a symbol or group: far above any real formula (a protein has a few
 * thousand carbons), and low enough that no atom total, even through nested groups, loses
 * exactness in a double (see MAX_ATOMS).
 */
const MAX_FORMULA_COUNT = 100_000;
/** The most atoms of one element a formula may total (nested group counts multiply). */
const MAX_ATOMS = 1_000_000_000;

/** A count as written: empty means 1; zero, a leading zero or a count above the limit is not a count. */
function readCount(text: string): number | null {
  if (text === '') return 1;
  if (!/^[1-9][0-9]*$/.test(text)) return null;
  const count = Number(text);
  return count <= MAX_FORMULA_COUNT ? count : null;
}

function add(into: Map<string, number>, symbol: string, count: number): void {
  into.set(symbol, (into.get(symbol) ?? 0) + count);
}

function countWord(word: string, offset: number, into: Map<string, number>, problems: FormulaProblem[]): void {
  if (!looksLikeFormula(word)) {
    // Only a word in one case is a likely typo for a formula (`co`, `ch4`); `Sub` or `Enz` is a name.
    const hint = word === word.toLowerCase() || word === word.toUpperCase() ? didYouMean(word) : '';
    const message = `${word} is neither a formula nor a declared name${hint ? ` (${hint})` : ''}; declare it with "%species ${word} = FORMULA" (or "%species ${word}" for an opaque name)`;
    problems.push({ code: 'undeclared-name', offset, found: word, message });
    return;
  }
  for (const match of word.matchAll(SYMBOL_WITH_COUNT)) {
    const [, symbol, countText] = match;
    const at = offset + (match.index ?? 0);
    const count = readCount(countText);
    if (!elementBySymbol(symbol)) {
      const hint = didYouMean(word);
      const message = `${symbol === word ? symbol : `${symbol} in ${word}`} is not an element symbol (symbols are case-sensitive${hint ? `; ${hint}` : ''}); a named species must be declared: "%species ${word} = FORMULA"`;
      problems.push({ code: 'unknown-element', offset: at, found: symbol, message });
    } else if (count === null) {
      problems.push({ code: 'bad-count', offset: at + symbol.length, found: countText, message: `count ${countText} after ${symbol} must be a whole number from 1 to ${MAX_FORMULA_COUNT} (no leading zero)` });
    } else add(into, symbol, count);
  }
}

/** Element counts of a written formula with nested groups, or the problems found in it. */
export function countElements(parts: readonly FormulaPart[]): FormulaCounts {
  const problems: FormulaProblem[] = [];
  const elements = countInto(parts, problems);
  for (const [symbol, count] of elements) {
    if (count <= MAX_ATOMS) continue;
    const message = `the formula counts ${count.toExponential(2)} atoms of ${symbol}; the most a formula may hold is ${MAX_ATOMS.toExponential(0)}`;
    problems.push({ code: 'bad-count', offset: 0, found: symbol, message });
  }
  return { elements, problems };
}

function countInto(parts: readonly FormulaPart[], problems: FormulaProblem[]): Map<string, number> {
  const elements = new Map<string, number>();
  for (const part of parts) {
    if (part.kind === 'word') {
      countWord(part.text, part.offset, elements, problems);
      continue;
    }
    const inner = countInto(part.parts, problems);
    const multiplier = part.count ? readCount(part.count.text) : 1;
    if (multiplier === null) {
      const message = `a group count must be a whole number from 1 to ${MAX_FORMULA_COUNT}, not ${part.count?.text}`;
      problems.push({ code: 'bad-count', offset: part.count?.offset ?? part.offset, found: part.count?.text ?? '', message });
      continue;
    }
    for (const [symbol, count] of inner) add(elements, symbol, count * multiplier);
  }
  return elements;
}
