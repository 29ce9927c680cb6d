import { describe, expect, it } from 'vitest';
import { simulate } from '@api/chemistry/kinetics/simulate';
import type { SimulationInput } from '@api/chemistry/kinetics/simulation-types';
import { modelOf } from './model-builder';

type Options = Partial<Omit<SimulationInput, 'model'>>;

function solve(lines: string[], initial: Record<string, number>, times: number[], options: Options = {}) {
  const result = simulate({
    model: modelOf(lines, 'mol L^-1'), conditions: { T: 298, P: 1, M: 1 }, initial, tEnd: times.at(-1)!,
    output: { kind: 'times', times }, rtol: 1e-9, atol: 1e-15, ...options,
  });
  expect(result.status).toBe('done');
  const column = (key: string) => result.concentrations.map((state) => state[result.species.indexOf(key)]);
  return { result, column };
}

const times = [0.5, 1, 2, 5, 10, 20, 50];

function expectClose(actual: number[], expected: number[], tolerance = 1e-7): void {
  actual.forEach((value, k) => expect(Math.abs(value - expected[k])).toBeLessThan(tolerance * Math.max(Math.abs(expected[k]), 1e-6)));
}

describe('analytic solutions of simple rate laws', () => {
  it('first-order decay follows [A] = [A]0 exp(−kt)', () => {
    // Atkins' Physical Chemistry, integrated first-order rate law.
    const { column } = solve(['D1: A -> B @ 0.3'], { A: 2 }, times);
    expectClose(column('A'), times.map((t) => 2 * Math.exp(-0.3 * t)));
    expectClose(column('B'), times.map((t) => 2 * (1 - Math.exp(-0.3 * t))));
  });

  it('consecutive first-order steps A → B → C follow the Bateman solution, also when stiff', () => {
    // Houston, Chemical Kinetics and Reaction Dynamics, consecutive reactions:
    // [B] = [A]0 k1/(k2 − k1) (exp(−k1 t) − exp(−k2 t)).
    for (const [k1, k2] of [[0.2, 0.7], [0.2, 2000]]) {
      const { column } = solve([`C1: A -> B @ ${k1}`, `C2: B -> C @ ${k2}`], { A: 1 }, times);
      const b = times.map((t) => (k1 / (k2 - k1)) * (Math.exp(-k1 * t) - Math.exp(-k2 * t)));
      expectClose(column('B'), b, 1e-6);
      expectClose(column('C'), times.map((t, k) => 1 - Math.exp(-k1 * t) - b[k]), 1e-6);
    }
  });

  it('second-order 2 A → P follows 1/[A] = 1/[A]0 + 2kt', () => {
    // Atkins' Physical Chemistry, integrated second-order rate law, with the step rate r = k[A]²
    // consuming two A per event (d[A]/dt = −2k[A]²).
    const { column } = solve(['S1: 2 A -> P @ 0.05'], { A: 3 }, times);
    expectClose(column('A'), times.map((t) => 1 / (1 / 3 + 2 * 0.05 * t)));
    expectClose(column('P'), times.map((t) => (3 - 1 / (1 / 3 + 2 * 0.05 * t)) / 2));
  });

  it('reversible A ⇌ B relaxes with kf + kr and reaches [B]/[A] = K = kf/kr', () => {
    // Atkins' Physical Chemistry, approach to equilibrium of opposed first-order reactions.
    const [kf, kr] = [0.4, 0.1];
    const { column } = solve([`E1: A <=> B @ ${kf} | ${kr}`], { A: 1 }, [...times, 200]);
    const equilibriumA = kr / (kf + kr);
    expectClose(column('A'), [...times, 200].map((t) => equilibriumA + (1 - equilibriumA) * Math.exp(-(kf + kr) * t)));
    expect(column('B').at(-1)! / column('A').at(-1)!).toBeCloseTo(kf / kr, 8);
  });

  it('Michaelis–Menten: the steady state gives v = k2 [E]0 [S] / (KM + [S]), KM = (k−1 + k2)/k1', () => {
    // Atkins' Physical Chemistry, enzyme kinetics (Briggs–Haldane steady state). [S] is held fixed,
    // so the steady state is exact rather than an approximation.
    const [k1, kMinus1, k2, e0, s] = [1e6, 50, 10, 1e-6, 2e-5];
    const km = (kMinus1 + k2) / k1;
    const { result } = solve([`M1: E + S <=> ES @ ${k1} | ${kMinus1}`, `M2: ES -> E + P @ ${k2}`], { E: e0, S: s }, [1, 10], {
      fixed: ['S'], intermediates: ['E', 'ES'], steadyState: true, atol: 1e-18,
    });
    const steady = result.steadyState!;
    expect(steady.converged).toBe(true);
    expect(steady.concentrations.ES).toBeCloseTo((e0 * s) / (km + s), 15);
    const rateOfP = k2 * steady.concentrations.ES;
    expect(rateOfP / ((k2 * e0 * s) / (km + s))).toBeCloseTo(1, 9);
    expect(steady.concentrations.E + steady.concentrations.ES).toBeCloseTo(e0, 15);
  });
});
