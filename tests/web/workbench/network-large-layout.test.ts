import { describe, expect, it } from 'vitest';
import cytoscape from 'cytoscape';
import type { MechanismAnalysis } from '@api/analysis/analysis.schemas';
import saltLake from '../../../examples/salt-lake-bromine.json';
import { analyseMechanism } from '@api/chemistry/analyse';
import { generateMechanism } from '../../../examples/generate-large';
import { largeGraphLayout, type LayoutGraph } from '@web/components/workbench/network/largeGraphLayout';
import { LARGE_GRAPH_NODES, planLayout } from '@web/components/workbench/network/networkLayout';
import { drawNetwork, updateNetworkData } from '@web/components/workbench/network/networkGraph';
import { buildNetworkModel, type NetworkModel } from '@web/components/workbench/network/networkModel';
import { networkStyle, networkStyleFor } from '@web/components/workbench/network/networkStyle';

/** A tiny graph: A → s1 → B → s2 → C, and s3 with the same species as s1. */
const chain: LayoutGraph = {
  nodes: [
    { id: 's:A', kind: 'species', boxWidth: 30 },
    { id: 's:B', kind: 'species', boxWidth: 30 },
    { id: 's:C', kind: 'species', boxWidth: 30 },
    { id: 'r:1', kind: 'step' },
    { id: 'r:2', kind: 'step' },
    { id: 'r:3', kind: 'step' },
  ],
  edges: [
    { source: 's:A', target: 'r:1' },
    { source: 'r:1', target: 's:B' },
    { source: 's:B', target: 'r:2' },
    { source: 'r:2', target: 's:C' },
    { source: 's:B', target: 'r:3' },
    { source: 'r:3', target: 's:A' },
  ],
};

const distance = (a: { x: number; y: number }, b: { x: number; y: number }) => Math.hypot(a.x - b.x, a.y - b.y);

/** The generated alkyl-peroxy mechanism of `steps` steps as the panel's model. */
function generatedModel(steps: number): NetworkModel {
  return buildNetworkModel(analyseMechanism(generateMechanism(steps)), { route: null, selectedStep: null });
}

describe('largeGraphLayout', () => {
  it('places every node at a finite point, the same one each time', () => {
    const first = largeGraphLayout(chain);
    expect(Object.keys(first).sort()).toEqual(chain.nodes.map((n) => n.id).sort());
    for (const p of Object.values(first)) expect(Number.isFinite(p.x) && Number.isFinite(p.y)).toBe(true);
    expect(largeGraphLayout(chain)).toEqual(first);
  });

  it('puts a step between its species and spreads steps that share them', () => {
    const at = largeGraphLayout(chain);
    const centre = { x: (at['s:A'].x + at['s:B'].x) / 2, y: (at['s:A'].y + at['s:B'].y) / 2 };
    // s1 and s3 both join A and B: one sits at their centre, the other a spiral step beside it.
    expect(Math.min(distance(at['r:1'], centre), distance(at['r:3'], centre))).toBeLessThan(1);
    expect(distance(at['r:1'], at['r:3'])).toBeGreaterThan(10);
    expect(distance(at['r:2'], { x: (at['s:B'].x + at['s:C'].x) / 2, y: (at['s:B'].y + at['s:C'].y) / 2 })).toBeLessThan(1);
  });

  it('keeps species apart on a generated mechanism of over 500 nodes', () => {
    const model = generatedModel(500);
    expect(model.nodes.length).toBeGreaterThan(LARGE_GRAPH_NODES);
    const at = largeGraphLayout(model);
    const species = model.nodes.filter((n) => n.kind === 'species').map((n) => at[n.id]);
    let closest = Infinity;
    species.forEach((a, i) => species.slice(i + 1).forEach((b) => (closest = Math.min(closest, distance(a, b)))));
    // Boxes are collided on their half widths (at least 8 + 16 px for the shortest names), so no two species share a spot.
    expect(closest).toBeGreaterThan(10);
  });
});

describe('planLayout and drawNetwork', () => {
  const small = buildNetworkModel(saltLake as unknown as MechanismAnalysis, { route: null, selectedStep: null });

  it('leaves small graphs to fCoSE and their look as it was', () => {
    expect(planLayout(small)).toBeNull();
    expect(networkStyleFor(small.nodes.length)).toBe(networkStyle);
  });

  it('adds a large graph already in place, at the planned positions', async () => {
    const model = generatedModel(500);
    const planned = planLayout(model)!;
    const positions = await planned;
    const cy = cytoscape({ headless: true, styleEnabled: true, style: networkStyleFor(model.nodes.length) });
    await expect(drawNetwork(cy, model, planned)).resolves.toBe(true);
    expect(cy.nodes()).toHaveLength(model.nodes.length);
    expect(cy.edges()).toHaveLength(model.edges.length);
    for (const node of model.nodes.slice(0, 50)) expect(cy.getElementById(node.id).position()).toEqual(positions[node.id]);
    // Large graphs draw straight edges with the direction at their middle.
    expect(cy.edges()[0].style('curve-style')).toBe('haystack');
    cy.destroy();
  });

  it('keeps the layout of a graph seen again (the panel is rebuilt each time its tab opens)', () => {
    const model = generatedModel(500);
    const again = generatedModel(500);
    expect(planLayout(again)).toBe(planLayout(model));
    expect(planLayout(generatedModel(501))).not.toBe(planLayout(model));
  });

  it('touches only the elements whose data a new route changes', async () => {
    const analysis = saltLake as unknown as MechanismAnalysis;
    const cy = cytoscape({ headless: true, styleEnabled: true, style: networkStyle });
    await drawNetwork(cy, small, null);
    // The same analysis again (as after an edit that changed no step): nothing to restyle.
    expect(updateNetworkData(cy, buildNetworkModel(analysis, { route: null, selectedStep: null }))).toBe(0);
    const overall = buildNetworkModel(analysis, { route: analysis.overall, selectedStep: null });
    const changed = updateNetworkData(cy, overall);
    expect(changed).toBeGreaterThan(0);
    expect(changed).toBeLessThanOrEqual(overall.nodes.length + overall.edges.length);
    // B1 runs three times in the overall route of the example's golden analysis (3 B1 + B2 + B3 + B4).
    expect(cy.getElementById('r:B1').data()).toMatchObject({ inRoute: true, sigma: 3 });
    expect(updateNetworkData(cy, overall)).toBe(0);
    cy.destroy();
  });

  it('changes nothing when a newer model came while the layout ran', async () => {
    const model = generatedModel(500);
    const cy = cytoscape({ headless: true });
    await expect(drawNetwork(cy, model, planLayout(model), () => false)).resolves.toBe(false);
    expect(cy.elements()).toHaveLength(0);
    cy.destroy();
  });
});
