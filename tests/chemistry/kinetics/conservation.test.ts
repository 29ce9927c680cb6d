import { describe, expect, it } from 'vitest';
import { conservationLaws } from '@api/chemistry/kinetics/analysis/conservation-laws';
import { buildRateSystem } from '@api/chemistry/kinetics/build-system';
import { simulate } from '@api/chemistry/kinetics/simulate';
import { modelOf } from './model-builder';

// Chapman oxygen cycle with NOx catalysis; rate parameters from JPL 19-5 (O + O2 + M, O + O3,
// NO + O3, NO2 + O); photolysis frequencies of the order of mid-stratospheric values (common practice).
const stratosphere = modelOf([
  'J1: O2 + hv -> 2 O @ 1e-11',
  'K2: O + O2 + M -> O3 + M @ 6.1e-34 * (T / 300)^-2.4',
  'J3: O3 + hv -> O + O2 @ 5e-4',
  'K4: O + O3 -> 2 O2 @ 8.0e-12 * exp(-2060 / T)',
  'K5: NO + O3 -> NO2 + O2 @ 3.0e-12 * exp(-1500 / T)',
  'K6: NO2 + O -> NO + O2 @ 5.1e-12 * exp(210 / T)',
  'J7: NO2 + hv -> NO + O @ 8e-3',
]);
const elements: Record<string, Record<string, number>> = { O2: { O: 2 }, O: { O: 1 }, O3: { O: 3 }, NO: { N: 1, O: 1 }, NO2: { N: 1, O: 2 } };
const composition = stratosphere.species.map((key) => elements[key]);
const tenDays = 10 * 86_400;

function run(fixed: string[] = []) {
  return simulate({
    model: stratosphere, conditions: { T: 230, P: 0.01 }, initial: { O2: 5e16, O3: 4e12, NO: 1e9 }, fixed, tEnd: tenDays,
    output: { kind: 'linear', points: 241 }, light: { kind: 'diurnal', latitudeDeg: 45, declinationDeg: 10, noon: 43_200 },
    composition, rtol: 1e-6,
  });
}

describe('conservation of element totals', () => {
  it('keeps the O and N totals over ten days with a diurnal sun within 1e-9 relative', () => {
    const result = run();
    expect(result.status).toBe('done');
    expect(result.conservation!.elements.map((e) => e.element)).toEqual(['N', 'O']);
    expect(result.conservation!.maxRelativeDrift).toBeLessThan(1e-9);
    // The run is stiff: O reacts within milliseconds while the cycle turns over in days.
    expect(result.stats.accepted).toBeGreaterThan(100);
  });

  it('skips elements carried by a fixed species (the clamp is an open source) and says why', () => {
    const result = run(['O2']);
    expect(result.conservation!.skipped).toEqual([{ element: 'O', reason: 'carried by a fixed species' }]);
    expect(result.conservation!.elements.map((e) => e.element)).toEqual(['N']);
  });

  it('finds the conserved combinations of the stoichiometric matrix (one per element here)', () => {
    const { system } = buildRateSystem(stratosphere, { T: 230, P: 0.01 });
    const laws = conservationLaws(system!, new Uint8Array(stratosphere.species.length));
    expect(laws).toHaveLength(2);
    for (const law of laws) {
      for (const step of system!.steps) {
        const change = [...step.netIndex].reduce((sum, species, j) => sum + law.weights[species] * step.netCoef[j], 0);
        expect(Math.abs(change)).toBeLessThan(1e-12);
      }
    }
  });
});
