import type { Diagnostic } from '@grammar/diagnostics';

/** A text change that carries out a diagnostic's suggested fix, in 0-based offsets of one line. */
export interface LineEdit {
  from: number;
  to: number;
  insert: string;
  /** The button's words. */
  name: string;
}

const LABEL = /^\s*[A-Za-z][\w.-]*\s*:\s*/;

/** Where the equation sits in a step line: after the label, before `@` or a comment. */
export function equationSpan(lineText: string): { from: number; to: number } {
  const from = LABEL.exec(lineText)?.[0].length ?? lineText.length - lineText.trimStart().length;
  const stop = lineText.search(/[@#]/);
  let to = stop === -1 ? lineText.length : stop;
  while (to > from && /\s/.test(lineText[to - 1])) to -= 1;
  return { from, to };
}

/**
 * The one-click fix a diagnostic offers, if any: a balancing suggestion replaces the step's
 * equation; a missing radical mark is added to the species it names.
 */
export function fixForDiagnostic(diagnostic: Diagnostic, lineText: string): LineEdit | null {
  const replacement = diagnostic.expected?.length === 1 ? diagnostic.expected[0] : null;
  if (!replacement) return null;
  if (diagnostic.code === 'suggested-fix') {
    const span = equationSpan(lineText);
    const suffix = span.to < lineText.length && !/\s/.test(lineText[span.to] ?? '') ? ' ' : '';
    return { ...span, insert: replacement + suffix, name: `Use ${replacement}` };
  }
  if (diagnostic.code === 'odd-electrons-unmarked' && diagnostic.found) {
    const from = diagnostic.column - 1;
    const to = from + diagnostic.found.length;
    // The whole species, not the start of a longer one (NO inside NO2).
    if (lineText.slice(from, to) !== diagnostic.found || /\S/.test(lineText[to] ?? ' ')) return null;
    return { from, to, insert: replacement, name: `Write ${replacement}` };
  }
  return null;
}
