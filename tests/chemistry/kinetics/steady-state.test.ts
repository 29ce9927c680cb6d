import { describe, expect, it } from 'vitest';
import { solveSteadyState } from '@api/chemistry/kinetics/analysis/steady-state';
import { buildRateSystem } from '@api/chemistry/kinetics/build-system';
import { modelOf } from './model-builder';

function systemOf(lines: string[]) {
  const { system } = buildRateSystem(modelOf(lines, 'mol L^-1'), { T: 298, P: 1, M: 1 });
  return system!;
}

describe('the steady state by damped Newton', () => {
  it('handles the singular Jacobian of a closed A ⇌ B ⇌ C system through its conservation law', () => {
    // Equilibrium of consecutive opposed reactions: [B]/[A] = k1/k−1, [C]/[B] = k2/k−2 (Atkins'
    // Physical Chemistry, equilibrium constant from rate constants); the total 1.5 stays.
    const system = systemOf(['E1: A <=> B @ 3 | 1', 'E2: B <=> C @ 0.5 | 2']);
    const steady = solveSteadyState(system, {
      start: Float64Array.from([1.5, 0, 0]), fixed: new Uint8Array(3), light: 1, rtol: 1e-12, atol: 1e-15,
    });
    expect(steady.converged).toBe(true);
    expect(steady.conservationLaws).toBe(1);
    const [a, b, c] = steady.concentrations;
    expect(b / a).toBeCloseTo(3, 10);
    expect(c / b).toBeCloseTo(0.25, 10);
    expect(a + b + c).toBeCloseTo(1.5, 12);
  });

  it('finds a nonlinear steady state 2 A ⇌ A2 from a poor start: K[A]² = [A2] with A + 2 A2 kept', () => {
    const system = systemOf(['D1: 2 A <=> A2 @ 10 | 0.1']);
    const steady = solveSteadyState(system, {
      start: Float64Array.from([0, 0.5]), fixed: new Uint8Array(2), light: 1, rtol: 1e-12, atol: 1e-15,
    });
    expect(steady.converged).toBe(true);
    const [a, dimer] = steady.concentrations;
    // Quadratic: 2K a² + a − 1 = 0 with K = 100 and total A = 1: a = (−1 + √(1 + 8K)) / (4K).
    expect(a).toBeCloseTo((-1 + Math.sqrt(801)) / 400, 12);
    expect(dimer / a ** 2).toBeCloseTo(100, 8);
  });

  it('accepts a point whose rates are negligible over the horizon even where the Jacobian is singular', () => {
    // With its source A exhausted, B no longer moves: any B is steady, and J has a zero row.
    const system = systemOf(['G1: A -> B @ 1']);
    const options = { start: Float64Array.from([0, 0.3]), fixed: Uint8Array.from([1, 0]), light: 1, rtol: 1e-9, atol: 1e-12 };
    expect(solveSteadyState(system, options).message).toMatch(/singular/);
    const steady = solveSteadyState(system, { ...options, horizon: 1e9 });
    expect([steady.converged, steady.concentrations[1]]).toEqual([true, 0.3]);
  });

  it('says so when there is no steady state to find (B keeps growing from a fixed source A)', () => {
    const system = systemOf(['G1: A -> B @ 1']);
    const steady = solveSteadyState(system, { start: Float64Array.from([1, 0]), fixed: Uint8Array.from([1, 0]), light: 1, rtol: 1e-9, atol: 1e-12 });
    expect(steady.converged).toBe(false);
    expect(steady.message).toMatch(/singular/);
    expect(steady.residual).toBe(1);
  });
});

describe('the steady state of a simulation with no intermediates', () => {
  it('solves the whole system (A ⇌ B reaches [B]/[A] = kf/kr = 6), not the end of a short run', async () => {
    const { simulate } = await import('@api/chemistry/kinetics/simulate');
    // The run stops long before equilibrium (kf + kr = 0.35 s⁻¹, tEnd = 0.1 s); an empty list of
    // intermediates, as a mechanism with none gives, must not hold every species.
    const run = simulate({
      model: modelOf(['I: HONO <=> HNO2 @ 0.3 | 0.05']), conditions: { T: 298, P: 1 }, initial: { HONO: 1e12 },
      tEnd: 0.1, output: { kind: 'linear', points: 5 }, intermediates: [], steadyState: true,
    });
    const steady = run.steadyState!;
    expect(steady.converged).toBe(true);
    expect(steady.solvedFor).toEqual(['HONO', 'HNO2']);
    expect(steady.concentrations.HNO2 / steady.concentrations.HONO).toBeCloseTo(6, 8);
    expect(steady.concentrations.HNO2 + steady.concentrations.HONO).toBeCloseTo(1e12, -2);
  });
});

describe('a steady state that does not exist', () => {
  it('says which species keep moving and that the values are not a steady state (N2O5 held, its products pile up)', async () => {
    const { simulate } = await import('@api/chemistry/kinetics/simulate');
    const run = simulate({
      model: modelOf(['F1: N2O5 -> NO2 + NO3 @ 1e-3']), conditions: { T: 298, P: 1 }, initial: { N2O5: 1e15 }, fixed: ['N2O5'],
      tEnd: 10, output: { kind: 'linear', points: 5 }, steadyState: true,
    });
    const steady = run.steadyState!;
    expect(steady.converged).toBe(false);
    expect(steady.message).toMatch(/^The rate equations do not pin every species down here/);
    expect(steady.message).toContain('NO2 is still rising');
    expect(steady.message).toContain('the values shown are the last estimate, not a steady state');
  });
});
