import { elementBySymbol } from './elements';

/** Atomic number, count, atomic number, count… of a composition (0 stands for a symbol the periodic table lacks). */
export type CompositionList = Int32Array | readonly number[];

/**
 * A composition as a flat list of (atomic number, count) pairs: balancing a step is then array
 * arithmetic instead of walking each composition's keys (every species has its own object shape).
 */
export function compositionList(elements: Record<string, number>): CompositionList {
  const pairs: number[] = [];
  for (const symbol of Object.keys(elements)) pairs.push(elementBySymbol(symbol)?.z ?? 0, elements[symbol]);
  // Counts outside 32-bit integers (never in chemistry, but the type allows them) keep plain numbers.
  return pairs.every((value) => Number.isInteger(value) && Math.abs(value) < 2 ** 31) ? Int32Array.from(pairs) : pairs;
}
