import { describe, expect, it } from 'vitest';
import { simulate } from '@api/chemistry/kinetics/simulate';
import { modelOf } from './model-builder';

// A straight chain with fixed initiator I and substrate S (Houston, Chemical Kinetics and Reaction
// Dynamics, chain reactions; steady-state treatment): I → 2 R (ki), R + S → R + P (kp), 2 R → Q (kt).
// Steady state: 2 ki[I] = 2 kt[R]², so [R] = √(ki[I]/kt); chain length = kp[R][S] / (ki[I]).
const [ki, kp, kt, I, S] = [1e-3, 2e-12, 1e-11, 1e10, 5e14];
const chain = modelOf([`Init: I -> 2 R @ ${ki}`, `Prop: R + S -> R + P @ ${kp}`, `Term: 2 R -> Q @ ${kt}`]);
chain.steps[0].stepClass = 'initiation';
chain.steps[1].stepClass = 'propagation';
chain.steps[2].stepClass = 'termination';

describe('route rates, chain length and turnover frequency', () => {
  const result = simulate({
    model: chain, conditions: { T: 298, P: 1 }, initial: { I, S }, fixed: ['I', 'S'], tEnd: 1e4, output: { kind: 'log', points: 30 },
    routes: [{ name: 'chain', multipliers: { Prop: 1 } }, { name: 'radical balance', multipliers: { Init: 1, Term: 1 } }],
    intermediates: ['R'], steadyState: true, rtol: 1e-9,
  });
  const radical = Math.sqrt((ki * I) / kt);

  it('reaches the steady state [R] = √(ki[I]/kt) in the run and by Newton', () => {
    expect(result.status).toBe('done');
    expect(result.concentrations.at(-1)![result.species.indexOf('R')] / radical).toBeCloseTo(1, 7);
    expect(result.steadyState!.converged).toBe(true);
    expect(result.steadyState!.solvedFor).toEqual(['R']);
    expect(result.steadyState!.concentrations.R / radical).toBeCloseTo(1, 9);
  });

  it('fits the step rates exactly with the route basis at steady state (least squares, zero residual)', () => {
    expect(result.routeResidual!.at(-1)!).toBeLessThan(1e-7);
    expect(result.routes[0].rates.at(-1)! / (kp * radical * S)).toBeCloseTo(1, 6);
    expect(result.routes[1].rates.at(-1)! / (ki * I)).toBeCloseTo(1, 6);
    // Early on the radical pool is still filling, so the step rates are not yet a route combination.
    expect(result.routeResidual![1]).toBeGreaterThan(1e-3);
  });

  it('leaves a route that is a sum of earlier ones out of the fit and names it', () => {
    const run = simulate({
      model: chain, conditions: { T: 298, P: 1 }, initial: { I, S }, fixed: ['I', 'S'], tEnd: 1e4, output: { kind: 'linear', points: 3 },
      routes: [{ name: 'chain', multipliers: { Prop: 1 } }, { name: 'balance', multipliers: { Init: 1, Term: 1 } }, { name: 'both', multipliers: { Init: 1, Prop: 2, Term: 1 } }],
    });
    expect(run.routes.map((route) => route.name)).toEqual(['chain', 'balance']);
    expect(run.routesLeftOut).toEqual(['both']);
    expect(run.diagnostics).toEqual([expect.objectContaining({ severity: 'info', code: 'routes-dependent' })]);
  });

  it('gives the chain length kp[R][S]/(ki[I])', () => {
    const expected = (kp * radical * S) / (ki * I);
    expect(result.routes[0].chainLength.at(-1)! / expected).toBeCloseTo(1, 6);
  });

  it('splits each species budget by step: P is formed only by Prop, R lost only by Term', () => {
    const last = result.times.length - 1;
    const byKey = (species: string) => result.byStep.filter((flux) => flux.species === species).map((flux) => flux.step);
    expect(byKey('P')).toEqual(['Prop']);
    expect(byKey('R')).toEqual(['Init', 'Term']);
    const r = result.species.indexOf('R');
    expect(result.production[last][r] / result.loss[last][r]).toBeCloseTo(1, 6);
  });

  it('gives the turnover frequency of a catalytic cycle: k1k2[O3][O] / (k1[O3] + k2[O]) per Cl atom', () => {
    // Cl + O3 → ClO + O2, ClO + O → Cl + O2 with O3 and O held: the steady state of the two Cl forms
    // gives a route rate per total chlorine of k1k2[O3][O]/(k1[O3] + k2[O]) (textbook steady state).
    const [k1, k2, o3, o] = [1.2e-11, 3.7e-11, 3e12, 1e8];
    const cycle = modelOf([`C1: Cl + O3 -> ClO + O2 @ ${k1}`, `C2: ClO + O -> Cl + O2 @ ${k2}`]);
    const elements: Record<string, Record<string, number>> = { Cl: { Cl: 1 }, O3: { O: 3 }, ClO: { Cl: 1, O: 1 }, O2: { O: 2 }, O: { O: 1 } };
    const composition = cycle.species.map((key) => elements[key]);
    const run = simulate({
      model: cycle, conditions: { T: 298, P: 1 }, initial: { Cl: 1e5, O3: o3, O: o }, fixed: ['O3', 'O'], tEnd: 100,
      output: { kind: 'linear', points: 11 }, routes: [{ name: 'ozone loss', multipliers: { C1: 1, C2: 1 } }],
      catalysts: [{ species: 'Cl' }], intermediates: ['Cl', 'ClO'], composition, rtol: 1e-9,
    });
    const turnover = run.routes[0].turnover[0];
    expect(turnover.family).toEqual(['Cl', 'ClO']);
    expect(turnover.values.at(-1)! / ((k1 * k2 * o3 * o) / (k1 * o3 + k2 * o))).toBeCloseTo(1, 6);
  });
});
