import type { Core, CytoscapeOptions, LayoutOptions } from 'cytoscape';
import { largeGraphLayout, type LayoutGraph, type Positions } from './largeGraphLayout';
import type { NetworkModel } from './networkModel';

/** Past this many nodes the graph takes the fast path: a force layout of its own and a lighter renderer. */
export const LARGE_GRAPH_NODES = 500;

type CytoscapeFactory = typeof import('cytoscape');
let core: Promise<CytoscapeFactory> | null = null;
let withFcose: Promise<CytoscapeFactory> | null = null;

/**
 * cytoscape, fetched on first use so that it stays out of the first screen's bundle, with the fCoSE
 * layout when `fcose` is asked for (small graphs): large graphs bring their own layout and skip it.
 */
export function loadCytoscape(fcose = true): Promise<CytoscapeFactory> {
  core ??= import('cytoscape').then((module) => module.default);
  if (!fcose) return core;
  withFcose ??= Promise.all([core, import('cytoscape-fcose')]).then(([cytoscape, extension]) => {
    cytoscape.use(extension.default);
    return cytoscape;
  });
  return withFcose;
}

/** fCoSE (spectral start, then force-directed refinement) with room for the labels: the small graphs' look. */
export function layoutOptions(): LayoutOptions {
  return {
    name: 'fcose',
    quality: 'default',
    randomize: true,
    animate: false,
    fit: true,
    padding: 24,
    nodeDimensionsIncludeLabels: true,
    idealEdgeLength: () => 60,
    nodeRepulsion: () => 6500,
    numIter: 2500,
    packComponents: true,
  } as LayoutOptions;
}

/** Only what the layout reads, so that little is copied to the worker. */
function layoutGraphOf(model: NetworkModel): LayoutGraph {
  return {
    nodes: model.nodes.map((node) => ({ id: node.id, kind: node.kind, boxWidth: 'boxWidth' in node ? node.boxWidth : undefined })),
    edges: model.edges.map((edge) => ({ source: edge.source, target: edge.target })),
  };
}

/** The large-graph layout in a Web Worker; on the main thread where workers are missing or refused. */
function layoutInWorker(graph: LayoutGraph): Promise<Positions> {
  if (typeof Worker === 'undefined') return Promise.resolve(largeGraphLayout(graph));
  return new Promise((resolve) => {
    const worker = new Worker(new URL('./largeGraphLayout.worker.ts', import.meta.url), { type: 'module' });
    const finish = (positions: Positions) => {
      worker.terminate();
      resolve(positions);
    };
    worker.addEventListener('message', (event: MessageEvent<Positions>) => finish(event.data));
    worker.addEventListener('error', () => finish(largeGraphLayout(graph)));
    worker.postMessage(graph);
  });
}

/** Layouts of the last few large graphs: the panel is built anew each time its tab opens. */
const recentLayouts = new Map<string, Promise<Positions>>();
const RECENT_LAYOUTS = 3;

/**
 * Starts a large graph's layout at once (null for a small graph, which fCoSE lays out in place).
 * The layout is deterministic, so a graph of the same nodes and arrows reuses the last positions.
 */
export function planLayout(model: NetworkModel): Promise<Positions> | null {
  if (model.nodes.length <= LARGE_GRAPH_NODES) return null;
  const graph = layoutGraphOf(model);
  const key = JSON.stringify(graph);
  const planned = recentLayouts.get(key) ?? layoutInWorker(graph);
  recentLayouts.delete(key);
  recentLayouts.set(key, planned);
  if (recentLayouts.size > RECENT_LAYOUTS) recentLayouts.delete(recentLayouts.keys().next().value!);
  return planned;
}

/** Renderer settings: the fast path draws a texture while panning and hides edges meanwhile. */
export function rendererOptions(nodeCount: number): Partial<CytoscapeOptions> {
  const large = nodeCount > LARGE_GRAPH_NODES;
  return {
    minZoom: 0.05,
    maxZoom: 4,
    textureOnViewport: large,
    hideEdgesOnViewport: large,
    pixelRatio: large ? 1 : 'auto',
  } as Partial<CytoscapeOptions>;
}

/** Runs fCoSE (fetched first if need be) and resolves when it has stopped (without animation it stops at once). */
export async function runFcose(cy: Core): Promise<void> {
  await loadCytoscape(true);
  return new Promise((resolve) => {
    const layout = cy.layout(layoutOptions());
    layout.one('layoutstop', () => resolve());
    layout.run();
  });
}
