import { describe, expect, it } from 'vitest';
import { analyseMechanism } from '@api/chemistry/analyse';

const step = 'O(3P) + O2 + M -> O3 + M';
const read = (lines: string[]) => analyseMechanism([...lines, step].join('\n'));
const badDirectives = (lines: string[]) => read(lines).diagnostics.filter((item) => item.code === 'bad-directive');

describe('%conditions M and its unit', () => {
  it('reads M in the mechanism unit, written or not, whichever line sets the unit', () => {
    expect(read(['%conditions M = 2.46e19']).conditions.M).toBe(2.46e19);
    expect(read(['%conditions M = 2.46e19 molecule cm^-3']).conditions.M).toBe(2.46e19);
    expect(read(['%conditions M = 0.0409 mol L^-1', '%units conc = mol L^-1']).conditions.M).toBe(0.0409);
    expect(badDirectives(['%units conc = mol L^-1', '%conditions M = 0.0409  mol  L^-1'])).toEqual([]);
  });

  it('refuses M written in another unit than the mechanism’s, or followed by anything else, at the value', () => {
    // 2.46e19 molecule cm⁻³ is 0.0409 mol L⁻¹ at 298 K and 1 atm (CODATA k_B and N_A): read in
    // mol L⁻¹ it would be a billion billion times too much.
    const [wrongUnit] = badDirectives(['%units conc = mol L^-1', '%conditions T = 298 K, M = 2.46e19 molecule cm^-3']);
    expect(wrongUnit).toMatchObject({ severity: 'error', line: 2, column: 28 });
    expect(wrongUnit.message).toContain('"molecule cm^-3" is not it');
    expect(read(['%units conc = mol L^-1', '%conditions M = 2.46e19 molecule cm^-3']).conditions.M).toBeNull();
    expect(badDirectives(['%conditions M = 2.46e19 foo'])[0].message).toContain('"foo" is not it');
  });
});

describe('directives written more than once', () => {
  const codes = (lines: string[]) => read(lines).diagnostics.map((item) => item.code);

  it('uses the later condition and says which value it replaced; a repeat of the same value is quiet', () => {
    const analysis = read(['%conditions T = 298 K', '%conditions T = 250 K, P = 1 atm']);
    expect(analysis.conditions.T).toBe(250);
    const [repeated] = analysis.diagnostics.filter((item) => item.code === 'directive-repeated');
    expect(repeated).toMatchObject({ severity: 'warning', line: 2, column: 17 });
    expect(repeated.message).toContain('line 1 set it to 298 K');
    expect(codes(['%conditions T = 298 K', '%conditions T = 298 K'])).not.toContain('directive-repeated');
  });

  it('refuses a %title with only blanks after it, and keeps the earlier title', () => {
    const analysis = read(['%title Salt pan, noon', '%title   ']);
    expect(analysis.title).toBe('Salt pan, noon');
    expect(analysis.diagnostics.filter((item) => item.code === 'bad-directive')).toMatchObject([{ severity: 'error', line: 2, column: 1 }]);
  });

  it('keeps an earlier valid condition when a later one cannot be read', () => {
    const analysis = read(['%conditions T = 298 K', '%conditions T = -5']);
    expect(analysis.conditions.T).toBe(298);
    expect(codes(['%conditions T = 298 K', '%conditions T = -5'])).toContain('bad-directive');
  });

  it('adds up %terminal lines, so a long list may be split', () => {
    const text = ['%terminal O2', '%terminal O3', 'A: O3 + hν -> O2 + O(3P)', 'B: O(3P) + O3 -> 2 O2', 'C: O2 + hν -> 2 O(3P)', 'D: O(3P) + O2 + M -> O3 + M'].join('\n');
    const analysis = analyseMechanism(text);
    expect(analysis.terminalSpecies).toEqual(['O2', 'O3']);
    expect(analysis.intermediatesExplanation).toContain('less the %terminal species O2, O3');
  });

  it('refuses a species named both terminal and intermediate, at its place in %intermediates', () => {
    const text = ['%terminal O2, O3', '%intermediates O(3P), O3', 'A: O3 + hν -> O2 + O(3P)', 'B: O(3P) + O3 -> 2 O2'].join('\n');
    const [conflict] = analyseMechanism(text).diagnostics.filter((item) => item.code === 'bad-directive');
    expect(conflict).toMatchObject({ severity: 'error', line: 2, column: 23, found: 'O3' });
    expect(conflict.message).toContain('%terminal on line 1');
  });
});
