import { describe, expect, it } from 'vitest';
import { buildRateSystem } from '@api/chemistry/kinetics/build-system';
import { checkRateMagnitude } from '@api/chemistry/kinetics/unit-check';
import { modelOf } from './model-builder';

describe('rate magnitudes checked against molecularity', () => {
  it('warns about a bimolecular gas-phase k above the collision limit (~1e-9 cm³ molecule⁻¹ s⁻¹; common practice)', () => {
    expect(checkRateMagnitude({ order: 2, unit: 'molecule cm^-3', value: 2e-10, photolysis: false })).toEqual([]);
    expect(checkRateMagnitude({ order: 2, unit: 'molecule cm^-3', value: 5e-9, photolysis: false })[0]).toMatch(/collision limit/);
  });

  it('warns about a termolecular k above ~1e-28 cm⁶ molecule⁻² s⁻¹ (common practice)', () => {
    expect(checkRateMagnitude({ order: 3, unit: 'molecule cm^-3', value: 6e-34, photolysis: false })).toEqual([]);
    expect(checkRateMagnitude({ order: 3, unit: 'molecule cm^-3', value: 1e-26, photolysis: false })).toHaveLength(1);
  });

  it('carries the bound over to mol L⁻¹: 1e-9 cm³ molecule⁻¹ s⁻¹ × N_A / 1000 = 6.02e11 L mol⁻¹ s⁻¹', () => {
    expect(checkRateMagnitude({ order: 2, unit: 'mol L^-1', value: 1e10, photolysis: false })).toEqual([]);
    expect(checkRateMagnitude({ order: 2, unit: 'mol L^-1', value: 7e11, photolysis: false })).toHaveLength(1);
  });

  it('refuses a negative rate constant at its step (an error, so nothing is integrated), and warns about J above any solar photolysis frequency', () => {
    const negative = buildRateSystem(modelOf(['N1: NO3 -> NO + O2 @ -0.1']), { T: 298, P: 1 });
    expect(negative.system).toBeNull();
    expect(negative.diagnostics.map((d) => [d.severity, d.code, d.label])).toEqual([['error', 'rate-negative', 'N1']]);
    expect(negative.diagnostics[0].message).toContain('is negative at the conditions (-1.00e-1)');
    // Negative only at some temperatures: refused where it is negative.
    const crossing = buildRateSystem(modelOf(['N2: NO3 -> NO + O2 @ 1e-3 * (T - 250)']), { T: 298, P: 1 });
    expect(crossing.diagnostics).toEqual([]);
    expect(buildRateSystem(modelOf(['N2: NO3 -> NO + O2 @ 1e-3 * (T - 250)']), { T: 200, P: 1 }).system).toBeNull();
    expect(checkRateMagnitude({ order: 1, unit: 'molecule cm^-3', value: 5, photolysis: true })[0]).toMatch(/solar/);
    expect(checkRateMagnitude({ order: 1, unit: 'molecule cm^-3', value: 8e-3, photolysis: true })).toEqual([]);
  });

  it('judges an M step by the order of its written k: a termolecular value, unless it is a fall-off', () => {
    // A bimolecular-sized value written for O + O2 + M is a units mistake (k0 ≈ 6e-34 is right).
    const wrong = buildRateSystem(modelOf(['W1: O + O2 + M -> O3 + M @ 1.5e-14']), { T: 298, P: 1 });
    expect(wrong.diagnostics.map((d) => [d.severity, d.code])).toEqual([['warning', 'rate-magnitude']]);
    expect(wrong.system).not.toBeNull();
    const falloff = buildRateSystem(modelOf(['W2: OH + NO2 + M -> HNO3 + M @ falloff(1.8e-30 * (T/300)^-3, 2.8e-11, 0.6)']), { T: 298, P: 1 });
    expect(falloff.diagnostics).toEqual([]);
  });
});
