/** A drawn node: centre, size and look, as read from the laid-out graph. */
export interface SvgNode {
  x: number;
  y: number;
  width: number;
  height: number;
  label: string;
  fill: string;
  stroke: string;
  strokeWidth: number;
  dashed: boolean;
  rounded: boolean;
  opacity: number;
  /** Where a step's label was drawn (its centre); under the square when not given. */
  labelCentre?: { x: number; y: number };
}

export interface SvgEdge {
  from: { x: number; y: number };
  to: { x: number; y: number };
  /** Half-size of the target node, so that the arrow stops at its border. */
  targetHalf: { width: number; height: number };
  width: number;
  color: string;
  label: string;
  opacity: number;
}

const escapeXml = (text: string) =>
  text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');

/** Where the segment from `from` towards the box centred at `to` enters the box. */
function clipToBox(from: { x: number; y: number }, to: { x: number; y: number }, half: { width: number; height: number }) {
  const dx = from.x - to.x;
  const dy = from.y - to.y;
  if (dx === 0 && dy === 0) return to;
  const scale = Math.min(dx === 0 ? Infinity : half.width / Math.abs(dx), dy === 0 ? Infinity : half.height / Math.abs(dy));
  return { x: to.x + dx * Math.min(scale, 1), y: to.y + dy * Math.min(scale, 1) };
}

function edgeSvg(edge: SvgEdge): string {
  const end = clipToBox(edge.from, edge.to, edge.targetHalf);
  const mid = { x: (edge.from.x + end.x) / 2, y: (edge.from.y + end.y) / 2 };
  const line = `<line x1="${edge.from.x.toFixed(1)}" y1="${edge.from.y.toFixed(1)}" x2="${end.x.toFixed(1)}" y2="${end.y.toFixed(1)}" stroke="${edge.color}" stroke-width="${edge.width}" opacity="${edge.opacity}" marker-end="url(#arrow)"/>`;
  if (!edge.label) return line;
  return `${line}<text x="${mid.x.toFixed(1)}" y="${mid.y.toFixed(1)}" font-size="10" text-anchor="middle">${escapeXml(edge.label)}</text>`;
}

/** A step's label where the graph drew it; 3 px below the centre puts a 9 px line's middle there. */
function stepLabelSvg(node: SvgNode): string {
  const at = node.labelCentre ? { x: node.labelCentre.x, y: node.labelCentre.y + 3 } : { x: node.x, y: node.y + node.height / 2 + 11 };
  return `<text font-size="9" text-anchor="middle" x="${at.x.toFixed(1)}" y="${at.y.toFixed(1)}">${escapeXml(node.label)}</text>`;
}

function nodeSvg(node: SvgNode): string {
  const x = node.x - node.width / 2;
  const y = node.y - node.height / 2;
  const dash = node.dashed ? ' stroke-dasharray="5 3"' : '';
  const radius = node.rounded ? ' rx="6"' : '';
  const lines = node.label.split('\n');
  const firstLine = node.y - ((lines.length - 1) * 13) / 2 + 4;
  const text = lines.map((line, i) => `<tspan x="${node.x.toFixed(1)}" y="${(firstLine + i * 13).toFixed(1)}">${escapeXml(line)}</tspan>`).join('');
  const box = `<rect x="${x.toFixed(1)}" y="${y.toFixed(1)}" width="${node.width.toFixed(1)}" height="${node.height.toFixed(1)}"${radius} fill="${node.fill}" stroke="${node.stroke}" stroke-width="${node.strokeWidth}"${dash}/>`;
  const label = node.rounded ? `<text font-size="12" text-anchor="middle">${text}</text>` : stepLabelSvg(node);
  return `<g opacity="${node.opacity}">${box}${label}</g>`;
}

/** The reach of a placed step label along one axis (a 9 px line is about 5.5 px a character), so the picture holds it. */
function labelSpan(node: SvgNode, axis: 'x' | 'y'): number[] {
  if (!node.labelCentre) return [];
  const half = axis === 'x' ? (node.label.length * 5.5) / 2 : 7;
  return [node.labelCentre[axis] - half, node.labelCentre[axis] + half];
}

/** A standalone SVG document of the laid-out network: boxes, straight arrows and labels. */
export function networkSvg(nodes: SvgNode[], edges: SvgEdge[], padding = 24): string {
  const xs = nodes.flatMap((n) => [n.x - n.width / 2, n.x + n.width / 2, ...labelSpan(n, 'x')]);
  const ys = nodes.flatMap((n) => [n.y - n.height / 2, n.y + n.height / 2 + 14, ...labelSpan(n, 'y')]);
  const left = (nodes.length ? Math.min(...xs) : 0) - padding;
  const top = (nodes.length ? Math.min(...ys) : 0) - padding;
  const width = (nodes.length ? Math.max(...xs) : 0) - left + padding;
  const height = (nodes.length ? Math.max(...ys) : 0) - top + padding;
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="${left.toFixed(1)} ${top.toFixed(1)} ${width.toFixed(1)} ${height.toFixed(1)}" width="${width.toFixed(0)}" height="${height.toFixed(0)}" font-family="Noto Sans, sans-serif">`,
    '<defs><marker id="arrow" viewBox="0 0 10 10" refX="9" refY="5" markerWidth="5" markerHeight="5" orient="auto-start-reverse"><path d="M0,0 L10,5 L0,10 z" fill="#5f6773"/></marker></defs>',
    `<rect x="${left.toFixed(1)}" y="${top.toFixed(1)}" width="${width.toFixed(1)}" height="${height.toFixed(1)}" fill="#ffffff"/>`,
    ...edges.map(edgeSvg),
    ...nodes.map(nodeSvg),
    '</svg>',
  ].join('\n');
}
