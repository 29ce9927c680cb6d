import type { CompiledRate, RateScope } from './compile-rate';

/** What a compiled rate gives at some conditions: a usable value, or why not. */
export type RateValue =
  | { kind: 'value'; value: number }
  | { kind: 'threw'; reason: string }
  | { kind: 'not-finite'; value: unknown }
  | { kind: 'negative'; value: number };

/**
 * Evaluates a compiled rate and sorts out the values no rate constant may have: a function that
 * refuses its arguments (falloff with Fc > 1), a value that is not a finite number, a negative one.
 * The checker and the simulator word the outcome each in their own place.
 */
export function evaluateRate(compiled: CompiledRate, scope: RateScope): RateValue {
  let value: unknown;
  try {
    value = compiled.evaluate(scope);
  } catch (error) {
    return { kind: 'threw', reason: error instanceof Error ? error.message : String(error) };
  }
  if (typeof value !== 'number' || !Number.isFinite(value)) return { kind: 'not-finite', value };
  return value < 0 ? { kind: 'negative', value } : { kind: 'value', value };
}
