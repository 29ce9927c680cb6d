import { ELEMENT_ROWS } from './elements-table';

/** One chemical element. */
export interface ElementInfo {
  symbol: string;
  /** Atomic number. */
  z: number;
  name: string;
  /** Atomic weight (g/mol): IUPAC standard or conventional value, else a mass number (see below). */
  weight: number;
  /** True when `weight` is the mass number of the longest-lived isotope (no standard atomic weight). */
  massNumberOnly?: boolean;
}

/** All 118 elements in order of atomic number. */
export const ELEMENTS: readonly ElementInfo[] = Object.freeze(
  ELEMENT_ROWS.map(([symbol, name, weight, mark], index) =>
    Object.freeze({
      symbol,
      z: index + 1,
      name,
      weight,
      ...(mark === 'M' ? { massNumberOnly: true } : {}),
    }),
  ),
);

const BY_SYMBOL: ReadonlyMap<string, ElementInfo> = new Map(ELEMENTS.map((e) => [e.symbol, e]));

/**
 * Finds an element by its symbol. Symbols are case-sensitive (`Co` is cobalt, `CO` is not a symbol).
 */
export function elementBySymbol(symbol: string): ElementInfo | undefined {
  return BY_SYMBOL.get(symbol);
}

/**
 * Molar mass in g/mol of a composition given as counts per element symbol.
 * @throws Error naming the symbol when a symbol is unknown or a count is not a finite number ≥ 0.
 */
export function molarMass(elements: Record<string, number>): number {
  let total = 0;
  for (const [symbol, count] of Object.entries(elements)) {
    const element = BY_SYMBOL.get(symbol);
    if (!element) throw new Error(`molarMass: unknown element symbol "${symbol}"`);
    if (!Number.isFinite(count) || count < 0) {
      throw new Error(`molarMass: count of ${symbol} must be a finite number ≥ 0, got ${count}`);
    }
    total += element.weight * count;
  }
  return total;
}
