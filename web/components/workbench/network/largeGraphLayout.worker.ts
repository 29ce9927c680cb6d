import { largeGraphLayout, type LayoutGraph } from './largeGraphLayout';

/** Lays out a large graph off the main thread, which meanwhile builds the cytoscape elements. */
addEventListener('message', (event: MessageEvent<LayoutGraph>) => postMessage(largeGraphLayout(event.data)));
