import { describe, expect, it } from 'vitest';
import { builtinEnthalpy, reactionEnthalpy } from '@api/chemistry/thermo';

/** Terms from `reactants -> products` written as [coef, key] pairs. */
function terms(reactants: [number, string][], products: [number, string][]) {
  return [
    ...reactants.map(([coef, key]) => ({ key, coef: -coef })),
    ...products.map(([coef, key]) => ({ key, coef })),
  ];
}

const dH = (reactants: [number, string][], products: [number, string][]) =>
  reactionEnthalpy(terms(reactants, products), builtinEnthalpy).dH ?? NaN;

describe('reaction enthalpies by Hess’s law', () => {
  it.each([
    // [equation, expected ΔH, tolerance, reactants, products, source]
    ['O3 → O2 + O(3P)', 106.5, 0.2, [[1, 'O3']], [[1, 'O2'], [1, 'O(3P)']], 'NIST-JANAF O and O3 entries'],
    ['O2 → 2 O', 498.4, 0.2, [[1, 'O2']], [[2, 'O']], 'NIST-JANAF O entry'],
    ['Cl + O3 → ClO + O2', -162, 1.5, [[1, 'Cl•'], [1, 'O3']], [[1, 'ClO•'], [1, 'O2']], 'JPL 19-5'],
    ['NO + O3 → NO2 + O2', -200, 1.5, [[1, 'NO'], [1, 'O3']], [[1, 'NO2'], [1, 'O2']], 'JPL 19-5 / NIST-JANAF'],
    ['Br2(l) → Br2(g)', 30.91, 0.01, [[1, 'Br2(l)']], [[1, 'Br2(g)']], 'CODATA key values'],
    ['H2O(l) → H2O(g)', 44.004, 0.01, [[1, 'H2O(l)']], [[1, 'H2O']], 'CODATA key values, ΔvapH°(298 K)'],
    ['2 O3 → 3 O2', -285.3, 0.1, [[2, 'O3']], [[3, 'O2']], 'NIST-JANAF O3 entry (analysis.md example route)'],
    ['C2H5 + O2 → C2H5O2', -145.6, 0.1, [[1, 'C2H5•'], [1, 'O2']], [[1, 'C2H5O2•']], 'Knyazev & Slagle, J. Phys. Chem. A 102 (1998) 1770'],
    // Alkylperoxy + NO → alkoxy + NO2 is about 45 kJ/mol exothermic (from memory).
    ['C2H5O2 + NO → C2H5O + NO2', -45, 8, [[1, 'C2H5O2•'], [1, 'NO']], [[1, 'C2H5O•'], [1, 'NO2']], 'from memory'],
    // Formaldehyde written HCHO, as atmospheric mechanisms do: the same ΔfH° as CH2O (ATcT).
    ['HCHO → CH2O', 0, 1e-9, [[1, 'HCHO']], [[1, 'CH2O']], 'ATcT ver. 1.124'],
  ] as [string, number, number, [number, string][], [number, string][], string][])(
    '%s: ΔH ≈ %f ± %f kJ/mol',
    (_equation, expected, tolerance, reactants, products) => {
      expect(Math.abs(dH(reactants, products) - expected)).toBeLessThanOrEqual(tolerance);
    },
  );

  // Bond dissociation enthalpies at 298 K (Blanksby & Ellison, Acc. Chem. Res. 36 (2003) 255,
  // Table 1, in kcal/mol, from memory; × 4.184). Each is the enthalpy of A–B → A + B.
  it.each([
    ['H–H', 104.2, [[1, 'H2']], [[2, 'H']]],
    ['HO–H', 118.8, [[1, 'H2O']], [[1, 'OH'], [1, 'H']]],
    ['CH3–H', 105.0, [[1, 'CH4']], [[1, 'CH3'], [1, 'H']]],
    ['H–Cl', 103.2, [[1, 'HCl']], [[1, 'H'], [1, 'Cl']]],
    ['H–Br', 87.5, [[1, 'HBr']], [[1, 'H'], [1, 'Br']]],
    ['H–I', 71.3, [[1, 'HI']], [[1, 'H'], [1, 'I']]],
    ['H–F', 136.3, [[1, 'HF']], [[1, 'H'], [1, 'F']]],
    ['Cl–Cl', 58.0, [[1, 'Cl2']], [[2, 'Cl']]],
    ['I–I', 36.1, [[1, 'I2']], [[2, 'I']]],
    ['CH3–CH3', 90.1, [[1, 'C2H6']], [[2, 'CH3']]],
  ] as [string, number, [number, string][], [number, string][]][])(
    'D298(%s) ≈ %f kcal/mol',
    (_bond, kcal, reactants, products) => {
      expect(Math.abs(dH(reactants, products) - kcal * 4.184)).toBeLessThanOrEqual(1.0);
    },
  );
});

