import { describe, expect, it } from 'vitest';
import { compileRateExpression } from '@api/chemistry/kinetics/expressions/compile-rate';

const scope = { T: 298, P: 1, M: 2.4627315018045133e19 };

function refused(text: string) {
  const compiled = compileRateExpression(text);
  if (compiled.ok) throw new Error(`"${text}" was accepted`);
  return compiled;
}

describe('the locked-down rate expression language', () => {
  it.each([
    ['k = 1e-11', /assignment/, 3],
    ['f(x) = x * T', /defining a function/, 6],
    ['T * 2 + unknownThing', /unknown symbol "unknownThing"/, 9],
    ['import("fs")', /function "import" is not allowed/, 1],
    ['evaluate("1+1")', /function "evaluate" is not allowed/, 1],
    ['createUnit("foo")', /function "createUnit" is not allowed/, 1],
    ['[1, 2][1]', /matrices|index/, 1],
    ['T[1]', /index access/, 2],
    ['T.constructor', /property or index access/, 2],
    ['2 * "text"', /strings are not allowed/, 5],
    ['{a: 1}', /objects are not allowed/, 1],
    ['T > 300 ? 1 : 2', /conditional expressions are not allowed/, 9],
    ['1:10', /ranges/, 2],
    ['T; P', /single expression/, 2],
    ['3 % 2', /operator "%"/, 3],
    ['T!', /operator "!"/, 2],
    ['sin(T)', /function "sin" is not allowed/, 1],
    ['2 * pi', /unknown symbol "pi"/, 5],
    ['exp(1, 2)', /exp takes 1 argument/, 1],
    ['falloff(1e-30, 1e-11)', /falloff takes 3 argument/, 1],
    ['1e-11 * exp(-200 / T', /syntax error/, 21],
    ['', /empty/, 1],
  ])('refuses %j with a message and the column', (text, message, column) => {
    const error = refused(text);
    expect(error.error).toMatch(message);
    expect(error.column).toBe(column);
  });

  it('accepts numbers, T, P, M, arithmetic, exp, log, log10, sqrt, ^ and falloff', () => {
    const compiled = compileRateExpression('-(2e-12 * sqrt(T) + log(P + 1) - log10(100)) ^ 1 * exp(-M / M)');
    expect(compiled.ok).toBe(true);
    if (!compiled.ok) return;
    const expected = -(2e-12 * Math.sqrt(298) + Math.log(2) - 2) * Math.exp(-1);
    expect(compiled.evaluate(scope)).toBeCloseTo(expected, 14);
  });

  it('says whether the value already holds [M] (reads M or calls falloff)', () => {
    const flags = ['6e-34 * (T/300)^-2.4', '1e-12 * M', 'falloff(1e-30, 1e-11, 0.6)'].map((text) => {
      const compiled = compileRateExpression(text);
      return compiled.ok && compiled.containsThirdBody;
    });
    expect(flags).toEqual([false, true, true]);
  });

  it('gives NaN rather than a complex number for sqrt of a negative number', () => {
    const compiled = compileRateExpression('sqrt(-T)');
    expect(compiled.ok && Number.isNaN(compiled.evaluate(scope))).toBe(true);
  });
});
