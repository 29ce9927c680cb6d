import { describe, expect, it } from 'vitest';
import { Text } from '@codemirror/state';
import type { Diagnostic } from '@grammar/diagnostics';
import { toLintDiagnostics } from '@web/components/workbench/editor/editorDiagnostics';
import { equationSpan, fixForDiagnostic } from '@web/components/workbench/editor/stepFixes';

const apply = (line: string, edit: { from: number; to: number; insert: string }) => line.slice(0, edit.from) + edit.insert + line.slice(edit.to);

// 2 O3 → 3 O2 is the balanced ozone decomposition (textbook stoichiometry).
describe('fixForDiagnostic', () => {
  const balancing: Diagnostic = {
    severity: 'info', line: 1, column: 1, code: 'suggested-fix',
    message: 'step F15 balances with 3 O2 instead of 2 O2 among the products: 2 O3 → 3 O2', expected: ['2 O3 → 3 O2'],
  };

  it('replaces the equation between the label and the rate, keeping both', () => {
    const line = 'F15: 2 O3 -> 2 O2    @ 1e-20   # slow';
    expect(apply(line, fixForDiagnostic(balancing, line)!)).toBe('F15: 2 O3 → 3 O2    @ 1e-20   # slow');
  });

  it('replaces the whole equation of an unlabelled step without a rate', () => {
    expect(apply('2 O3 -> 2 O2', fixForDiagnostic(balancing, '2 O3 -> 2 O2')!)).toBe('2 O3 → 3 O2');
  });

  it('adds the radical mark to the species a warning names', () => {
    const line = 'F16: RO2 + NO -> RO2 + NO2';
    const warning: Diagnostic = { severity: 'warning', line: 1, column: 12, code: 'odd-electrons-unmarked', message: 'NO has 15 electrons', found: 'NO', expected: ['NO•'] };
    expect(apply(line, fixForDiagnostic(warning, line)!)).toBe('F16: RO2 + NO• -> RO2 + NO2');
  });

  it('offers nothing when the text no longer holds what was found, or for findings without a fix', () => {
    const warning: Diagnostic = { severity: 'warning', line: 1, column: 12, code: 'odd-electrons-unmarked', message: '', found: 'NO', expected: ['NO•'] };
    expect(fixForDiagnostic(warning, 'F16: RO2 + NO2 -> RO2')).toBeNull();
    expect(fixForDiagnostic({ severity: 'error', line: 1, column: 1, code: 'duplicate-label', message: '' }, 'F1: A -> B')).toBeNull();
  });

  it('finds the equation span after a label with spaces before the colon', () => {
    expect(equationSpan('  X_1 : A -> B @ 1')).toEqual({ from: 8, to: 14 });
  });
});

describe('toLintDiagnostics', () => {
  const doc = Text.of(['%title Demo', 'B1: Br• + O3 -> BrO• + O2', 'B2: BrO• + O(3P) ->']);

  it('underlines what the checker found, on its line', () => {
    const [mark] = toLintDiagnostics([{ severity: 'error', line: 2, column: 11, code: 'unknown-element', message: 'm', found: 'O3' }], doc);
    expect(doc.sliceString(mark.from, mark.to)).toBe('O3');
    expect(mark.severity).toBe('error');
  });

  it('underlines the last token when the line ends too early, and the whole line for a step-wide finding', () => {
    const [early, wide] = toLintDiagnostics([
      { severity: 'error', line: 3, column: 20, code: 'syntax-error', message: 'the line ends too early', found: 'end of line' },
      { severity: 'warning', line: 2, column: 1, code: 'duplicate-step', message: 'm' },
    ], doc);
    expect(doc.sliceString(early.from, early.to)).toBe('->');
    expect(doc.sliceString(wide.from, wide.to)).toBe('B1: Br• + O3 -> BrO• + O2');
  });

  it('leaves out the step class (the Steps table shows it) and lines past the end', () => {
    expect(toLintDiagnostics([
      { severity: 'info', line: 2, column: 1, code: 'step-class', message: 'm' },
      { severity: 'error', line: 9, column: 1, code: 'syntax-error', message: 'm' },
    ], doc)).toEqual([]);
  });

  it('gives a suggested fix a one-click action', () => {
    const [mark] = toLintDiagnostics([{ severity: 'info', line: 2, column: 1, code: 'suggested-fix', message: 'm', expected: ['Br• + O3 → BrO• + O2'] }], doc);
    expect(mark.actions?.map((action) => action.name)).toEqual(['Use Br• + O3 → BrO• + O2']);
  });
});
