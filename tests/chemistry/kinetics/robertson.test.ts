import { describe, expect, it } from 'vitest';
import { simulate } from '@api/chemistry/kinetics/simulate';
import { modelOf } from './model-builder';

// The Robertson stiff problem: A → B (0.04), 2 B → B + C (3e7), B + C → A + C (1e4), y0 = (1, 0, 0).
const robertson = modelOf(['R1: A -> B @ 0.04', 'R2: 2 B -> B + C @ 3e7', 'R3: B + C -> A + C @ 1e4'], 'mol L^-1');
const decades = [40, 4e2, 4e3, 4e4, 4e5, 4e6, 4e7, 4e8, 4e9, 4e10];

function run(times: number[], rtol: number, atol: number) {
  const tEnd = times.at(-1)!;
  const result = simulate({
    model: robertson, conditions: { T: 298, P: 1, M: 1 }, initial: { A: 1 }, tEnd,
    output: { kind: 'times', times }, rtol, atol, maxSteps: 400_000,
  });
  expect(result.status).toBe('done');
  return result;
}

function expectRelative(actual: number[], expected: number[], tolerance: number): void {
  actual.forEach((value, i) => expect(Math.abs(value - expected[i]) / Math.abs(expected[i])).toBeLessThan(tolerance));
}

describe('the Robertson problem', () => {
  it('matches the reference solution of the Test Set for IVP Solvers at t = 1e11 to 1e-6 relative', () => {
    // Mazzia & Magherini, Test Set for IVP Solvers (Univ. Bari), problem ROBER, reference solution at t = 1e11.
    const reference = [0.2083340149701255e-7, 0.8333360770334713e-13, 0.999999979166505];
    expectRelative(run([1e11], 1e-10, 1e-22).concentrations[0], reference, 1e-6);
  });

  it('matches the reference values at t = 40 to 1e-6 relative', () => {
    // From memory (Hairer & Wanner's ROBER experiments); the same digits come out of a Radau run at
    // rtol 1e-12 of SciPy 1.17 solve_ivp: 0.715827068719909, 9.18553476457835e-6, 0.284163745745328.
    const reference = [0.7158270687193, 0.9185534764557e-5, 0.2841637457699];
    expectRelative(run([40], 1e-8, 1e-20).concentrations[0], reference, 1e-6);
  });

  it('agrees to 1e-6 relative with a very tight run of its own at every decade to 4e10 (self-consistency)', () => {
    // Self-consistency check, not an outside reference: rtol 1e-8 against rtol 1e-11.
    const tight = run(decades, 1e-11, 1e-24).concentrations;
    const ordinary = run(decades, 1e-8, 1e-20).concentrations;
    ordinary.forEach((state, k) => expectRelative(state, tight[k], 1e-6));
  });

  it('keeps A + B + C = 1 (the problem conserves the total) over the whole run', () => {
    const { concentrations } = run(decades, 1e-6, 1e-14);
    for (const state of concentrations) expect(Math.abs(state[0] + state[1] + state[2] - 1)).toBeLessThan(1e-12);
  });
});
