import type { Core, NodeSingular } from 'cytoscape';
import { LARGE_GRAPH_NODES } from './networkLayout';
import { freestDirection, labelOffsetToward } from './stepLabelPlacement';

/** The label's own box, as cytoscape measured it with the node's current font. */
function labelSize(node: NodeSingular): { width: number; height: number } {
  const box = node.boundingBox({ includeNodes: false, includeEdges: false, includeLabels: true, includeOverlays: false });
  return { width: box.w, height: box.h };
}

/**
 * Puts each step's label ("B1 ×3", "B3 hν ×1") where none of its arrows run, instead of under the
 * square where arrows leaving downwards would cross it. Run once the nodes are placed, and again
 * after a new route (its steps are drawn larger, in a larger font) or after a node is dragged.
 * Large graphs keep the label under the node: their labels show only when zoomed in, and measuring
 * thousands of them would cost more than the graph's whole first draw.
 */
export function placeStepLabels(cy: Core): void {
  if (cy.nodes().length > LARGE_GRAPH_NODES) return;
  cy.batch(() => {
    for (const node of cy.nodes('[kind = "step"]')) {
      const neighbours = node.neighborhood().nodes().map((other) => other.position());
      const direction = freestDirection(node.position(), neighbours);
      const offset = labelOffsetToward(direction, node.width() / 2, labelSize(node));
      node.style({ 'text-valign': 'center', 'text-halign': 'center', 'text-margin-x': offset.dx, 'text-margin-y': offset.dy });
    }
  });
}
