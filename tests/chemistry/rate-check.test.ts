import { describe, expect, it } from 'vitest';
import { analyseMechanism } from '@api/chemistry/analyse';
import { MAX_RATE_CHECK_STEPS } from '@api/chemistry/rate-check';
import { generateMechanism } from '../../examples/generate-large';

function rateFindings(text: string) {
  return analyseMechanism(text).diagnostics.filter((item) => item.code.startsWith('rate'));
}

describe('rates after @ are checked with the steps', () => {
  it('accepts the expressions the simulator evaluates, falloff included, and says nothing', () => {
    const text = [
      'B1: Br• + O3 -> BrO• + O2  @ 1.7e-11 * exp(-800 / T)',
      'B2: BrO• + hν -> Br• + O(3P)  @ 0.035',
      'B3: O(3P) + O2 + M -> O3 + M  @ 6.0e-34 * (T / 300)^-2.4',
      'B4: Br• + NO2• + M -> BrNO2 + M  @ falloff(4.2e-31 * (T / 300)^-2.4, 2.7e-11, 0.55)',
      'B5: Br2 <=> 2 Br•  @ 1.0e-20 | 3.0e-13 * sqrt(T)',
    ].join('\n');
    expect(rateFindings(text)).toEqual([]);
  });

  it('places a syntax error in the forward rate at the column where it goes wrong', () => {
    const [finding] = rateFindings('B1: Br• + O3 -> BrO• + O2 @ 1.7e-11 * exp(-800 / T))');
    // "B1: Br• + O3 -> BrO• + O2 @ " is 28 characters, so the rate starts in column 29.
    expect(finding).toMatchObject({ code: 'rate-expression', severity: 'error', line: 1 });
    expect(finding.column).toBeGreaterThan(29);
    expect(finding.message).toContain('forward rate of step B1');
  });

  it('places an error in the reverse rate after the bar', () => {
    const line = 'E1: Br2 <=> 2 Br• @ 1.0e-20 | 3.0e-13 * cosh(T)';
    const [finding] = rateFindings(line);
    expect(finding).toMatchObject({ code: 'rate-expression', line: 1, column: line.indexOf('cosh') + 1 });
    expect(finding.message).toMatch(/reverse rate of step E1 .*"cosh" is not allowed/);
  });

  it('refuses names other than T, P and M, and an empty forward rate', () => {
    const unknownName = rateFindings('O3 + hν -> O2 + O(3P) @ Jmax * 0.5');
    expect(unknownName.map((item) => item.code)).toEqual(['rate-expression']);
    const empty = rateFindings('R2: O3 -> O2 + O(3P) @ | 1');
    expect(empty.map((item) => item.code).sort()).toEqual(['rate-count', 'rate-expression']);
  });

  it('evaluates each rate at the mechanism\'s conditions: infinite, not a number, negative or refused by falloff', () => {
    const text = [
      'A: O3 + hν -> O2 + O(3P) @ -1e-10',
      'B: O(3P) + O3 -> 2 O2 @ 1/0',
      'C: O(3P) + O2 + M -> O3 + M @ log(0)',
      'D: O2 + hν -> 2 O(3P) @ 1e400',
      'E: Cl• + NO2• + M -> ClNO2 + M @ falloff(1.8e-31, 1.0e-11, 2)',
    ].join('\n');
    const findings = rateFindings(text);
    expect(findings.map((item) => [item.code, item.line, item.column])).toEqual([
      ['rate-negative', 1, 28],
      ['rate-not-finite', 2, 25],
      ['rate-not-finite', 3, 31],
      ['rate-not-finite', 4, 25],
      ['rate-expression', 5, 34],
    ]);
    expect(findings[0].message).toContain('negative at T = 298.15 K, P = 1 atm');
    expect(findings[4].message).toContain('Fc must be above 0 and at most 1');
  });

  it('uses %conditions when it evaluates: a rate negative only below 250 K is an error at 200 K', () => {
    const step = 'O(3P) + O3 -> 2 O2 @ 8e-12 * (T - 250) / 100';
    expect(rateFindings(`%conditions T = 300 K\n${step}`)).toEqual([]);
    expect(rateFindings(`%conditions T = 200 K\n${step}`)).toMatchObject([{ code: 'rate-negative', severity: 'error', line: 2 }]);
  });

  it('says a rate that reads [M] on a surface cannot be checked without M in %conditions, and checks it with M', () => {
    const surface = '%units conc = mol m^-2\nO* + CO* + M -> CO2 + 2 * + M @ -M - 1';
    expect(rateFindings(surface)).toEqual([]);
    expect(analyseMechanism(surface).diagnostics.filter((item) => item.code === 'third-body-unknown')).toMatchObject([{ severity: 'warning', line: 2 }]);
    expect(rateFindings(`%conditions M = 1e-5\n${surface}`)).toMatchObject([{ code: 'rate-negative', line: 3 }]);
  });

  it('warns when a reversible step gives one rate and a one-way step two', () => {
    const oneRate = rateFindings('N2O4 <=> 2 NO2• @ 1.0e5');
    expect(oneRate).toMatchObject([{ code: 'rate-count', severity: 'warning', line: 1 }]);
    expect(oneRate[0].message).toContain('reversible but gives one rate');
    const twoRates = rateFindings('NO• + O3 -> NO2• + O2 @ 1.8e-14 | 1.0e-30');
    expect(twoRates).toMatchObject([{ code: 'rate-count', severity: 'warning' }]);
    expect(twoRates[0].message).toContain('reverse rate 1.0e-30 is never used');
  });

  it('leaves the expressions of a very large mechanism to the simulator and says so once', () => {
    const text = `${generateMechanism(MAX_RATE_CHECK_STEPS + 1)}X1: O3 -> O2 + O(3P) @ exp(\n`;
    const findings = rateFindings(text);
    expect(findings.map((item) => item.code)).toEqual(['rates-unchecked']);
  });

  it('never throws when the value handed in is not text (the rate pass reads the text itself)', () => {
    for (const value of [42, null, undefined, { text: 'O3 -> O2 + O(3P) @ 1' }]) {
      const analysis = analyseMechanism(value as unknown as string);
      expect(analysis.diagnostics.map((item) => item.code)).toContain('input-too-large');
    }
  });
});
