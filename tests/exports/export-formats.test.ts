import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Ajv2020 from 'ajv/dist/2020';
import { parse as parseCsv } from 'csv-parse/sync';
import MarkdownIt from 'markdown-it';
import { mhchemParser } from 'mhchemparser';
import { describe, expect, it } from 'vitest';
import { csvField, renderCsv } from '@api/exports/csv';
import { exportJsonSchema } from '@api/exports/export-json-schema';
import { ExportDocument } from '@api/exports/exports.schemas';
import { renderLatex, texText } from '@api/exports/latex';
import { renderMarkdown } from '@api/exports/markdown';
import { renderWorksheet } from '@api/exports/pdf/worksheet';
import { exportDoc } from './export-fixtures';

const withAnswers = exportDoc(true);
const withoutAnswers = exportDoc(false);
const allSteps = withAnswers.mechanisms.flatMap((m) => m.steps.map((step, i) => ({ mechanism: m, step, answer: m.answers!.steps[i] })));
const squash = (text: string) => text.replace(/\s+/g, ' ');

/** Every `\ce{…}` argument, with nested braces. */
function ceArguments(tex: string): string[] {
  const found: string[] = [];
  for (let at = tex.indexOf('\\ce{'); at >= 0; at = tex.indexOf('\\ce{', at + 1)) {
    let depth = 0;
    for (let i = at + 3; i < tex.length; i++) {
      if (tex[i] === '{') depth++;
      else if (tex[i] === '}' && --depth === 0) {
        found.push(tex.slice(at + 4, i));
        break;
      }
    }
  }
  return found;
}

describe('LaTeX export', () => {
  const tex = renderLatex(withAnswers);
  const ce = ceArguments(tex);

  it('writes every step and every productive net reaction in \\ce{}, and mhchemparser reads each', () => {
    const productive = withAnswers.mechanisms.flatMap((m) => m.answers!.routes.filter((r) => r.kind === 'productive'));
    expect(ce.length).toBeGreaterThanOrEqual(allSteps.length + productive.length);
    for (const argument of ce) expect(() => mhchemParser.toTex(argument, 'ce'), argument).not.toThrow();
  });

  // mhchem manual (CTAN, version 4): `^{.}` is the radical dot, `$h\nu$` math inside \ce, `<=>` an equilibrium arrow.
  it('marks radicals, photons, excited states and equilibria the way mhchem renders them', () => {
    expect(ce).toContain('Br^{.} + O3 -> BrO^{.} + O2');
    expect(mhchemParser.toTex('Br^{.} + O3 -> BrO^{.} + O2', 'ce')).toContain('\\bullet');
    expect(ce).toContain('NO2 + $h\\nu$ -> NO^{.} + O(^{3}P)');
    expect(ce).toContain('NO^{.} + O3 <=> NO2 + O2');
    expect(mhchemParser.toTex('NO^{.} + O3 <=> NO2 + O2', 'ce')).toContain('\\longrightleftharpoons');
    expect(ce).toContain('2 O3 -> 3 O2');
  });

  it('escapes LaTeX specials in titles, notes and rate expressions', () => {
    expect(texText('50% & "quoted", #1 a_b {c} ~ ^ \\')).toBe('50\\% \\& "quoted", \\#1 a\\_b \\{c\\} \\textasciitilde{} \\textasciicircum{} \\textbackslash{}');
    expect(tex).toContain('\\texttt{6.0e-34 * (T / 300)\\textasciicircum{}-2.4}');
    expect(texText('Br• → BrO•, hν, ΔH ± 2')).toBe('Br\\textbullet{} \\ensuremath{\\rightarrow} BrO\\textbullet{}, h\\ensuremath{\\nu}, \\ensuremath{\\Delta}H \\ensuremath{\\pm} 2');
    expect(texText('kJ mol⁻¹, O₃, cm²')).toBe('kJ mol\\textsuperscript{$-$1}, O\\textsubscript{3}, cm\\textsuperscript{2}');
    expect(tex).toMatch(/\\begin\{document\}[\s\S]*\\end\{document\}\n$/);
  });

  it('leaves the answer key out when not asked for', () => {
    const plain = renderLatex(withoutAnswers);
    expect(plain).not.toContain('Answer key');
    expect(plain).not.toContain('propagation');
    expect(ceArguments(plain)).toHaveLength(allSteps.length);
  });
});

describe('Markdown export', () => {
  const html = new MarkdownIt().render(renderMarkdown(withAnswers));

  it('renders (markdown-it) one table row per step, with the equation as code', () => {
    const rows = html.match(/<tr>/g) ?? [];
    const routeRows = withAnswers.mechanisms.reduce((n, m) => n + m.answers!.routes.length, 0);
    // One header row for the steps table and one for the routes table of each mechanism.
    expect(rows.length).toBe(allSteps.length + routeRows + 2 * withAnswers.mechanisms.length);
    for (const { step } of allSteps) expect(html).toContain(`<code>${step.equation.replace(/&/g, '&amp;')}</code>`);
  });

  it('keeps a reversible rate with its pipe inside one cell', () => {
    expect(html).toContain('<code>3.0e-12 * exp(-1500 / T) | 1.0e-30</code>');
  });

  it('lists catalysts and intermediates only with the answer key', () => {
    expect(html).toContain('Catalysts: <code>Br•</code>');
    const plain = renderMarkdown(withoutAnswers);
    expect(plain).not.toMatch(/Catalysts|Answer key|propagation/);
  });
});

