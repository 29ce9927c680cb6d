import type { MathNode } from 'mathjs';
import { locateToken } from './locate';
import { parseRateText, rateMath } from './sandbox';
import { findViolation } from './validate-tree';

/** The values a rate expression may read: T in K, P in atm, M in the mechanism's concentration unit. */
export interface RateScope {
  T: number;
  P: number;
  M: number;
}

/** A rate expression that passed the whitelist, compiled once by mathjs. */
export interface CompiledRate {
  ok: true;
  text: string;
  /** True when the expression reads M itself or calls falloff, so its value already holds [M]. */
  containsThirdBody: boolean;
  evaluate(scope: RateScope): number;
}

/** A refused expression: what is wrong and the 1-based column within the expression text. */
export interface RateExpressionError {
  ok: false;
  error: string;
  column: number;
}

function syntaxError(text: string, error: unknown): RateExpressionError {
  const message = error instanceof Error ? error.message.replace(/\s*\(char \d+\)$/, '') : String(error);
  const char = (error as { char?: number }).char;
  const column = typeof char === 'number' ? Math.min(Math.max(char, 1), text.length + 1) : 1;
  return { ok: false, error: `syntax error: ${message}`, column };
}

function readsThirdBody(tree: MathNode): boolean {
  return tree.filter((node) => {
    if (node.type === 'SymbolNode') return (node as MathNode & { name: string }).name === 'M';
    return node.type === 'FunctionNode' && (node as MathNode & { fn: { name?: string } }).fn.name === 'falloff';
  }).length > 0;
}

/** falloff(k0, kinf, Fc) is evaluated as falloff(k0, kinf, Fc, M) so that it can read [M]. */
function passThirdBodyToFalloff(tree: MathNode): MathNode {
  return tree.transform((node) => {
    if (node.type !== 'FunctionNode') return node;
    const call = node as MathNode & { fn: { name?: string }; args: MathNode[] };
    if (call.fn.name !== 'falloff') return node;
    return new rateMath.FunctionNode('falloff', [...call.args, new rateMath.SymbolNode('M')]);
  });
}

/** Compiled expressions by text, oldest first: mechanisms are simulated again and again. */
const cache = new Map<string, CompiledRate | RateExpressionError>();
const CACHE_SIZE = 5000;

/**
 * Compiles a rate expression (the text after `@`, or one side of `forward | reverse`) in the
 * locked-down mathjs instance, once per distinct text (a bounded cache). Returns either a compiled
 * rate or `{ error, column }`, the column counted from 1 at the start of `text`.
 */
export function compileRateExpression(text: string): CompiledRate | RateExpressionError {
  const known = cache.get(text);
  if (known) return known;
  const compiled = compileUncached(text);
  if (cache.size >= CACHE_SIZE) cache.delete(cache.keys().next().value as string);
  cache.set(text, compiled);
  return compiled;
}

function compileUncached(text: string): CompiledRate | RateExpressionError {
  if (text.trim() === '') return { ok: false, error: 'the rate expression is empty', column: 1 };
  let tree: MathNode;
  try {
    tree = parseRateText(text);
  } catch (error) {
    return syntaxError(text, error);
  }
  const violation = findViolation(tree);
  if (violation) return { ok: false, error: violation.message, column: locateToken(text, violation.token) };
  const compiled = passThirdBodyToFalloff(tree).compile();
  return {
    ok: true,
    text,
    containsThirdBody: readsThirdBody(tree),
    evaluate: (scope) => compiled.evaluate({ ...scope }) as number,
  };
}
