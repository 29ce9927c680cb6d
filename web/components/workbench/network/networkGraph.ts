import type { Core, ElementDefinition } from 'cytoscape';
import type { Positions } from './largeGraphLayout';
import { LARGE_GRAPH_NODES, loadCytoscape, planLayout, rendererOptions, runFcose } from './networkLayout';
import type { NetworkModel } from './networkModel';
import { networkStyleFor } from './networkStyle';
import { placeStepLabels } from './networkStepLabels';

/** The model as cytoscape elements, in one array so that they are added in one batch, placed when positions are known. */
export function elementsOf(model: NetworkModel, positions: Positions | null = null): ElementDefinition[] {
  return [
    ...model.nodes.map((data) => ({ group: 'nodes' as const, data: { ...data }, position: positions?.[data.id] })),
    ...model.edges.map((data) => ({ group: 'edges' as const, data: { ...data } })),
  ];
}

/** An empty graph in `container` with the style and renderer settings for a graph of `nodeCount` nodes. */
export async function createNetworkCore(container: HTMLElement, nodeCount: number): Promise<Core> {
  const cytoscape = await loadCytoscape(nodeCount <= LARGE_GRAPH_NODES);
  return cytoscape({ container, style: networkStyleFor(nodeCount), elements: [], ...rendererOptions(nodeCount) });
}

/**
 * Replaces the graph's elements with the model's, lays them out and fits them to the box. A large
 * graph's positions (`planned`, from a worker) are awaited first and the elements added already in
 * place: elements added before their positions would be drawn once, all piled at one point, and
 * styled and measured twice. Returns false, having changed nothing, when `isCurrent` says that a
 * newer model has come meanwhile.
 */
export async function drawNetwork(cy: Core, model: NetworkModel, planned = planLayout(model), isCurrent = () => true): Promise<boolean> {
  const positions = planned ? await planned : null;
  if (!isCurrent()) return false;
  cy.batch(() => {
    cy.elements().remove();
    cy.add(elementsOf(model, positions));
  });
  if (!positions) await runFcose(cy);
  placeStepLabels(cy);
  // The tab may have changed size while the layout ran: fit to the box as it is now.
  cy.resize();
  cy.fit(undefined, 24);
  return true;
}

/**
 * Gives the elements the model's data (a new route, selection or fluxes; the structure is the same)
 * and returns how many changed. Only elements whose data differ are touched: each touched element is
 * styled and drawn again, and a new analysis of an unchanged mechanism would otherwise restyle
 * thousands of them.
 */
export function updateNetworkData(cy: Core, model: NetworkModel): number {
  let changed = 0;
  cy.batch(() => {
    for (const data of [...model.nodes, ...model.edges]) {
      const element = cy.getElementById(data.id);
      if (Object.entries(data).every(([key, value]) => element.data(key) === value)) continue;
      element.data({ ...data });
      changed += 1;
    }
  });
  // A step that joins or leaves the route changes size and font: its label is placed again.
  if (changed > 0) placeStepLabels(cy);
  return changed;
}
