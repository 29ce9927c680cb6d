import { describe, expect, it } from 'vitest';
import { analyseMechanism } from '@api/chemistry/analyse';
import { formatReport } from '@api/chemistry/report-text';

describe('the readable report of check', () => {
  // H2 + Cl2 chain with every step reversible: routes may run a step backwards (σ < 0), which the
  // report writes as a subtraction. Net H2 + Cl2 → 2 HCl (common practice).
  const text = [
    'R1: Cl2 <=> 2 Cl• @ 1 | 1',
    'R2: Cl• + H2 <=> HCl + H• @ 1 | 1',
    'R3: H• + Cl2 <=> HCl + Cl• @ 1 | 1',
    'R4: H• + HCl <=> H2 + Cl• @ 1 | 1',
  ].join('\n');

  it('writes a step run backwards as a subtraction, never as "+ -"', () => {
    const report = formatReport(analyseMechanism(text), 'chain.steps');
    const sums = report.split('\n').filter((line) => /^ {2}\d+\. /.test(line));
    expect(sums.length).toBeGreaterThan(0);
    for (const line of sums) expect(line).not.toMatch(/\+ -|\+ −/);
    const analysis = analyseMechanism(text);
    const backwards = analysis.routes.findIndex((route) => Object.values(route.multipliers).some((value) => value < 0));
    expect(backwards).toBeGreaterThanOrEqual(0); // R3 − R4 is one such route
    expect(sums[backwards]).toMatch(/ − \d+×R\d/);
  });

  it('says how much light a route absorbs instead of a negative photon count', () => {
    // Chapman cycle: O2 photolysis then two associations, net 3 O2 → 2 O3 with one photon (common practice).
    const report = formatReport(analyseMechanism('C1: O2 + hν -> 2 O(3P)\nC2: O(3P) + O2 + M -> O3 + M'), 'chapman.steps');
    expect(report).toContain('net: 3 O2 → 2 O3 (1 hν absorbed);');
    expect(report).not.toMatch(/-\d+ hν/);
  });

  it('counts the findings in the singular and plural', () => {
    const report = formatReport(analyseMechanism('Br2 + hν -> 2 Br•'), 'one.steps');
    expect(report).toContain('Diagnostics: 0 errors, 0 warnings, 1 note');
  });

  it('writes the molecularity of a lumped step to three decimals', () => {
    const report = formatReport(analyseMechanism('L1: 1/3 O3 -> 1/2 O2'), 'lumped.steps');
    expect(report).toContain('molecularity 0.333,');
  });
});
