import type { TextPosition } from './kinetics/model';

/**
 * Columns of the forward and reverse rate texts. The analysis gives the column of `@`; with the
 * source text the expressions are found exactly (after `@`, and after `|`), otherwise both point
 * at the `@`.
 */
export function ratePositions(rate: { forward: string; reverse: string | null; line: number; column: number }, lines: string[] | null): { forwardAt: TextPosition; reverseAt: TextPosition } {
  const at = { line: rate.line, column: rate.column };
  const line = lines?.[rate.line - 1];
  if (!line) return { forwardAt: at, reverseAt: at };
  const afterAt = rate.column;
  const forwardColumn = line.indexOf(rate.forward, afterAt) + 1;
  const bar = rate.reverse === null ? -1 : line.indexOf('|', forwardColumn - 1 + rate.forward.length);
  const reverseColumn = bar < 0 || rate.reverse === null ? forwardColumn : line.indexOf(rate.reverse, bar) + 1;
  return { forwardAt: { line: rate.line, column: forwardColumn || rate.column }, reverseAt: { line: rate.line, column: reverseColumn || rate.column } };
}
