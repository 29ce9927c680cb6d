import { all, create, type MathNode } from 'mathjs/number';
import { falloffRate } from './falloff';

/**
 * The one mathjs instance rate expressions go through. It is mathjs' number-only build (no complex
 * numbers, units or matrices, which rates never need; it loads in about half the time of the full
 * library, and the checker loads it in every process) with `predictable` on (so `sqrt(-1)` and
 * `log(-1)` give NaN), knows our `falloff` function, and has the functions that could reach
 * outside an expression replaced by throwing ones, as the mathjs security guide advises. The parse
 * function is kept privately before it is disabled inside the instance; every parsed tree is also
 * whitelisted (see validate-tree.ts).
 */
const math = create(all, { predictable: true });

math.import({ falloff: falloffRate }, { override: false });

const parseExpression: (text: string) => MathNode = math.parse;

function disabled(name: string): () => never {
  return () => {
    throw new Error(`function ${name} is disabled in rate expressions`);
  };
}

const lockedNames = ['import', 'createUnit', 'evaluate', 'parse', 'simplify', 'derivative', 'resolve'];
math.import(Object.fromEntries(lockedNames.map((name) => [name, disabled(name)])), { override: true });

/** Parses one rate expression with the locked-down instance (throws mathjs' SyntaxError with `char`). */
export function parseRateText(text: string): MathNode {
  return parseExpression(text);
}

export { math as rateMath };
