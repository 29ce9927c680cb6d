/**
 * The elimination of integer-matrix.ts on plain numbers, for speed. Every product and sum is
 * checked to stay a safe integer (below 2^53, where floating point is exact); the first one
 * that would not throws `Overflow`, and the caller then redoes the work on BigInt.
 */
export class Overflow extends Error {}

type NumberRow = Map<number, number>;

function gcdNumber(a: number, b: number): number {
  let x = Math.abs(a);
  let y = Math.abs(b);
  while (y !== 0) [x, y] = [y, x % y];
  return x;
}

function safe(value: number): number {
  if (!Number.isSafeInteger(value)) throw new Overflow();
  return value;
}

function normalise(row: NumberRow): void {
  let divisor = 0;
  for (const value of row.values()) divisor = gcdNumber(divisor, value);
  if (divisor > 1) for (const [column, value] of row) row.set(column, value / divisor);
}

function eliminate(row: NumberRow, pivotRow: NumberRow, column: number): void {
  const a = pivotRow.get(column) as number;
  const b = row.get(column) as number;
  const divisor = gcdNumber(a, b);
  const rowFactor = a / divisor;
  const pivotFactor = b / divisor;
  if (rowFactor !== 1) for (const [key, value] of row) row.set(key, safe(value * rowFactor));
  for (const [key, value] of pivotRow) {
    const next = safe((row.get(key) ?? 0) - safe(value * pivotFactor));
    if (next === 0) row.delete(key);
    else row.set(key, next);
  }
  normalise(row);
}

function pickPivot(rows: NumberRow[], column: number): number {
  let best = -1;
  for (let index = 0; index < rows.length; index += 1) {
    if (rows[index].has(column) && (best < 0 || rows[index].size < rows[best].size)) best = index;
  }
  return best;
}

/** Fully reduced echelon form on numbers; throws Overflow when an entry would leave the safe range. */
export function reduceNumbers(input: readonly Map<number, bigint>[], columnCount: number): { rows: NumberRow[]; pivots: number[] } {
  const remaining: NumberRow[] = [];
  for (const row of input) {
    if (row.size === 0) continue;
    const copy: NumberRow = new Map();
    for (const [column, value] of row) copy.set(column, safe(Number(value)));
    remaining.push(copy);
  }
  const rows: NumberRow[] = [];
  const pivots: number[] = [];
  for (let column = 0; column < columnCount && remaining.length > 0; column += 1) {
    const index = pickPivot(remaining, column);
    if (index < 0) continue;
    const [pivotRow] = remaining.splice(index, 1);
    for (const row of remaining) if (row.has(column)) eliminate(row, pivotRow, column);
    for (const row of rows) if (row.has(column)) eliminate(row, pivotRow, column);
    for (let r = remaining.length - 1; r >= 0; r -= 1) if (remaining[r].size === 0) remaining.splice(r, 1);
    rows.push(pivotRow);
    pivots.push(column);
  }
  return { rows, pivots };
}
