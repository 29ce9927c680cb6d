import PDFDocument from 'pdfkit';
import { HANDOUT_CAUTIONS, type ExportDocument, type MechanismExport } from '../exports.schemas';
import { formatKj, formatNm, multipliersText, rateText, yesNo } from '../number-format';
import { drawNetwork } from './network-picture';
import { pdfFonts } from './pdf-fonts';
import { contentWidth, ensureRoom, heading, paragraph, writeWithSymbols } from './pdf-text';

type Doc = InstanceType<typeof PDFDocument>;

const PICTURE_HEIGHT = 260;

function stepLines(doc: Doc, mechanism: MechanismExport): void {
  const left = doc.page.margins.left;
  for (const step of mechanism.steps) {
    ensureRoom(doc, 30);
    const y = doc.y;
    doc.font('bold').fontSize(10).text(step.id, left, y, { width: 48, lineBreak: false });
    writeWithSymbols(doc, step.equation, left + 52, y, { width: contentWidth(doc) - 52 });
    const rate = rateText(step);
    if (rate) doc.font('text').fontSize(8).fillColor('#4b5563').text(`k = ${rate}`, left + 52, doc.y, { width: contentWidth(doc) - 52 });
    doc.fillColor('#000000').moveDown(0.3);
  }
}

function networkSection(doc: Doc, mechanism: MechanismExport): void {
  ensureRoom(doc, PICTURE_HEIGHT + 30);
  heading(doc, 'Network: species in circles, steps in squares', 11);
  drawNetwork(doc, mechanism.steps, { x: doc.page.margins.left, y: doc.y, width: contentWidth(doc), height: PICTURE_HEIGHT });
  doc.x = doc.page.margins.left;
  doc.y += PICTURE_HEIGHT + 10;
}

function answerKeySection(doc: Doc, mechanism: MechanismExport): void {
  const answers = mechanism.answers!;
  heading(doc, `Answer key — ${mechanism.title}`, 13);
  mechanism.steps.forEach((step, index) => {
    const answer = answers.steps[index];
    ensureRoom(doc, 16);
    paragraph(doc, `${step.id}: ${answer.class}; balanced ${yesNo(answer.balanced)}; ΔH = ${formatKj(answer.dH)} kJ/mol; threshold ${answer.thresholdNm === null ? 'none' : `${formatNm(answer.thresholdNm)} nm`}`, 9);
  });
  answers.routes.forEach((route, index) => {
    ensureRoom(doc, 30);
    const tag = answers.overall === index ? ' (overall)' : route.kind === 'null-cycle' ? ' (null cycle)' : '';
    paragraph(doc, `Route ${index + 1}${tag}: ${multipliersText(route.multipliers)}`, 9);
    paragraph(doc, `Net: ${route.net}    ΔH = ${formatKj(route.dH)} kJ/mol`, 9);
  });
  const list = (keys: string[]) => (keys.length > 0 ? keys.join(', ') : 'none');
  paragraph(doc, `Catalysts: ${list(answers.catalysts)}. Intermediates: ${list(answers.intermediates)}.`, 9);
  doc.moveDown(0.5);
}

/** The product's cautions, under the title of the first page, before any chemistry. */
function cautionsBlock(doc: Doc): void {
  doc.font('bold').fontSize(9).fillColor('#4b5563').text('Cautions', doc.page.margins.left, doc.y, { width: contentWidth(doc) });
  doc.font('text').fontSize(8.5).list([...HANDOUT_CAUTIONS], { width: contentWidth(doc), bulletRadius: 1.5, textIndent: 10 });
  doc.fillColor('#000000').moveDown(0.8);
}

function mechanismPages(doc: Doc, mechanism: MechanismExport, index: number): void {
  if (index > 0) doc.addPage();
  heading(doc, `${index + 1}. ${mechanism.title} (r${mechanism.revision})`, 14);
  if (mechanism.note) paragraph(doc, mechanism.note);
  heading(doc, 'Steps', 11);
  stepLines(doc, mechanism);
  networkSection(doc, mechanism);
  ensureRoom(doc, 60);
  paragraph(doc, 'Find the routes and their stoichiometric numbers, the net reactions, the catalysts and intermediates, ΔH of each step and the photolysis thresholds.', 9);
}

/**
 * A printable worksheet: per mechanism its steps and network picture; with the answer key, pages
 * at the end with classes, ΔH, thresholds, routes, catalysts and intermediates. Noto Sans embedded.
 */
export function renderWorksheet(exported: ExportDocument): Promise<Buffer> {
  const doc = new PDFDocument({ size: 'A4', margin: 50, info: { Title: exported.set?.title ?? exported.mechanisms[0].title, Creator: 'Cyclewright' } });
  // pdfkit 0.20 takes a parsed fontkit font wherever it takes a file (PDFFontFactory.open).
  for (const [name, font] of Object.entries(pdfFonts())) doc.registerFont(name, font as unknown as Buffer);
  const chunks: Buffer[] = [];
  doc.on('data', (chunk: Buffer) => chunks.push(chunk));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  heading(doc, `${exported.set?.title ?? exported.mechanisms[0].title}${exported.answerKey ? ' — with answer key' : ''}`, 18);
  if (exported.set?.audience) paragraph(doc, `Audience: ${exported.set.audience}`);
  cautionsBlock(doc);
  exported.mechanisms.forEach((mechanism, index) => mechanismPages(doc, mechanism, index));
  if (exported.answerKey) {
    doc.addPage();
    for (const mechanism of exported.mechanisms) answerKeySection(doc, mechanism);
  }
  doc.end();
  return done;
}
