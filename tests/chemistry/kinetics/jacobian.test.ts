import { describe, expect, it } from 'vitest';
import { buildRateSystem } from '@api/chemistry/kinetics/build-system';
import { massActionJacobian } from '@api/chemistry/kinetics/jacobian';
import { massActionDerivative } from '@api/chemistry/kinetics/mass-action';
import { modelOf } from './model-builder';

const model = modelOf([
  'A1: 2 A + B -> C @ 3.0',
  'A2: C <=> A + D @ 0.7 | 1.9',
  'A3: D + hv -> 2 B @ 0.05',
  'A4: A + B + M -> E + M @ 0.2',
  'A5: 0.5 E -> D @ 0.4',
], 'mol L^-1');

function dense(size: number, pattern: { rowStart: Int32Array; columns: Int32Array }, values: Float64Array): number[][] {
  const matrix = Array.from({ length: size }, () => new Array<number>(size).fill(0));
  for (let i = 0; i < size; i++) for (let p = pattern.rowStart[i]; p < pattern.rowStart[i + 1]; p++) matrix[i][pattern.columns[p]] = values[p];
  return matrix;
}

describe('the analytic sparse Jacobian of a mass-action system', () => {
  it('matches central finite differences of the rate equations (common practice check)', () => {
    const { system } = buildRateSystem(model, { T: 298, P: 1, M: 2 });
    const fixed = new Uint8Array(model.species.length);
    const jacobian = massActionJacobian(system!, fixed);
    const c = Float64Array.from([0.8, 1.3, 0.4, 0.6, 0.9]);
    const values = new Float64Array(jacobian.pattern.columns.length);
    jacobian.fill(c, 0.7, values);
    const analytic = dense(c.length, jacobian.pattern, values);
    const [plus, minus] = [new Float64Array(c.length), new Float64Array(c.length)];
    for (let j = 0; j < c.length; j++) {
      const step = 1e-6 * c[j];
      massActionDerivative(system!, c.map((v, k) => (k === j ? v + step : v)), 0.7, plus, fixed);
      massActionDerivative(system!, c.map((v, k) => (k === j ? v - step : v)), 0.7, minus, fixed);
      for (let i = 0; i < c.length; i++) expect(analytic[i][j]).toBeCloseTo((plus[i] - minus[i]) / (2 * step), 6);
    }
  });

  it('leaves out the rows of fixed species and keeps only structural non-zeros', () => {
    const { system } = buildRateSystem(model, { T: 298, P: 1, M: 2 });
    const fixed = Uint8Array.from([0, 1, 0, 0, 0]);
    const { pattern } = massActionJacobian(system!, fixed);
    expect(pattern.rowStart[2] - pattern.rowStart[1]).toBe(0);
    expect(pattern.columns.length).toBeLessThan(model.species.length ** 2);
  });
});
