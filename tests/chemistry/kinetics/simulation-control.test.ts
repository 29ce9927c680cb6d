import { describe, expect, it } from 'vitest';
import { KineticsInputError } from '@api/chemistry/kinetics/errors';
import { simulate } from '@api/chemistry/kinetics/simulate';
import type { SimulationInput } from '@api/chemistry/kinetics/simulation-types';
import { modelOf } from './model-builder';

const robertson = modelOf(['R1: A -> B @ 0.04', 'R2: 2 B -> B + C @ 3e7', 'R3: B + C -> A + C @ 1e4'], 'mol L^-1');
const base: SimulationInput = {
  model: robertson, conditions: { T: 298, P: 1, M: 1 }, initial: { A: 1 }, tEnd: 4e10, output: { kind: 'log', points: 50, first: 1e-5 },
};

describe('running a simulation', () => {
  it('stops with status "cancelled" when shouldStop says so, keeping the states reached', () => {
    let calls = 0;
    const result = simulate(base, { shouldStop: () => ++calls > 40 });
    expect(result.status).toBe('cancelled');
    expect(result.times.length).toBeGreaterThan(0);
    expect(result.times.length).toBeLessThan(50);
    expect(result.concentrations).toHaveLength(result.times.length);
  });

  it('stops at the step budget and at the time budget with a message', () => {
    const steps = simulate({ ...base, maxSteps: 10 });
    expect([steps.status, steps.message]).toEqual(['step-budget', expect.stringMatching(/step budget/)]);
    let now = 0;
    const timed = simulate({ ...base, maxWallMs: 50 }, { clock: () => (now += 10) });
    expect([timed.status, timed.message]).toEqual(['time-budget', expect.stringMatching(/50 ms/)]);
  });

  it('reports rising progress fractions that end at 1', () => {
    const fractions: number[] = [];
    const result = simulate({ ...base, output: { kind: 'linear', points: 11 }, tEnd: 100 }, { onProgress: (f) => fractions.push(f) });
    expect(result.status).toBe('done');
    expect(fractions.at(-1)).toBe(1);
    fractions.slice(1).forEach((f, k) => expect(f).toBeGreaterThan(fractions[k]));
  });

  it('returns status "invalid" with diagnostics when a rate expression is refused', () => {
    const broken = modelOf(['B1: A -> B @ 1e-3 * exp(-E / T)']);
    const result = simulate({ ...base, model: broken });
    expect(result.status).toBe('invalid');
    expect(result.diagnostics[0]).toMatchObject({ severity: 'error', code: 'rate-expression', label: 'B1' });
  });

  it.each([
    [{ initial: { Z: 1 } }, 'initial.Z', /unknown species "Z"/],
    [{ initial: { A: -1 } }, 'initial.A', /≥ 0/],
    [{ fixed: ['Q'] }, 'fixed[0]', /unknown species/],
    [{ conditions: { T: -5, P: 1 } }, 'conditions.T', /positive/],
    [{ output: { kind: 'linear', points: 1 } }, 'output.points', /2 to/],
    [{ output: { kind: 'times', times: [5, 3] } }, 'output.times[1]', /rise strictly/],
    [{ tEnd: -1 }, 'span', /after the start/],
    [{ routes: [{ name: 'r', multipliers: { R9: 1 } }] }, 'routes[0].multipliers.R9', /no step/],
  ] as [Partial<SimulationInput>, string, RegExp][])('refuses bad input %j naming the field', (change, field, message) => {
    try {
      simulate({ ...base, ...change });
      throw new Error('accepted');
    } catch (error) {
      expect(error).toBeInstanceOf(KineticsInputError);
      expect((error as KineticsInputError).field).toBe(field);
      expect((error as Error).message).toMatch(message);
    }
  });
});
