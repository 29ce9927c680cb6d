import { describe, expect, it } from 'vitest';
import { analyseMechanism } from '@api/chemistry/analyse';
import { builtinEnthalpy, chainLookups, createEnthalpyLookup, type EnthalpyLookup } from '@api/chemistry/thermo';

const dfH = (key: string) => builtinEnthalpy(key)?.dfH ?? null;

describe('builtinEnthalpy key normalisation (step-notation.md species keys)', () => {
  it('ignores radical marks, Unicode or ASCII', () => {
    expect(dfH('NO•')).toBe(dfH('NO'));
    expect(dfH('NO.')).toBe(dfH('NO'));
    expect(dfH('Br•')).toBe(dfH('Br'));
  });

  it('reads (g) as the gas entry and keeps condensed phases apart', () => {
    expect(dfH('Br2(g)')).toBe(30.91);
    expect(dfH('Br2(l)')).toBe(0);
    expect(dfH('H2O2(aq)')).not.toBe(dfH('H2O2'));
  });

  it('maps ground-state tags to the atom and says so in the source', () => {
    expect(dfH('O(3P)')).toBe(dfH('O'));
    expect(dfH('Cl(2P3/2)')).toBe(dfH('Cl'));
    expect(builtinEnthalpy('O(3P)')?.source).toContain('(3P) is the ground state');
    expect(builtinEnthalpy('O(3P)')?.key).toBe('O(3P)');
  });

  // O(¹D₂) at 15 867.862 cm⁻¹ (NIST ASD, from memory) = 189.82 kJ/mol;
  // O2 a¹Δg T0 = 7 882.39 cm⁻¹ (Huber & Herzberg 1979, from memory) = 94.29 kJ/mol.
  it('adds the excitation energy of known excited states', () => {
    expect((dfH('O(1D)') ?? NaN) - (dfH('O') ?? NaN)).toBeCloseTo(189.82, 2);
    expect(dfH('O2(a1Δg)')).toBeCloseTo(94.29, 2);
    expect(builtinEnthalpy('O(1D)')?.source).toContain('15867.862 cm⁻¹');
    expect(dfH('O(1D)(g)')).toBe(dfH('O(1D)'));
  });

  // Common practice: the red auroral line of atomic oxygen, ¹D₂ → ³P₂, lies at 630.0 nm in air
  // (630.2 nm in vacuum); its photon energy N_A·h·c/λ is the ¹D excitation energy.
  it('gives O(1D) the energy of the 630 nm red line above O(3P)', () => {
    const excitation = (dfH('O(1D)') ?? NaN) - (dfH('O(3P)') ?? NaN);
    expect(excitation).toBeCloseTo(119626.57 / 630.2, 1);
  });

  it('accepts the charge before or after the phase tag', () => {
    expect(dfH('Cl^-(aq)')).toBe(-167.08);
    expect(dfH('Cl(aq)^-')).toBe(-167.08);
    expect(dfH('Fe^3+(aq)')).toBe(dfH('Fe(aq)^3+'));
  });

  it.each([
    ['C2H4O', 'an isomer written differently from CH3CHO'],
    ['Cl^-', 'a gas-phase ion that is not tabulated'],
    ['CO*', 'an adsorbed species'],
    ['*', 'an empty site'],
    ['e^-', 'an electron'],
    ['O(v)', 'vibrational excitation of unknown energy'],
    ['O(5S)', 'an electronic state that is not tabulated'],
    ['Enz', 'a declared name'],
    ['Xy2', 'an unknown symbol'],
    ['', 'an empty key'],
    ['O(1D)(aq)', 'two state tags that no entry has'],
  ])('does not know %s (%s)', (key) => {
    expect(builtinEnthalpy(key)).toBeNull();
  });
});

describe('createEnthalpyLookup', () => {
  const row = { dfH: 1, uncertainty: null, source: 'test row' };

  it('rejects two rows that are the same species, and malformed keys', () => {
    expect(() => createEnthalpyLookup([{ key: 'Br', ...row }, { key: 'Br•', ...row }])).toThrow('"Br•" is listed twice (as Br)');
    expect(() => createEnthalpyLookup([{ key: 'hν', ...row }])).toThrow('"hν" is not a species key');
  });

  it('knows the empty site and the electron only when a row gives them a value', () => {
    const lookup = createEnthalpyLookup([{ key: 'e^-', ...row }]);
    expect(lookup('e^-')).toMatchObject({ key: 'e^-', dfH: 1 });
    expect(lookup('*')).toBeNull();
  });
});

describe('chainLookups', () => {
  const catalogue: EnthalpyLookup = createEnthalpyLookup([{ key: 'BrO', dfH: 124.0, uncertainty: 1, source: 'catalogue' }]);

  it('takes the first lookup that knows a species and falls through otherwise', () => {
    const chained = chainLookups(catalogue, builtinEnthalpy);
    expect(chained('BrO•')).toMatchObject({ key: 'BrO•', dfH: 124.0, source: 'catalogue' });
    expect(chained('O3')?.dfH).toBe(142.674);
    expect(chained('C2H4O')).toBeNull();
    expect(chainLookups()('O3')).toBeNull();
  });
});

describe('declared names in enthalpies', () => {
  it('gives a name declared with a composition the enthalpy of that spelling; an opaque name has none', () => {
    const written = analyseMechanism('P1: CH3O2• + NO• -> CH3O• + NO2•');
    const text = '%species RO2 = CH3O2•\n%species Enz\n%species EnzO\nP1: RO2 + NO• -> CH3O• + NO2•\nP2: Enz + O3 -> EnzO + O2\nP3: EnzO + O3 -> Enz + 2 O2';
    const named = analyseMechanism(text);
    expect(written.steps[0].dH).not.toBeNull();
    expect(named.steps[0].dH).toBe(written.steps[0].dH);
    expect(named.species.find((item) => item.key === 'RO2')?.dfH).toBe(builtinEnthalpy('CH3O2•')?.dfH);
    expect(named.species.find((item) => item.key === 'Enz')?.dfH).toBeNull();
    expect(named.steps[1].dH).toBeNull();
    // The opaque names cancel in the route, whose ΔH is then that of 2 O3 → 3 O2 (NIST-JANAF O3 entry, from memory).
    const route = named.routes.find((item) => item.netSpecies.O3 === -2);
    expect(route?.dH).toBeCloseTo(-285.3, 0);
  });
});
