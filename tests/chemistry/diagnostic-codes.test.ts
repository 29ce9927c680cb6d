import { describe, expect, it } from 'vitest';
import { analyseMechanism, MAX_ROUTE_ANALYSIS_STEPS } from '@api/chemistry/analyse';
import { DIAGNOSTIC_CODES, type DiagnosticCode } from '@api/chemistry/diagnostic-codes';
import { MAX_RATE_CHECK_STEPS } from '@api/chemistry/rate-check';
import { generateMechanism } from '../../examples/generate-large';

/**
 * Thirty steps with three parallel ways from each stage to the next: 3^10 direct routes. The
 * stages are opaque names, so the steps balance (a step that does not is left out of the routes).
 */
function explodingMechanism(): string {
  const lines: string[] = [];
  for (let i = 1; i <= 11; i += 1) lines.push(`%species Stage${i}`);
  for (let j = 1; j <= 3; j += 1) lines.push(`%species Side${j}`);
  for (let i = 1; i <= 10; i += 1) for (let j = 1; j <= 3; j += 1) lines.push(`Stage${i} -> Stage${i + 1} + Side${j}`);
  return lines.join('\n');
}

// One text per code, each the smallest mechanism that shows the problem; the line and column
// say where the diagnostic must point.
const TRIGGERS: Record<DiagnosticCode, { text: string | (() => string); line: number; column?: number }> = {
  'syntax-error': { text: 'A + -> B', line: 1, column: 5 },
  'unbalanced-brackets': { text: '(CH3 + OH• -> CH3OH', line: 1, column: 1 },
  'unknown-directive': { text: '%colour blue', line: 1, column: 1 },
  'input-too-large': { text: () => 'O3 -> O2 + O(3P)\n'.repeat(500_000), line: 1, column: 1 },
  'line-too-long': { text: () => `O3 -> O2 + O(3P) @ ${'1+'.repeat(1_500)}1`, line: 1 },
  'bad-directive': { text: '%conditions T = hot', line: 1, column: 17 },
  'directive-repeated': { text: '%conditions T = 298 K\n%conditions T = 250 K', line: 2, column: 17 },
  'unknown-element': { text: 'O3 + Xx -> XxO + O2', line: 1, column: 6 },
  'bad-count': { text: 'C0H4 + O3 -> CO2 + H2O', line: 1, column: 2 },
  'undeclared-name': { text: 'Enz + O2 -> EnzO2', line: 1, column: 1 },
  'bad-declaration': { text: '%species CO = CO', line: 1, column: 10 },
  'declared-after-use': { text: 'P1: RO2 + NO• -> RO + NO2•\n%species RO2 = C2H5O2•\n%species RO = C2H5O•', line: 1, column: 5 },
  'opaque-species': { text: '%species Enz\nEnz + O2 -> Enz + O2', line: 2, column: 1 },
  'intermediate-one-sided': { text: '%intermediates O(1D), O3\nO3 + hν -> O2 + O(1D)\nO(1D) + H2O -> 2 OH•', line: 1, column: 23 },
  'unused-directive-species': { text: '%terminal N2\nO3 + hν -> O2 + O(3P)', line: 1, column: 11 },
  'element-imbalance': { text: 'X1: 2 O3 -> 2 O2', line: 1, column: 1 },
  'charge-imbalance': { text: 'Fe^3+ + e^- -> Fe^+', line: 1, column: 1 },
  'site-imbalance': { text: 'CO + * -> CO*2', line: 1, column: 1 },
  'photon-on-product-side': { text: 'O3 + hν -> O2 + O(3P) + hν', line: 1, column: 25 },
  'third-body-unpaired': { text: 'O(3P) + O2 + M -> O3', line: 1, column: 1 },
  'molecularity-above-three': { text: 'H• + H• + H• + H• -> 2 H2', line: 1, column: 1 },
  'not-elementary': { text: '1/2 O2 + CO -> CO2', line: 1, column: 1 },
  'odd-electrons-unmarked': { text: 'NO + O3 -> NO2 + O2', line: 1, column: 1 },
  'even-electrons-marked': { text: 'O• + O3 -> 2 O2', line: 1, column: 1 },
  'triplet-unmarked': { text: 'H• + O2 -> OH• + O(3P)', line: 1, column: 18 },
  'radical-marks-parity': { text: 'H2 + OH•• -> H2O + H•', line: 1, column: 6 },
  'step-class': { text: 'Br2 + hν -> 2 Br•', line: 1, column: 1 },
  'duplicate-label': { text: 'R1: O3 + hν -> O2 + O(3P)\nR1: O2 + hν -> 2 O(3P)', line: 2, column: 1 },
  'reversible-photolysis': { text: 'Q1: O3 + hν <=> O2 + O(1D)', line: 1, column: 1 },
  'step-changes-nothing': { text: 'Q1: NO2 + M -> NO2 + M', line: 1, column: 1 },
  'duplicate-step': { text: 'O3 + hν -> O2 + O(3P)\nO3 + hν -> O(3P) + O2', line: 2, column: 1 },
  'suggested-fix': { text: '2 O3 -> 2 O2', line: 1, column: 1 },
  'no-steps': { text: '# nothing yet', line: 1, column: 1 },
  'routes-too-large': { text: () => generateMechanism(MAX_ROUTE_ANALYSIS_STEPS + 1), line: 3, column: 1 },
  'direct-routes-skipped': { text: () => generateMechanism(41), line: 3, column: 1 },
  'direct-routes-limit': { text: explodingMechanism, line: 15, column: 1 },
  'steps-left-out-of-routes': { text: 'X1: O3 + hν -> O2 + O(3P)\nX2: O(3P) + O2 -> O3 + O', line: 2, column: 1 },
  'route-reverses-one-way-step': { text: '%intermediates H•, OH•, O(3P)\nR1: H2 + O2 -> HO2• + H•\nR2: H• + O2 -> OH• + O(3P)\nR3: O(3P) + H2 -> OH• + H•\nR4: OH• + H2 -> H2O + H•', line: 2, column: 1 },
  'species-two-spellings': { text: 'O3 + hν -> O2 + O(3P)\nO + O3 -> 2 O2', line: 2, column: 1 },
  'no-productive-route': { text: '%intermediates O3, O2, O(3P)\nO3 + hν -> O2 + O(3P)\nO(3P) + O2 + M -> O3 + M', line: 2, column: 1 },
  'enthalpy-missing': { text: 'CO + * -> CO*', line: 1, column: 1 },
  // `exp(` is never closed: mathjs finds the end of the expression at its 15th character.
  'rate-expression': { text: 'R1: CH4 + OH• -> CH3• + H2O @ 6.4e-15 * exp(', line: 1, column: 45 },
  'rate-not-finite': { text: 'O(3P) + O3 -> 2 O2 @ 1/0', line: 1, column: 22 },
  'third-body-unknown': { text: '%units conc = mol m^-2\nO* + CO* + M -> CO2 + 2 * + M @ 1e3 * M', line: 2, column: 33 },
  'rate-negative': { text: '%conditions T = 200 K\nO(3P) + O3 -> 2 O2 @ 8e-12 * (T - 250)', line: 2, column: 22 },
  'rate-count': { text: 'N2O4 <=> 2 NO2• @ 1.0e5', line: 1, column: 17 },
  'rates-unchecked': { text: () => generateMechanism(MAX_RATE_CHECK_STEPS + 1), line: 3, column: 1 },
};

describe('DIAGNOSTIC_CODES', () => {
  it('are stable kebab-case names, each with a severity and a meaning', () => {
    for (const [code, info] of Object.entries(DIAGNOSTIC_CODES)) {
      expect(code).toMatch(/^[a-z]+(?:-[a-z]+)*$/);
      expect(['error', 'warning', 'info']).toContain(info.severity);
      expect(info.meaning.length).toBeGreaterThan(10);
    }
  });

  it('each have a trigger below', () => {
    expect(Object.keys(TRIGGERS).sort()).toEqual(Object.keys(DIAGNOSTIC_CODES).sort());
  });

  it.each(Object.keys(DIAGNOSTIC_CODES) as DiagnosticCode[])('%s is reported where the problem is, with its severity', (code) => {
    const trigger = TRIGGERS[code];
    const text = typeof trigger.text === 'function' ? trigger.text() : trigger.text;
    const found = analyseMechanism(text).diagnostics.filter((item) => item.code === code);
    expect(found.length).toBeGreaterThan(0);
    expect(found[0]).toMatchObject({ severity: DIAGNOSTIC_CODES[code].severity, line: trigger.line, ...(trigger.column ? { column: trigger.column } : {}) });
    expect(found[0].message).not.toBe('');
  });
});
