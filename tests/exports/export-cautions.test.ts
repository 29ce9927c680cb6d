import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { parse as parseCsv } from 'csv-parse/sync';
import { describe, expect, it } from 'vitest';
import { EXPORT_FORMATS, type ExportFormat } from '@api/exports/exports.schemas';
import { renderExport } from '@api/exports/render';
import { exportDoc } from './export-fixtures';

// The cautions of product.md ("Cautions shown in the product"), written out here on purpose so
// that the test does not read them from the code it checks.
const CAUTIONS = [
  'Results are computational checks, not a substitute for validated models or measurements.',
  'Rate and thermochemical data carry the uncertainty of their sources.',
  'Ozone, nitrogen oxides, halogens and UV sources are hazardous: handle them under local regulations and licensed laboratory practice.',
];

const squash = (text: string) => text.replace(/\s+/g, ' ');
const dir = mkdtempSync(join(tmpdir(), 'cautions-'));

/** What a reader sees of the export: the text itself, or what pdftotext reads from the PDF. */
async function readableText(format: ExportFormat, answers: boolean): Promise<string> {
  const { body } = await renderExport(exportDoc(answers), format);
  if (format !== 'pdf') return squash(body.toString());
  const file = join(dir, `sheet-${answers}.pdf`);
  writeFileSync(file, body);
  return squash(execFileSync('pdftotext', ['-raw', '-enc', 'UTF-8', file, '-'], { encoding: 'utf8' }));
}

const cases = EXPORT_FORMATS.flatMap((format) => [[format, false], [format, true]] as const);

describe('the cautions on every export', () => {
  it.each(cases)('%s (answers %s) carries every caution', async (format, answers) => {
    const text = await readableText(format, answers);
    for (const caution of CAUTIONS) expect(text).toContain(caution);
  });

  it.each(cases)('%s (answers %s) puts them before the first mechanism', async (format, answers) => {
    const first = exportDoc(answers).mechanisms[0];
    const text = await readableText(format, answers);
    const start = text.indexOf(format === 'csv' ? `${first.slug},` : first.title);
    expect(start).toBeGreaterThan(0);
    expect(text.indexOf(CAUTIONS[0])).toBeLessThan(start);
  });

  it('gives them to JSON readers as a field of their own', async () => {
    const { body } = await renderExport(exportDoc(false), 'json');
    expect(JSON.parse(body.toString()).cautions).toEqual(CAUTIONS);
  });

  it('writes them in CSV as leading comment lines, leaving the header and rows to a comment-aware reader', async () => {
    const csv = (await renderExport(exportDoc(true), 'csv')).body.toString();
    expect(csv.split('\r\n').slice(0, 3)).toEqual(CAUTIONS.map((caution) => `# Caution: ${caution}`));
    const [header] = parseCsv(csv, { comment: '#' }) as string[][];
    expect(header[0]).toBe('mechanism');
  });

  it('quotes a step id with # so that the comment option never cuts a row short', async () => {
    const doc = exportDoc(false);
    doc.mechanisms[0].steps[0] = { ...doc.mechanisms[0].steps[0], id: '#1' };
    const rows = parseCsv((await renderExport(doc, 'csv')).body.toString(), { comment: '#', columns: true }) as Record<string, string>[];
    expect(rows[0]).toMatchObject({ step: '#1', equation: doc.mechanisms[0].steps[0].equation });
  });
});
