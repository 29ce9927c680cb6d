import { describe, expect, it } from 'vitest';
import type { MechanismAnalysis } from '@api/analysis/analysis.schemas';
import saltLake from '../../../examples/salt-lake-bromine.json';
import iodide from '../../../examples/iodide-peroxide.json';
import { buildNetworkModel, type EdgeData, type SpeciesNodeData, type StepNodeData } from '@web/components/workbench/network/networkModel';
import { WIDTH } from '@web/components/workbench/network/networkFlux';
import { routeOptionLabel } from '@web/components/workbench/network/networkRoutes';
import { networkSummary } from '@web/components/workbench/network/networkSummary';

const analysis = saltLake as unknown as MechanismAnalysis;
const speciesNodes = (model: ReturnType<typeof buildNetworkModel>) => model.nodes.filter((n): n is SpeciesNodeData => n.kind === 'species');
const stepNode = (model: ReturnType<typeof buildNetworkModel>, step: string) => model.nodes.find((n): n is StepNodeData => n.kind === 'step' && n.step === step)!;
const edge = (model: ReturnType<typeof buildNetworkModel>, id: string) => model.edges.find((e) => e.id === id) as EdgeData;

describe('buildNetworkModel on the salt-lake bromine cycle', () => {
  const plain = buildNetworkModel(analysis, { route: null, selectedStep: null });

  it('draws every species but the photon and M, and one node per step', () => {
    expect(speciesNodes(plain).map((n) => n.key).sort()).toEqual(['Br2', 'Br•', 'BrO•', 'O(3P)', 'O2', 'O3'].sort());
    expect(plain.nodes.filter((n) => n.kind === 'step')).toHaveLength(5);
  });

  it('runs arrows reactant → step → product, labelled with coefficients other than 1', () => {
    // B2: 2 BrO• → 2 Br• + O2
    expect(edge(plain, 'e:B2:in:BrO•')).toMatchObject({ source: 's:BrO•', target: 'r:B2', label: '2' });
    expect(edge(plain, 'e:B2:out:Br•')).toMatchObject({ source: 'r:B2', target: 's:Br•', label: '2' });
    expect(edge(plain, 'e:B2:out:O2').label).toBe('');
    // B1…B5 have 4 + 3 + 3 + 3 + 2 drawn terms (hν and M are left out).
    expect(plain.edges).toHaveLength(15);
  });

  it('names roles by a mark and a word, not by colour alone', () => {
    const br = speciesNodes(plain).find((n) => n.key === 'Br•')!;
    expect(br.role).toBe('catalyst');
    expect(br.label).toContain('catalyst');
    expect(br.label).toContain('↻');
    expect(speciesNodes(plain).find((n) => n.key === 'BrO•')!.label).toBe('◌ BrO•');
    expect(speciesNodes(plain).find((n) => n.key === 'O3')!.label).toBe('O3');
  });

  it('marks photolysis and third-body steps on the step node instead of drawing hν and M', () => {
    expect(stepNode(plain, 'B3').label).toBe('B3 hν');
    expect(stepNode(plain, 'B4').label).toBe('B4 M');
  });

  it('fades nothing when no route is chosen', () => {
    expect([...plain.nodes, ...plain.edges].some((e) => e.dimmed)).toBe(false);
    expect(plain.edges.every((e) => e.width === WIDTH.plain)).toBe(true);
  });
});

