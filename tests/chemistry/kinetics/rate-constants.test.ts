import { describe, expect, it } from 'vitest';
import { buildRateSystem } from '@api/chemistry/kinetics/build-system';
import { idealGasConcentration } from '@api/chemistry/kinetics/units';
import { modelOf } from './model-builder';

// [M] at 298 K and 1 atm from the ideal gas law with CODATA k_B = 1.380649e-23 J/K:
// 101325 Pa / (1.380649e-23 J/K × 298 K) = 2.46273e25 m⁻³ = 2.46273e19 molecule cm⁻³.
const M298 = 2.4627315018045133e19;

function rateConstants(lines: string[]) {
  const { system, diagnostics } = buildRateSystem(modelOf(lines), { T: 298, P: 1 });
  if (!system) throw new Error(JSON.stringify(diagnostics));
  return { k: system.steps.map((step) => step.kForward), diagnostics, thirdBody: system.thirdBody };
}

describe('rate constants evaluated from published parameters', () => {
  it('computes [M] from P and T with the ideal gas law', () => {
    expect(idealGasConcentration(1, 298, 'molecule cm^-3')! / M298).toBeCloseTo(1, 12);
    // 1 atm at 298 K is 0.040895 mol L⁻¹ (P/RT with R = k_B·N_A = 8.314462618 J mol⁻¹ K⁻¹).
    expect(idealGasConcentration(1, 298, 'mol L^-1')!).toBeCloseTo(101325 / (8.314462618 * 298) / 1000, 9);
    expect(idealGasConcentration(1, 298, 'mol m^-2')).toBeNull();
  });

  it('Arrhenius: Cl + O3 → ClO + O2, k = 2.3e-11 exp(−200/T) (JPL 19-5) is 1.1756e-11 at 298 K', () => {
    // By hand: exp(−200/298) = exp(−0.671141) = 0.511125; 2.3e-11 × 0.511125 = 1.17559e-11
    // (JPL 19-5 tabulates k(298) = 1.2e-11 cm³ molecule⁻¹ s⁻¹).
    const { k } = rateConstants(['C1: Cl + O3 -> ClO + O2 @ 2.3e-11 * exp(-200 / T)']);
    expect(k[0] / 1.17559e-11).toBeCloseTo(1, 5);
  });

  it('termolecular: O + O2 + M → O3 + M, k0 = 6.1e-34 (T/300)^-2.4 (JPL 19-5), times [M]', () => {
    // By hand: (298/300)^-2.4 = exp(2.4 × 0.0066890) = 1.016183; k0 = 6.19872e-34 cm⁶ molecule⁻² s⁻¹;
    // the pseudo-second-order constant k0[M] = 6.19872e-34 × 2.46273e19 = 1.52658e-14 cm³ molecule⁻¹ s⁻¹.
    const { k, thirdBody } = rateConstants(['C2: O + O2 + M -> O3 + M @ 6.1e-34 * (T / 300)^-2.4']);
    expect(thirdBody! / M298).toBeCloseTo(1, 12);
    expect(k[0] / 1.52658e-14).toBeCloseTo(1, 5);
  });

  it('fall-off: OH + NO2 + M → HNO3 + M (JPL 19-5: k0 = 1.8e-30 (T/300)^-3, k∞ = 2.8e-11, Fc = 0.6) at 298 K, 1 atm', () => {
    // By hand: k0 = 1.8e-30 × (298/300)^-3 = 1.8e-30 × 1.020270 = 1.83649e-30;
    // k0[M] = 1.83649e-30 × 2.46273e19 = 4.52277e-11; x = k0[M]/k∞ = 1.615275; log10 x = 0.208247;
    // exponent 1/(1 + 0.208247²) = 0.958436; 0.6^0.958436 = 0.612875;
    // k = 4.52277e-11 / 2.615275 × 0.612875 = 1.05989e-11 cm³ molecule⁻¹ s⁻¹ ([M] already inside).
    const { k } = rateConstants(['C3: OH + NO2 + M -> HNO3 + M @ falloff(1.8e-30 * (T / 300)^-3.0, 2.8e-11, 0.6)']);
    expect(k[0] / 1.05989e-11).toBeCloseTo(1, 5);
  });

  it('refuses fall-off arguments out of range at the step, where the form would silently give 0 or too much', () => {
    const refused = (args: string) => {
      const { system, diagnostics } = buildRateSystem(modelOf([`C3: OH + NO2 + M -> HNO3 + M @ falloff(${args})`]), { T: 298, P: 1 });
      expect(system).toBeNull();
      return diagnostics.map((d) => [d.code, d.message]);
    };
    expect(refused('1.8e-30, 0, 0.6')).toEqual([['rate-expression', 'forward rate: falloff: k∞ must be positive, not 0']]);
    expect(refused('1.8e-30, 2.8e-11, 0')[0][1]).toContain('Fc must be above 0 and at most 1, not 0');
    expect(refused('1.8e-30, 2.8e-11, 1.5')[0][1]).toContain('not 1.5');
    expect(refused('-1.8e-30, 2.8e-11, 0.6')[0][1]).toContain('k0 must be zero or positive');
  });

  it('takes a photolysis value as J in s⁻¹ and a reversible step as forward | reverse', () => {
    const { system } = buildRateSystem(modelOf(['P1: NO2 + hv -> NO + O @ 8e-3', 'E1: N2O5 <=> NO2 + NO3 @ 0.05 | 2e-12']), { T: 298, P: 1 });
    expect(system!.steps.map((step) => [step.kForward, step.kReverse, step.photolysis])).toEqual([[8e-3, 0, true], [0.05, 2e-12, false]]);
  });

  it('reports a refused expression at its step and column within the line', () => {
    const model = modelOf(['C1: Cl + O3 -> ClO + O2 @ 2.3e-11 * exp(-200 / Temp)']);
    model.steps[0].forwardAt = { line: 7, column: 30 };
    const { system, diagnostics } = buildRateSystem(model, { T: 298, P: 1 });
    expect(system).toBeNull();
    expect(diagnostics).toEqual([expect.objectContaining({ severity: 'error', code: 'rate-expression', step: 0, label: 'C1', line: 7, column: 30 + 22 - 1 })]);
    expect(diagnostics[0].message).toMatch(/unknown symbol "Temp"/);
  });

  it('reports a step that needs [M] when no [M] can be had (surface units)', () => {
    const { diagnostics } = buildRateSystem(modelOf(['S1: A + B + M -> C + M @ 1e-3'], 'mol m^-2'), { T: 298, P: 1 });
    expect(diagnostics.map((d) => d.code)).toEqual(['third-body-unknown']);
  });
});
