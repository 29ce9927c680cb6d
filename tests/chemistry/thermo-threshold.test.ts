import { describe, expect, it } from 'vitest';
import {
  AVOGADRO_NA, BOLTZMANN_KB, ELEMENTARY_CHARGE_E, GAS_CONSTANT_R, MOLAR_PHOTON_ENERGY_KJ_NM,
  PLANCK_H, SPEED_OF_LIGHT_C,
} from '@api/chemistry/constants';
import { builtinEnthalpy, reactionEnthalpy, thresholdWavelengthNm } from '@api/chemistry/thermo';

describe('CODATA 2018 constants', () => {
  // CODATA 2018 (Tiesinga et al. 2021): exact values of the revised SI.
  it('holds the exact defining values', () => {
    expect([PLANCK_H, SPEED_OF_LIGHT_C, AVOGADRO_NA, BOLTZMANN_KB, ELEMENTARY_CHARGE_E])
      .toEqual([6.62607015e-34, 299792458, 6.02214076e23, 1.380649e-23, 1.602176634e-19]);
  });

  // CODATA 2018: R = 8.314 462 618… J mol⁻¹ K⁻¹; F = N_A·e = 96 485.332 12… C mol⁻¹.
  it('derives R and the Faraday constant as CODATA lists them', () => {
    expect(GAS_CONSTANT_R.toPrecision(10)).toBe('8.314462618');
    expect((AVOGADRO_NA * ELEMENTARY_CHARGE_E).toPrecision(10)).toBe('96485.33212');
  });

  it('gives N_A·h·c = 119 626.6 kJ mol⁻¹ nm to 7 significant figures', () => {
    expect(MOLAR_PHOTON_ENERGY_KJ_NM.toPrecision(7)).toBe('119626.6');
  });
});

/** ΔH of a photolysis written as [coef, key] reactants → products (hν skipped by the engine). */
function photolysisThreshold(reactant: string, products: [number, string][]): number | null {
  const terms = [{ key: reactant, coef: -1 }, { key: 'hν', coef: -1 }, ...products.map(([coef, key]) => ({ key, coef }))];
  const dH = reactionEnthalpy(terms, builtinEnthalpy).dH;
  return dH === null ? null : thresholdWavelengthNm(dH);
}

describe('photolysis thresholds λ = N_A·h·c / ΔH', () => {
  it('puts breaking O2 (about 498 kJ/mol) at about 240 nm (common practice)', () => {
    expect(photolysisThreshold('O2', [[2, 'O(3P)']])).toBeCloseTo(240, 0);
  });

  it('puts O3 → O2 + O(3P) near 1120 nm (common practice: ozone absorbs out to the near infrared)', () => {
    const lambda = photolysisThreshold('O3', [[1, 'O2'], [1, 'O(3P)']]) ?? NaN;
    expect(Math.abs(lambda - 1123)).toBeLessThan(5);
  });

  // The spin-allowed O(¹D) channel opens near 310 nm (JPL 19-5 ozone quantum-yield notes, from memory:
  // that figure is the 0 K threshold; with ΔH at 298 K the formula gives ~306 nm).
  it('puts O3 → O2(a1Δg) + O(1D) near 306–310 nm', () => {
    const lambda = photolysisThreshold('O3', [[1, 'O2(a1Δg)'], [1, 'O(1D)']]) ?? NaN;
    expect(lambda).toBeGreaterThan(303);
    expect(lambda).toBeLessThan(312);
  });

  // NO2 → NO + O(3P): the threshold near 398 nm at 0 K (JPL 19-5, from memory); ~390 nm with ΔH(298 K).
  it('puts NO2 → NO + O(3P) near 390–400 nm', () => {
    const lambda = photolysisThreshold('NO2', [[1, 'NO'], [1, 'O(3P)']]) ?? NaN;
    expect(lambda).toBeGreaterThan(385);
    expect(lambda).toBeLessThan(400);
  });

  it('is exactly N_A·h·c / ΔH and null when no energy is needed', () => {
    expect(thresholdWavelengthNm(119626.5656)).toBeCloseTo(1, 6);
    expect(thresholdWavelengthNm(0)).toBeNull();
    expect(thresholdWavelengthNm(-128.7)).toBeNull();
    expect(thresholdWavelengthNm(Number.NaN)).toBeNull();
  });
});
