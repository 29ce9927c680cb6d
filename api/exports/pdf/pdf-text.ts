import type PDFDocument from 'pdfkit';

type Doc = InstanceType<typeof PDFDocument>;

// Glyphs Noto Sans lacks; they are set in the symbols font (see pdf-fonts.ts).
const SYMBOL_RUN = /( ?[→⇌←⇄] ?)/u;

/**
 * Writes text that may hold reaction arrows at (x, y), switching to the symbols font for each
 * arrow so every glyph is real text (searchable, and read back by pdftotext).
 */
export function writeWithSymbols(doc: Doc, text: string, x: number, y: number, options: { width?: number; size?: number } = {}): void {
  const parts = text.split(SYMBOL_RUN).filter((part) => part !== '');
  doc.fontSize(options.size ?? 10);
  parts.forEach((part, index) => {
    const last = index === parts.length - 1;
    doc.font(SYMBOL_RUN.test(part) ? 'symbols' : 'text');
    const settings = { continued: !last, width: options.width, lineBreak: options.width !== undefined };
    if (index === 0) doc.text(part, x, y, settings);
    else doc.text(part, settings);
  });
  if (parts.length === 0) doc.text('', x, y);
}

/** A heading in bold at the current position, with space after it. */
export function heading(doc: Doc, text: string, size: number): void {
  doc.font('bold').fontSize(size).text(text, doc.page.margins.left, doc.y, { width: contentWidth(doc) });
  doc.moveDown(0.4);
}

/** A paragraph of plain text across the content width (arrows allowed). */
export function paragraph(doc: Doc, text: string, size = 10): void {
  writeWithSymbols(doc, text, doc.page.margins.left, doc.y, { width: contentWidth(doc), size });
  doc.moveDown(0.3);
}

export function contentWidth(doc: Doc): number {
  return doc.page.width - doc.page.margins.left - doc.page.margins.right;
}

/** Starts a new page when fewer than `needed` points are left. */
export function ensureRoom(doc: Doc, needed: number): void {
  if (doc.y + needed > doc.page.height - doc.page.margins.bottom) doc.addPage();
}
