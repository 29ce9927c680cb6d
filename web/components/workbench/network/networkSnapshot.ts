import type { Core, EdgeSingular, NodeSingular } from 'cytoscape';
import { networkSvg, type SvgEdge, type SvgNode } from './networkSvg';

const numberOf = (value: unknown) => Number.parseFloat(String(value)) || 0;

function labelCentreOf(node: NodeSingular): { x: number; y: number } {
  const box = node.boundingBox({ includeNodes: false, includeEdges: false, includeLabels: true, includeOverlays: false });
  return { x: (box.x1 + box.x2) / 2, y: (box.y1 + box.y2) / 2 };
}

function snapshotNode(node: NodeSingular): SvgNode {
  const { x, y } = node.position();
  return {
    x, y, width: node.outerWidth(), height: node.outerHeight(),
    label: String(node.data('label') ?? ''),
    fill: node.style('background-color'), stroke: node.style('border-color'),
    strokeWidth: numberOf(node.style('border-width')),
    dashed: node.style('border-style') === 'dashed',
    rounded: node.data('kind') === 'species',
    opacity: numberOf(node.style('opacity')),
    labelCentre: node.data('kind') === 'step' ? labelCentreOf(node) : undefined,
  };
}

function snapshotEdge(edge: EdgeSingular): SvgEdge {
  const target = edge.target();
  return {
    from: edge.source().position(), to: target.position(),
    targetHalf: { width: target.outerWidth() / 2, height: target.outerHeight() / 2 },
    width: numberOf(edge.style('width')), color: edge.style('line-color'),
    label: String(edge.data('label') ?? ''), opacity: numberOf(edge.style('opacity')),
  };
}

/** The laid-out graph as an SVG document, drawn from the positions and computed styles. */
export function graphToSvg(cy: Core): string {
  return networkSvg(cy.nodes().map(snapshotNode), cy.edges().map(snapshotEdge));
}

/** Offers a blob as a download under `fileName`. */
export function downloadBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const link = Object.assign(document.createElement('a'), { href: url, download: fileName });
  document.body.append(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1_000);
}
