import { describe, expect, it } from 'vitest';
import { lusolve } from 'mathjs';
import { factorLu, solveLu } from '@api/chemistry/kinetics/solver/dense-lu';
import type { StiffProblem } from '@api/chemistry/kinetics/solver/problem';
import { allocateStepWork, prepareStep, rodas4Step } from '@api/chemistry/kinetics/solver/rodas4-step';
import { integrateStiff } from '@api/chemistry/kinetics/solver/integrate';

// y1' = −y1² + y2, y2' = 1 − y2 + cos(t)/2 (non-autonomous, y2 stays in [0.5, 1.5] so y1 stays
// positive and bounded): exercises f, J and ∂f/∂t.
const problem: StiffProblem = {
  size: 2,
  pattern: { size: 2, rowStart: Int32Array.from([0, 2, 3]), columns: Int32Array.from([0, 1, 1]) },
  derivative: (t, y, out) => {
    out[0] = -y[0] * y[0] + y[1];
    out[1] = 1 - y[1] + Math.cos(t) / 2;
  },
  jacobian: (_t, y, values) => {
    values[0] = -2 * y[0];
    values[1] = 1;
    values[2] = -1;
  },
  timeDerivative: (t, _y, out) => {
    out[0] = 0;
    out[1] = -Math.sin(t) / 2;
  },
};

function fixedSteps(steps: number, span = 1): Float64Array {
  const work = allocateStepWork(problem);
  let y = Float64Array.from([1, 0.5]);
  for (let k = 0; k < steps; k++) {
    prepareStep(problem, work, (k * span) / steps, y);
    rodas4Step(problem, work, (k * span) / steps, y, span / steps);
    y = Float64Array.from(work.yNew);
  }
  return y;
}

describe('RODAS4 (Hairer & Wanner, Solving ODEs II, section VI.4)', () => {
  it('converges with order 4 on a non-autonomous problem (error falls 16-fold when h halves)', () => {
    const reference = fixedSteps(4096)[0];
    const errors = [8, 16, 32, 64].map((steps) => Math.abs(fixedSteps(steps)[0] - reference));
    for (let k = 1; k < errors.length; k++) expect(Math.log2(errors[k - 1] / errors[k])).toBeGreaterThan(3.8);
  });

  it('gives dense output that matches the solution between steps to the tolerance', () => {
    const times = Array.from({ length: 401 }, (_, k) => k * 0.025);
    const loose = integrateStiff(problem, Float64Array.from([1, 0.5]), { t0: 0, tEnd: 10, outputTimes: times, rtol: 1e-4, atol: 1e-6 });
    expect(loose.status).toBe('done');
    const tight = integrateStiff(problem, Float64Array.from([1, 0.5]), { t0: 0, tEnd: 10, outputTimes: times, rtol: 1e-12, atol: 1e-14 });
    expect(loose.stats.accepted).toBeLessThan(times.length / 2);
    const worst = Math.max(...loose.states.map((state, k) => Math.abs(state[0] - tight.states[k][0])));
    expect(worst).toBeLessThan(1e-4);
  });

  it('solves linear systems like mathjs lusolve (a general-purpose reference) with pivoting', () => {
    const rows = [[0, 2, 1], [1, -1, 3], [4, 1, -2]];
    const b = [3, 5, 1];
    const matrix = Float64Array.from(rows.flat());
    const pivots = new Int32Array(3);
    expect(factorLu(matrix, 3, pivots)).toBe(true);
    const x = Float64Array.from(b);
    solveLu(matrix, 3, pivots, x);
    const expected = (lusolve(rows, b) as number[][]).map((row) => row[0]);
    x.forEach((value, i) => expect(value).toBeCloseTo(expected[i], 12));
  });

  it('reports a singular matrix instead of dividing by zero', () => {
    expect(factorLu(Float64Array.from([1, 2, 2, 4]), 2, new Int32Array(2))).toBe(false);
  });
});
