import type { Core, EdgeSingular, NodeSingular } from 'cytoscape';
import { networkSvg, type SvgEdge, type SvgNode } from './networkSvg';

const numberOf = (value: unknown) => Number.parseFloat(String(value)) || 0;

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
