import type { StylesheetJson } from 'cytoscape';
import { ember, graphite, ink, lagoon } from '@web/plugins/palette';
import { LARGE_GRAPH_NODES } from './networkLayout';

const FONT = '"Noto Sans", system-ui, sans-serif';

/**
 * The graph's look. Every role has a shape or border style and a label mark besides its colour:
 * catalysts a double amber border and the word "catalyst", intermediates a hollow dashed teal
 * outline and "◌", steps small squares; the selected route is drawn thick and the rest faded.
 * A step's label starts under its square and is moved where its arrows leave room
 * (networkStepLabels.ts), on a white ground so that an arrow passing behind it does not cut it.
 */
const nodeStyle: StylesheetJson = [
  {
    selector: 'node[kind = "species"]',
    style: {
      shape: 'round-rectangle', label: 'data(label)', 'font-family': FONT, 'font-size': 12, color: graphite[800],
      'text-valign': 'center', 'text-halign': 'center', 'text-wrap': 'wrap', width: 'data(boxWidth)', height: 'data(boxHeight)', 'background-color': graphite[100], 'border-width': 1.5, 'border-color': graphite[500],
      'min-zoomed-font-size': 7,
    },
  },
  {
    selector: 'node[role = "catalyst"]',
    style: { 'background-color': ember[100], 'border-color': ember[500], 'border-width': 4, 'border-style': 'double', color: ember[800], 'font-weight': 'bold' },
  },
  {
    selector: 'node[role = "intermediate"]',
    style: { 'background-color': '#ffffff', 'border-color': lagoon[500], 'border-width': 2, 'border-style': 'dashed', color: lagoon[800] },
  },
  {
    selector: 'node[kind = "step"]',
    style: {
      shape: 'rectangle', width: 11, height: 11, 'background-color': graphite[500], label: 'data(label)',
      'font-family': FONT, 'font-size': 9, color: graphite[600], 'text-valign': 'bottom', 'text-margin-y': 3,
      'min-zoomed-font-size': 6, 'text-background-color': '#ffffff', 'text-background-opacity': 0.85, 'text-background-padding': '1px',
    },
  },
  { selector: 'node[kind = "step"][?inRoute]', style: { width: 17, height: 17, 'background-color': ink[600], color: ink[800], 'font-size': 11, 'font-weight': 'bold' } },
  { selector: 'node[?selected]', style: { 'border-width': 3, 'border-color': ember[600], 'underlay-color': ember[300], 'underlay-opacity': 0.6, 'underlay-padding': 6 } },
  { selector: 'node[?dimmed]', style: { opacity: 0.3 } },
];

/** Small graphs: curved arrows with the coefficient as their label. */
const detailedEdgeStyle: StylesheetJson = [
  {
    selector: 'edge',
    style: {
      width: 'data(width)', 'curve-style': 'bezier', 'line-color': graphite[300], 'target-arrow-color': graphite[400],
      'target-arrow-shape': 'triangle', 'arrow-scale': 0.8, label: 'data(label)', 'font-family': FONT, 'font-size': 10,
      color: graphite[700], 'text-background-color': '#ffffff', 'text-background-opacity': 0.85, 'min-zoomed-font-size': 7,
    },
  },
  { selector: 'edge[?inRoute]', style: { 'line-color': ink[300], 'target-arrow-color': ink[400] } },
  { selector: 'edge[?inCycle]', style: { 'line-color': ink[700], 'target-arrow-color': ink[700] } },
  { selector: 'edge[?dimmed]', style: { opacity: 0.3 } },
];

/** The stylesheet of graphs up to LARGE_GRAPH_NODES nodes. */
export const networkStyle: StylesheetJson = [...nodeStyle, ...detailedEdgeStyle];

/**
 * The fast path of large graphs: haystack edges (straight, drawn in bulk) with the direction as a
 * mid-edge arrow and no labels, and node labels only once zoomed in enough to read. Edges get only
 * the properties they draw with: cytoscape applies every listed property to each of thousands of
 * edges, so labels' fonts and end arrows would cost time and show nothing.
 */
const largeGraphStyle: StylesheetJson = [
  { selector: 'node', style: { 'min-zoomed-font-size': 10 } },
  {
    selector: 'edge',
    style: {
      width: 'data(width)', 'curve-style': 'haystack', 'haystack-radius': 0, 'line-color': graphite[300],
      'mid-target-arrow-shape': 'triangle', 'mid-target-arrow-color': graphite[500], 'arrow-scale': 0.8,
    },
  },
  { selector: 'edge[?inRoute]', style: { 'line-color': ink[300], 'mid-target-arrow-color': ink[400] } },
  { selector: 'edge[?inCycle]', style: { 'line-color': ink[700], 'mid-target-arrow-color': ink[700] } },
  { selector: 'edge[?dimmed]', style: { opacity: 0.3 } },
];

/** The stylesheet for a graph of `nodeCount` nodes. */
export function networkStyleFor(nodeCount: number): StylesheetJson {
  return nodeCount > LARGE_GRAPH_NODES ? [...nodeStyle, ...largeGraphStyle] : networkStyle;
}
