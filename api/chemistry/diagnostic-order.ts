import type { Diagnostic } from '@grammar/diagnostics';

/** Diagnostics in reading order (line, then column); equal places keep the order they were found in. */
export function sortDiagnostics(diagnostics: readonly Diagnostic[]): Diagnostic[] {
  return diagnostics
    .map((item, order) => ({ item, order }))
    .sort((a, b) => a.item.line - b.item.line || a.item.column - b.item.column || a.order - b.order)
    .map(({ item }) => item);
}