describe('CSV export', () => {
  it('reads back through csv-parse to the same steps, rates, classes, balance and ΔH', () => {
    const rows = parseCsv(renderCsv(withAnswers), { columns: true, bom: false, comment: '#' }) as Record<string, string>[];
    expect(rows).toHaveLength(allSteps.length);
    rows.forEach((row, index) => {
      const { mechanism, step, answer } = allSteps[index];
      expect(row).toMatchObject({ mechanism: mechanism.slug, revision: String(mechanism.revision), step: step.id, equation: step.equation, class: answer.class, balanced: String(answer.balanced) });
      expect(row.dH_kJ_per_mol === '' ? null : Number(row.dH_kJ_per_mol)).toBe(answer.dH);
    });
    const falloff = rows.find((row) => row.mechanism === 'no2-association' && row.step === 'N1')!;
    expect(falloff.rate).toBe('falloff(1.8e-30 * (T / 300)^-3.0, 2.8e-11, 0.6)');
  });

  it.each([['a,b'], ['say "hi"'], ['two\nlines'], [' padded '], ['plain']])('quotes %j so csv-parse reads it back unchanged', (value) => {
    expect(parseCsv(`${csvField(value)}\r\n`)).toEqual([[value]]);
  });

  it('has no answer columns without the answer key', () => {
    const [header] = parseCsv(renderCsv(withoutAnswers), { comment: '#' }) as string[][];
    expect(header).toEqual(['mechanism', 'revision', 'step', 'equation', 'rate']);
  });
});

describe('JSON export', () => {
  const ajv = new Ajv2020({ allErrors: true, strict: false });
  const validate = ajv.compile(exportJsonSchema());

  it('validates (ajv, JSON Schema 2020-12) against its own published schema, with and without answers', () => {
    for (const doc of [withAnswers, withoutAnswers]) {
      const parsed = JSON.parse(JSON.stringify(doc));
      expect(validate(parsed), ajv.errorsText(validate.errors)).toBe(true);
    }
  });

  it('reads back through the zod schema unchanged', () => {
    const text = JSON.stringify(withAnswers);
    expect(ExportDocument.parse(JSON.parse(text))).toEqual(JSON.parse(text));
  });

  it('is refused by the schema when its shape is wrong', () => {
    const broken = { ...JSON.parse(JSON.stringify(withAnswers)), version: 2, mechanisms: [{ title: 'x' }] };
    expect(validate(broken)).toBe(false);
    expect(validate.errors!.map((e) => e.instancePath)).toEqual(expect.arrayContaining(['/version', '/mechanisms/0']));
  });
});

describe('PDF worksheet', () => {
  const dir = mkdtempSync(join(tmpdir(), 'worksheet-'));
  const pdfText = async (answers: boolean) => {
    const file = join(dir, `sheet-${answers}.pdf`);
    writeFileSync(file, await renderWorksheet(exportDoc(answers)));
    return { file, text: squash(execFileSync('pdftotext', ['-raw', '-enc', 'UTF-8', file, '-'], { encoding: 'utf8' })) };
  };

  it('holds every equation and rate expression, read back by pdftotext', async () => {
    const { text } = await pdfText(false);
    for (const { step } of allSteps) expect(text).toContain(squash(step.equation));
    expect(text).toContain('k = 1.7e-11 * exp(-800 / T)');
    expect(text).not.toContain('Answer key');
  });

  it('adds the answer key: classes, ΔH, thresholds, stoichiometric numbers, net reactions, catalysts', async () => {
    const { text } = await pdfText(true);
    expect(text).toContain('B1: propagation; balanced yes; ΔH = −128.7 kJ/mol; threshold none');
    expect(text).toContain('B3: propagation; balanced yes; ΔH = 235.2 kJ/mol; threshold 509 nm');
    expect(text).toContain('B1 ×2, B2 ×1');
    expect(text).toContain('Net: 2 O3 → 3 O2');
    expect(text).toContain('Catalysts: Br•. Intermediates: BrO•, O(3P).');
  });

  it('embeds Noto Sans (pdffonts)', async () => {
    const { file } = await pdfText(false);
    const fonts = execFileSync('pdffonts', [file], { encoding: 'utf8' }).split('\n').filter((line) => line.includes('NotoSans-'));
    expect(fonts.length).toBeGreaterThan(0);
    for (const line of fonts) expect(line).toMatch(/\byes\s+yes\s+yes\b/);
  });
});
