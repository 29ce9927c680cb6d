import type PDFDocument from 'pdfkit';
import type { StepExport } from '../exports.schemas';
import { networkLayout, type NodePlace } from './network-layout';

type Doc = InstanceType<typeof PDFDocument>;

const INK = '#1f3a5f';
const GREY = '#6b7280';
const SPECIES_RADIUS = 13;
const STEP_HALF = 8;

function arrow(doc: Doc, from: NodePlace, to: NodePlace, endGap: number, startGap: number): void {
  const dx = to.x - from.x;
  const dy = to.y - from.y;
  const length = Math.hypot(dx, dy) || 1;
  const [ux, uy] = [dx / length, dy / length];
  const start = { x: from.x + ux * startGap, y: from.y + uy * startGap };
  const end = { x: to.x - ux * endGap, y: to.y - uy * endGap };
  doc.moveTo(start.x, start.y).lineTo(end.x, end.y).lineWidth(0.6).strokeColor(GREY).stroke();
  const [px, py] = [-uy, ux];
  doc.polygon([end.x, end.y], [end.x - ux * 5 + px * 2.5, end.y - uy * 5 + py * 2.5], [end.x - ux * 5 - px * 2.5, end.y - uy * 5 - py * 2.5])
    .fillColor(GREY).fill();
}

/**
 * Draws the species–step network with pdfkit's vector graphics: species as circles, steps as
 * squares, an arrow from each consumed species to its step and from each step to what it forms.
 */
export function drawNetwork(doc: Doc, steps: StepExport[], box: { x: number; y: number; width: number; height: number }): void {
  const layout = networkLayout(steps, box);
  for (const edge of layout.edges) {
    const fromSpecies = layout.species.includes(edge.from);
    arrow(doc, edge.from, edge.to, fromSpecies ? STEP_HALF + 1 : SPECIES_RADIUS + 1, fromSpecies ? SPECIES_RADIUS : STEP_HALF);
  }
  doc.font('text').fontSize(6.5);
  for (const node of layout.steps) {
    doc.rect(node.x - STEP_HALF, node.y - STEP_HALF, STEP_HALF * 2, STEP_HALF * 2).lineWidth(0.8).fillAndStroke('#ffffff', INK);
    doc.fillColor(INK).text(node.label, node.x - 20, node.y - 3.5, { width: 40, align: 'center', lineBreak: false });
  }
  doc.fontSize(7);
  for (const node of layout.species) {
    doc.circle(node.x, node.y, SPECIES_RADIUS).lineWidth(0.8).fillAndStroke('#eef2f7', INK);
    doc.fillColor('#000000').text(node.label, node.x - 30, node.y - 4, { width: 60, align: 'center', lineBreak: false });
  }
  doc.fillColor('#000000').strokeColor('#000000');
}
