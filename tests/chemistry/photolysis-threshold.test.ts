import { describe, expect, it } from 'vitest';
import { analyseMechanism } from '@api/chemistry/analyse';

describe('photolysis thresholds of steps', () => {
  // Breaking O2 takes about 498 kJ/mol, so light shorter than about 240 nm (common practice);
  // ΔfH°(O, g) = 249.17 kJ/mol (NIST-JANAF), λ = N_A·h·c / ΔH with CODATA constants.
  it('O2 + hν → 2 O(3P) needs about 498 kJ/mol: light shorter than about 240 nm', () => {
    const [step] = analyseMechanism('J1: O2 + hν -> 2 O(3P)').steps;
    expect(step.dH).toBeCloseTo(498.3, 0);
    expect(step.thresholdNm).toBeGreaterThan(238);
    expect(step.thresholdNm).toBeLessThan(242);
  });

  // O3 + hν → O2 + O(3P): ΔH = 249.17 − 142.67 = 106.5 kJ/mol, so λ < about 1120 nm (NIST-JANAF values).
  it('O3 + hν → O2 + O(3P) has its threshold in the near infrared', () => {
    const [step] = analyseMechanism('O3 + hν -> O2 + O(3P)').steps;
    expect(step.dH).toBeCloseTo(106.5, 0);
    expect(step.thresholdNm).toBeCloseTo(119_626.6 / 106.499, 0);
  });

  // Two photons share ΔH: each needs 242.6 / 2 kJ/mol, so light shorter than about 986 nm (common practice).
  it('gives the per-photon threshold of a two-photon step', () => {
    const [one, two] = analyseMechanism('Cl2 + hν -> 2 Cl•\n2 hν + Cl2 -> 2 Cl•').steps;
    expect(two.dH).toBe(one.dH);
    expect(two.thresholdNm).toBeCloseTo(2 * (one.thresholdNm as number), 6);
    expect(two.thresholdNm).toBeCloseTo(119_626.6 / ((one.dH as number) / 2), 3);
  });

  it('gives no threshold for a step that releases heat or is not a photolysis', () => {
    const analysis = analyseMechanism('Br• + O3 -> BrO• + O2\nO(3P) + O2 + M -> O3 + M');
    expect(analysis.steps.map((step) => [step.photolysis, step.thresholdNm])).toEqual([[false, null], [false, null]]);
  });

  it('names the species without an enthalpy of formation and leaves ΔH empty', () => {
    const [step] = analyseMechanism('%species Chl\n%species ChlX\nChl + hν -> ChlX').steps;
    expect(step).toMatchObject({ dH: null, thresholdNm: null });
    expect(analyseMechanism('XeF2 + hν -> XeF• + F•').steps[0].missingEnthalpies).toContain('XeF2');
  });
});
