import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import PDFDocument from 'pdfkit';
import { describe, expect, it } from 'vitest';
import { pdfFonts } from '@api/exports/pdf/pdf-fonts';
import { writeWithSymbols } from '@api/exports/pdf/pdf-text';

const dir = mkdtempSync(join(tmpdir(), 'pdf-ink-'));

/** A one-line page written with the worksheet's fonts and text writer. */
function pageWith(text: string): Promise<Buffer> {
  const doc = new PDFDocument({ size: [200, 80], margin: 10 });
  for (const [name, font] of Object.entries(pdfFonts())) doc.registerFont(name, font as unknown as Buffer);
  const chunks: Buffer[] = [];
  doc.on('data', (chunk: Buffer) => chunks.push(chunk));
  const done = new Promise<Buffer>((resolve) => doc.on('end', () => resolve(Buffer.concat(chunks))));
  writeWithSymbols(doc, text, 20, 20, { size: 36 });
  doc.end();
  return done;
}

/** Dark pixels of the page as poppler prints it (pdftoppm, grey PGM at 72 dpi). */
function inkOf(pdf: Buffer, name: string): number {
  const file = join(dir, `${name}.pdf`);
  writeFileSync(file, pdf);
  const pgm = execFileSync('pdftoppm', ['-gray', '-r', '72', '-singlefile', file]);
  // Binary PGM: "P5", width, height, maximum value, each followed by one whitespace, then the pixels.
  const header = pgm.subarray(0, 40).toString('latin1').match(/^P5\s+(\d+)\s+(\d+)\s+(\d+)\s/)!;
  const pixels = pgm.subarray(header[0].length);
  return pixels.filter((value) => value < 128).length;
}

describe('PDF worksheet glyphs', () => {
  // pdftotext reads an arrow back from its ToUnicode entry even when its outline is empty, so only
  // the printed page tells whether the reader sees it.
  it.each([['→'], ['⇌']])('prints %s (symbols font) with ink, like a letter of the text font', async (arrow) => {
    const letter = inkOf(await pageWith('H'), 'letter');
    expect(letter).toBeGreaterThan(20);
    expect(inkOf(await pageWith(arrow), `arrow-${arrow.codePointAt(0)}`)).toBeGreaterThan(letter / 4);
  });
});
