import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { renderLatex } from '@api/exports/latex';
import { exportDoc } from './export-fixtures';

/** Compiles with Debian's pdfLaTeX (texlive-science brings mhchem); returns the log. */
function compile(tex: string): string {
  const dir = mkdtempSync(join(tmpdir(), 'latex-export-'));
  writeFileSync(join(dir, 'export.tex'), tex);
  try {
    return execFileSync('pdflatex', ['-interaction=nonstopmode', '-halt-on-error', 'export.tex'], { cwd: dir, encoding: 'utf8', timeout: 120_000 });
  } catch (error) {
    throw new Error(`pdflatex failed:\n${(error as { stdout?: string }).stdout?.split('\n').filter((line) => line.startsWith('!')).join('\n')}`);
  }
}

describe('LaTeX export through pdfLaTeX with mhchem', () => {
  it.each([[true], [false]])('compiles without errors or overfull lines (answer key: %s)', (answers) => {
    const doc = exportDoc(answers);
    doc.mechanisms[0].note = 'Br• → BrO• in sunlight (hν, ΔH ± 2 kJ mol⁻¹ at 25 °C) — 50% & #1';
    const log = compile(renderLatex(doc));
    expect(log).toContain('Output written on export.pdf');
    expect(log).not.toMatch(/Overfull \\hbox/);
  }, 120_000);
});
