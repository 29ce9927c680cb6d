import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyseMechanism } from '@api/chemistry/analyse';
import { kineticsFromAnalysis } from '@api/chemistry/kinetics/from-analysis';
import { buildRateSystem } from '@api/chemistry/kinetics/build-system';
import { simulate } from '@api/chemistry/kinetics/simulate';

const chainText = readFileSync('examples/hydrogen-bromine-chain.steps', 'utf8');

function setupOf(text: string) {
  return kineticsFromAnalysis(analyseMechanism(text), text);
}

describe('kinetics from a mechanism analysis', () => {
  it('takes species without hν and M, step ids as labels, classes, conditions and composition', () => {
    const setup = setupOf(chainText);
    expect(setup.diagnostics).toEqual([]);
    expect(setup.model!.species).toEqual(expect.arrayContaining(['Br2', 'Br•', 'H2', 'HBr', 'H•']));
    expect(setup.model!.species).not.toContain('M');
    expect(setup.model!.steps.map((step) => [step.label, step.thirdBody, step.stepClass])).toEqual([
      ['HB1', true, 'initiation'], ['HB2', false, 'propagation'], ['HB3', false, 'propagation'], ['HB4', false, 'propagation'], ['HB5', true, 'termination'],
    ]);
    expect(setup.conditions).toEqual({ T: 600, P: 1, M: null });
    expect(setup.composition[setup.model!.species.indexOf('HBr')]).toEqual({ H: 1, Br: 1 });
  });

  it('follows the Bodenstein–Lind rate law of the H2 + Br2 chain at the radicals’ steady state', () => {
    // Atkins' Physical Chemistry (chain reactions, the hydrogen–bromine reaction): with Br• and H•
    // at steady state, d[HBr]/dt = 2 k2 √(k1/k5) [H2][Br2]^½ / (1 + k4[HBr] / (k3[Br2])). At 600 K
    // and 1 atm the Br• pool settles within about a minute (τ = 1/(2√(k1 k5 [M]² [Br2])) ≈ 33 s).
    const setup = setupOf(chainText);
    const run = simulate({
      model: setup.model!, conditions: setup.conditions, initial: { H2: 1e17, Br2: 1e17 }, tEnd: 1000,
      output: { kind: 'times', times: [300, 600, 1000] }, composition: setup.composition, rtol: 1e-9,
    });
    expect(run.status).toBe('done');
    const T = 600;
    const [k1, k2, k3, k4, k5] = [1.0e-10 * Math.exp(-22800 / T), 8.3e-11 * Math.exp(-9100 / T), 1.5e-10, 6.0e-11 * Math.exp(-500 / T), 5.0e-33];
    const at = (k: number, key: string) => run.concentrations[k][run.species.indexOf(key)];
    for (let k = 0; k < run.times.length; k++) {
      const [h2, br2, hbr] = [at(k, 'H2'), at(k, 'Br2'), at(k, 'HBr')];
      const law = (2 * k2 * Math.sqrt(k1 / k5) * h2 * Math.sqrt(br2)) / (1 + (k4 * hbr) / (k3 * br2));
      const i = run.species.indexOf('HBr');
      expect((run.production[k][i] - run.loss[k][i]) / law).toBeCloseTo(1, 4);
    }
    expect(run.conservation!.maxRelativeDrift).toBeLessThan(1e-9);
  });

  it('gives a chain length for the HBr-forming route (propagation over initiation) well above 1', () => {
    const setup = setupOf(chainText);
    const run = simulate({
      model: setup.model!, conditions: setup.conditions, initial: { H2: 1e17, Br2: 1e17 }, tEnd: 1000,
      output: { kind: 'times', times: [1000] }, routes: setup.routes, rtol: 1e-9,
    });
    const hbr = run.routes.find((route) => /Br2 \+ H2 → 2 HBr/.test(route.name));
    // Chain length = k2[Br•][H2] (net of HB4) / (k1[Br2][M]): of the order of 100 here.
    expect(hbr!.chainLength[0]).toBeGreaterThan(50);
    // The null cycles (HB1 + HB5, HB2 + HB4) carry no chain: they have no chain length.
    const nullCycles = run.routes.filter((route) => /null cycle/.test(route.name));
    expect(nullCycles.length).toBeGreaterThan(0);
    for (const route of nullCycles) expect(route.chainLength).toEqual([null]);
  });

  it('marks opaque names as of unknown composition (the enzyme example)', () => {
    const text = readFileSync('examples/enzyme-isomerase.steps', 'utf8');
    const setup = setupOf(text);
    expect(setup.model!.unit).toBe('mol L^-1');
    expect(setup.composition[setup.model!.species.indexOf('Enz')]).toBeNull();
    expect(setup.model!.steps[0].reverse).toBe('5.0e2');
  });

  it('reports each step without a rate at its line, and gives no model', () => {
    const setup = setupOf('A1: O3 + hv -> O2 + O(1D) @ 1e-5\nA2: O(1D) + M -> O(3P) + M\n');
    expect(setup.model).toBeNull();
    expect(setup.diagnostics).toEqual([expect.objectContaining({ code: 'rate-missing', label: 'A2', line: 2 })]);
  });

  it('points a refused rate expression at its exact column in the source line', () => {
    const text = 'X1: NO + O3 -> NO2 + O2 @ 3.0e-12 * exp(-1500 / Temp)\n';
    const setup = setupOf(text);
    const { diagnostics } = buildRateSystem(setup.model!, setup.conditions);
    expect(diagnostics[0]).toMatchObject({ code: 'rate-expression', line: 1, column: text.indexOf('Temp') + 1 });
  });
});
