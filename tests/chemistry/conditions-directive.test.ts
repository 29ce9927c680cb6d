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
