import type { Diagnostic } from '@grammar/diagnostics';

/**
 * Diagnostics in reading order (line, then column); equal places keep the order they were found
 * in, because `Array.prototype.sort` is stable (ES2019).
 */
export function sortDiagnostics(diagnostics: readonly Diagnostic[]): Diagnostic[] {
  return diagnostics.slice().sort((a, b) => a.line - b.line || a.column - b.column);
}
