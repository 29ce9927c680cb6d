import { setDiagnostics, type Diagnostic as LintDiagnostic } from '@codemirror/lint';
import type { ChangeSet, Text } from '@codemirror/state';
import type { EditorView, ViewUpdate } from '@codemirror/view';
import { PARSER_CODES, type Diagnostic } from '@grammar/diagnostics';
import { parseMechanism } from '@grammar/parse';
import { toLintDiagnostics } from './editorDiagnostics';

const PARSER_CODE_SET = new Set<string>(Object.values(PARSER_CODES));

function mapThrough(diagnostics: LintDiagnostic[], changes: ChangeSet): LintDiagnostic[] {
  return diagnostics.map((d) => ({ ...d, from: changes.mapPos(d.from, 1), to: Math.max(changes.mapPos(d.from, 1), changes.mapPos(d.to, -1)) }));
}

/** The line numbers (in the new text) that a change touched. */
function touchedLines(doc: Text, changes: ChangeSet): Set<number> {
  const lines = new Set<number>();
  changes.iterChangedRanges((_fromA, _toA, fromB, toB) => {
    for (let n = doc.lineAt(fromB).number; n <= doc.lineAt(toB).number; n += 1) lines.add(n);
  });
  return lines;
}

/**
 * The diagnostics the editor shows, from two sources: the grammar, run in the browser on each
 * edited line as you type (syntax), and the server's full analysis once it answers for exactly
 * the text on screen. Between the two, the server's findings move along with the text.
 */
export class LiveDiagnostics {
  private syntax: LintDiagnostic[] = [];
  private server: LintDiagnostic[] = [];

  constructor(private readonly view: EditorView) {}

  /** Re-reads the whole text with the grammar (a new document). */
  parseAll(): void {
    const doc = this.view.state.doc;
    this.syntax = toLintDiagnostics(parseMechanism(doc.toString()).diagnostics, doc);
    this.server = [];
    this.publish();
  }

  /**
   * After an edit: the findings move with the text, the edited lines are read again. A new set is
   * handed to CodeMirror only when a finding went or came: its lint state moves the marks it shows
   * through the edit by itself, and replacing the set walks the document up to the last mark
   * (milliseconds per key on a 2,000-step mechanism, all spent before the analysis is even asked for).
   */
  onChange(update: ViewUpdate): void {
    const doc = update.state.doc;
    const touched = touchedLines(doc, update.changes);
    const untouched = (d: LintDiagnostic) => !touched.has(doc.lineAt(d.from).number);
    const server = mapThrough(this.server, update.changes).filter((d) => !PARSER_CODE_SET.has(d.source ?? '') || untouched(d));
    const syntax = mapThrough(this.syntax, update.changes).filter(untouched);
    const found: LintDiagnostic[] = [];
    for (const n of touched) found.push(...toLintDiagnostics(parseMechanism(doc.line(n).text).diagnostics, doc, n - 1));
    const changed = server.length !== this.server.length || syntax.length !== this.syntax.length || found.length > 0;
    this.server = server;
    this.syntax = [...syntax, ...found];
    if (changed) this.publish();
  }

  /** The server's findings, taken only when they belong to the text now on screen. */
  setServer(diagnostics: readonly Diagnostic[], forText: string): boolean {
    const doc = this.view.state.doc;
    if (doc.toString() !== forText) return false;
    this.server = toLintDiagnostics(diagnostics, doc);
    this.syntax = [];
    this.publish();
    return true;
  }

  private publish(): void {
    this.view.dispatch(setDiagnostics(this.view.state, [...this.syntax, ...this.server]));
  }
}
