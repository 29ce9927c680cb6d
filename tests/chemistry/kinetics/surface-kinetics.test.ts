import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyseMechanism } from '@api/chemistry/analyse';
import { kineticsFromAnalysis } from '@api/chemistry/kinetics/from-analysis';
import { simulate } from '@api/chemistry/kinetics/simulate';

const text = readFileSync('examples/co-oxidation-surface.steps', 'utf8');

describe('surface kinetics in mol m⁻²', () => {
  it('reaches the Langmuir coverage θ = Kc / (1 + Kc) of CO without oxygen, keeping the sites', () => {
    // Atkins' Physical Chemistry, the Langmuir isotherm: with adsorption k_a[CO][*] and desorption
    // k_d[CO*] balanced, θ = K[CO] / (1 + K[CO]) with K = k_a / k_d. Here k_d = 1e13 exp(−17000/450).
    const setup = kineticsFromAnalysis(analyseMechanism(text), text);
    expect(setup.model!.unit).toBe('mol m^-2');
    const [sites, co] = [2.5e-5, 1e-11];
    const run = simulate({
      model: setup.model!, conditions: setup.conditions, initial: { '*': sites, CO: co }, fixed: ['CO'], tEnd: 2e4,
      output: { kind: 'log', points: 20, first: 1 }, intermediates: setup.intermediates, steadyState: true, rtol: 1e-8,
    });
    expect(run.status).toBe('done');
    const kc = (1.0e8 * co) / (1.0e13 * Math.exp(-17000 / 450));
    const theta = kc / (1 + kc);
    const last = run.concentrations.at(-1)!;
    expect(last[run.species.indexOf('CO*')] / sites).toBeCloseTo(theta, 6);
    expect(run.steadyState!.concentrations['CO*'] / sites).toBeCloseTo(theta, 9);
    expect(run.steadyState!.concentrations['*'] + run.steadyState!.concentrations['CO*']).toBeCloseTo(sites, 15);
  });
});
