import type { Core, CytoscapeOptions, LayoutOptions } from 'cytoscape';

/** Past this many nodes the graph takes the fast path: a draft layout and a lighter renderer. */
export const LARGE_GRAPH_NODES = 500;

type CytoscapeFactory = typeof import('cytoscape');
let loading: Promise<CytoscapeFactory> | null = null;

/** cytoscape and the fCoSE layout, fetched on first use so they stay out of the first screen's bundle. */
export function loadCytoscape(): Promise<CytoscapeFactory> {
  loading ??= Promise.all([import('cytoscape'), import('cytoscape-fcose')]).then(([core, fcose]) => {
    core.default.use(fcose.default);
    return core.default;
  });
  return loading;
}

/**
 * fCoSE (spectral start, then force-directed refinement). Large graphs keep the spectral draft
 * with a short refinement: the picture settles well under two seconds for 2,000 nodes.
 */
export function layoutOptions(nodeCount: number): LayoutOptions {
  const large = nodeCount > LARGE_GRAPH_NODES;
  return {
    name: 'fcose',
    quality: large ? 'draft' : 'default',
    randomize: true,
    animate: false,
    fit: true,
    padding: 24,
    nodeDimensionsIncludeLabels: !large,
    idealEdgeLength: () => (large ? 40 : 60),
    nodeRepulsion: () => (large ? 2500 : 6500),
    numIter: large ? 600 : 2500,
    packComponents: true,
  } as LayoutOptions;
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

/** Runs the layout and resolves when it has stopped (fCoSE without animation stops at once). */
export function runLayout(cy: Core): Promise<void> {
  return new Promise((resolve) => {
    const layout = cy.layout(layoutOptions(cy.nodes().length));
    layout.one('layoutstop', () => resolve());
    layout.run();
  });
}