describe('reaction enthalpies against measured equilibria (looked up)', () => {
  // Klobas & Wilmouth, ACP 19 (2019) 6205: Keq(2 ClO ⇌ ClOOCl) = 2.16e-27 exp(8527 K / T) cm³ molecule⁻¹.
  // The van't Hoff slope gives ΔU = −R·8527 K; with Δn = −1, ΔH = ΔU − RT at 298.15 K.
  it('2 ClO → ClOOCl agrees with the van’t Hoff slope of the measured equilibrium constant', () => {
    const R = 8.314462618e-3;
    const fromSlope = -R * 8527 - R * 298.15;
    expect(Math.abs(dH([[2, 'ClO']], [[1, 'Cl2O2']]) - fromSlope)).toBeLessThanOrEqual(1.5);
  });

  // Orlando & Tyndall, J. Phys. Chem. 100 (1996) 19398: BrONO2 → BrO + NO2, 28.2 ± 1.5 kcal/mol at 298 K.
  it('BrONO2 → BrO + NO2 agrees with the measured dissociation enthalpy within its uncertainty', () => {
    expect(Math.abs(dH([[1, 'BrONO2']], [[1, 'BrO'], [1, 'NO2']]) - 28.2 * 4.184)).toBeLessThanOrEqual(1.5 * 4.184);
  });
});

describe('reactionEnthalpy rules', () => {
  it('skips the photon and the third body', () => {
    const result = reactionEnthalpy(
      terms([[1, 'O(3P)'], [1, 'O2'], [1, 'M']], [[1, 'O3'], [1, 'M']]).concat({ key: 'hν', coef: -1 }),
      builtinEnthalpy,
    );
    expect(result.missing).toEqual([]);
    expect(result.dH).toBeCloseTo(-106.5, 1);
    expect(result.used.map((entry) => entry.key)).toEqual(['O(3P)', 'O2', 'O3']);
  });

  it('names the empty site, the electron and unknown species as missing, and gives no ΔH', () => {
    const result = reactionEnthalpy(terms([[1, 'CO'], [1, '*']], [[1, 'CO*']]), builtinEnthalpy);
    expect(result).toMatchObject({ dH: null, missing: ['*', 'CO*'], uncertainty: null });
    expect(reactionEnthalpy(terms([[1, 'Fe(aq)^3+'], [1, 'e^-']], [[1, 'Fe(aq)^2+']]), builtinEnthalpy).missing).toEqual(['e^-']);
  });

  it('sums repeated terms and does not look up a species whose net coefficient is zero', () => {
    const result = reactionEnthalpy(terms([[1, 'Enz'], [1, 'BrO•'], [1, 'BrO•']], [[1, 'Enz'], [2, 'Br•'], [1, 'O2']]), builtinEnthalpy);
    expect(result.missing).toEqual([]);
    expect(result.dH).toBeCloseTo(2 * 111.87 - 2 * 125.8, 6);
  });

  it('propagates uncertainties as √Σ(ν·u)², and gives none when a source states none', () => {
    expect(reactionEnthalpy(terms([[1, 'O2']], [[2, 'O']]), builtinEnthalpy).uncertainty).toBeCloseTo(0.2, 6);
    expect(reactionEnthalpy(terms([[1, 'H2O2(aq)']], [[1, 'H2O2']]), builtinEnthalpy).uncertainty).toBeNull();
  });

  it('rejects a coefficient that is not a finite number, naming the species', () => {
    expect(() => reactionEnthalpy([{ key: 'O3', coef: Number.NaN }], builtinEnthalpy)).toThrow('coefficient of "O3" is NaN');
  });
});
