import type { Diagnostic as LintDiagnostic } from '@codemirror/lint';
import type { Text } from '@codemirror/state';
import type { EditorView } from '@codemirror/view';
import type { Diagnostic } from '@grammar/diagnostics';
import { fixForDiagnostic } from './stepFixes';

/** Findings the Steps table already shows in a column; underlining every step for them would be noise. */
const SHOWN_ELSEWHERE = new Set(['step-class']);

/** Where a diagnostic's underline runs: what it found, else the word at its column, else the whole line. */
function spanOf(diagnostic: Diagnostic, lineText: string): { from: number; to: number } {
  const start = Math.min(Math.max(diagnostic.column - 1, 0), lineText.length);
  if (diagnostic.found && lineText.startsWith(diagnostic.found, start)) return { from: start, to: start + diagnostic.found.length };
  if (diagnostic.column <= 1) return { from: 0, to: lineText.length };
  const word = /^\S+/.exec(lineText.slice(start));
  if (word) return { from: start, to: start + word[0].length };
  // At the end of the line ("the line ends too early"): underline the last thing written.
  const before = /\S+\s*$/.exec(lineText.slice(0, start));
  return before ? { from: before.index, to: start } : { from: start, to: start };
}

/**
 * The engine's diagnostics as CodeMirror lint diagnostics on `doc`, with the suggested fix as a
 * one-click action. `lineOffset` shifts lines when `diagnostics` came from parsing a single line.
 */
export function toLintDiagnostics(diagnostics: readonly Diagnostic[], doc: Text, lineOffset = 0): LintDiagnostic[] {
  const result: LintDiagnostic[] = [];
  for (const diagnostic of diagnostics) {
    if (SHOWN_ELSEWHERE.has(diagnostic.code)) continue;
    const lineNumber = diagnostic.line + lineOffset;
    if (lineNumber < 1 || lineNumber > doc.lines) continue;
    const line = doc.line(lineNumber);
    const span = spanOf(diagnostic, line.text);
    const fix = fixForDiagnostic(diagnostic, line.text);
    result.push({
      from: line.from + span.from,
      to: line.from + span.to,
      severity: diagnostic.severity,
      source: diagnostic.code,
      message: diagnostic.message,
      actions: fix ? [{ name: fix.name, apply: (view, from) => applyFix(view, diagnostic, from) }] : undefined,
    });
  }
  return result;
}

/** Recomputes the fix on the line as it is now (the text may have moved since the diagnostic came). */
function applyFix(view: EditorView, diagnostic: Diagnostic, from: number): void {
  const line = view.state.doc.lineAt(from);
  const fix = fixForDiagnostic({ ...diagnostic, column: from - line.from + 1 }, line.text);
  if (fix) view.dispatch({ changes: { from: line.from + fix.from, to: line.from + fix.to, insert: fix.insert } });
}