describe('highlighting a route', () => {
  // Route 1 is 2 × B1 + B2: 2 O3 → 3 O2, with Br• and BrO• formed and consumed again (the
  // bromine ozone-loss cycle; Wayne, Chemistry of Atmospheres, halogen chemistry).
  const overall = buildNetworkModel(analysis, { route: 0, selectedStep: 'B2' });

  it('writes the stoichiometric numbers on the route steps and fades the others', () => {
    expect(stepNode(overall, 'B1')).toMatchObject({ sigma: 2, inRoute: true, label: 'B1 ×2', dimmed: false });
    expect(stepNode(overall, 'B2')).toMatchObject({ sigma: 1, label: 'B2 ×1' });
    expect(stepNode(overall, 'B3')).toMatchObject({ sigma: null, inRoute: false, dimmed: true });
  });

  it('emphasises the catalytic cycle Br• → B1 → BrO• → B2 → Br• and not the net reactants', () => {
    const cycle = overall.edges.filter((e) => e.inCycle).map((e) => e.id).sort();
    expect(cycle).toEqual(['e:B1:in:Br•', 'e:B1:out:BrO•', 'e:B2:in:BrO•', 'e:B2:out:Br•'].sort());
    expect(edge(overall, 'e:B1:in:O3')).toMatchObject({ inRoute: true, inCycle: false, width: WIDTH.route });
    expect(edge(overall, 'e:B1:in:Br•').width).toBe(WIDTH.cycle);
    expect(speciesNodes(overall).filter((n) => n.inCycle).map((n) => n.key).sort()).toEqual(['Br•', 'BrO•'].sort());
  });

  it('highlights the selected step', () => {
    expect(stepNode(overall, 'B2').selected).toBe(true);
    expect(stepNode(overall, 'B1').selected).toBe(false);
  });

  it('treats a null cycle as all cycle: every species returns', () => {
    const nullCycle = buildNetworkModel(analysis, { route: 1, selectedStep: null });
    expect(speciesNodes(nullCycle).filter((n) => n.inCycle).map((n) => n.key).sort()).toEqual(['Br•', 'BrO•', 'O(3P)', 'O2', 'O3'].sort());
    expect(routeOptionLabel(analysis.routes[1], 1, analysis.overall)).toBe('Route 2 · null cycle');
    expect(routeOptionLabel(analysis.routes[2], 2, analysis.overall)).toBe('Overall · 2 O3 → 3 O2');
  });

  it('runs the overall route (3 B1 + B2 + B3 + B4) through Br•, BrO• and O(3P), O3 and O2 being net', () => {
    const model = buildNetworkModel(analysis, { route: analysis.overall, selectedStep: null });
    expect(speciesNodes(model).filter((n) => n.inCycle).map((n) => n.key).sort()).toEqual(['Br•', 'BrO•', 'O(3P)'].sort());
    expect(stepNode(model, 'B3').label).toBe('B3 hν ×1');
    expect(stepNode(model, 'B5').dimmed).toBe(true);
  });

  it('finds the iodide cycle of the peroxide decomposition', () => {
    const model = buildNetworkModel(iodide as unknown as MechanismAnalysis, { route: (iodide as unknown as MechanismAnalysis).overall, selectedStep: null });
    // 2 H2O2 → 2 H2O + O2 through I⁻ / IO⁻ (textbook iodide catalysis; Atkins, catalysis chapter).
    expect(speciesNodes(model).filter((n) => n.inCycle).map((n) => n.key).sort()).toEqual(['IO^-', 'I^-'].sort());
  });
});

describe('edge widths from simulated fluxes', () => {
  const fluxes = { byStep: new Map([['B1', 1e6], ['B2', 1e3], ['B3', 1e9], ['B4', 0], ['B5', 1]]), max: 1e9 };
  const model = buildNetworkModel(analysis, { route: null, selectedStep: null, fluxes });

  it('carries coefficient × step flux on each edge', () => {
    expect(edge(model, 'e:B2:in:BrO•').flux).toBe(2e3);
    expect(edge(model, 'e:B3:in:BrO•').flux).toBe(1e9);
  });

  it('widens edges with the logarithm of the flux, from the thinnest to the widest', () => {
    expect(edge(model, 'e:B3:in:BrO•').width).toBe(WIDTH.fluxMax);
    expect(edge(model, 'e:B4:in:O2').width).toBe(WIDTH.fluxMin);
    const b1 = edge(model, 'e:B1:in:O3').width;
    // 1e6 of 1e9 is three of six decades down: half way.
    expect(b1).toBeCloseTo((WIDTH.fluxMin + WIDTH.fluxMax) / 2, 2);
    expect(edge(model, 'e:B2:out:O2').width).toBeLessThan(b1);
  });
});

describe('networkSummary', () => {
  it('says in words which route steps, cycle, catalysts and intermediates the picture shows', () => {
    const model = buildNetworkModel(analysis, { route: 0, selectedStep: null });
    expect(networkSummary(model)).toEqual([
      'Route steps: B1 ×2, B2 ×1.',
      'Cycle through: Br•, BrO•.',
      'Catalysts (↻): Br•.',
      'Intermediates (◌): BrO•, O(3P).',
    ]);
    expect(networkSummary(buildNetworkModel(analysis, { route: null, selectedStep: null }))[0]).toBe('Catalysts (↻): Br•.');
  });
});
