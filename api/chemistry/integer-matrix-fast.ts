/**
 * The elimination of integer-matrix.ts on dense rows of plain numbers, for speed. Every product
 * and sum is checked to stay a safe integer (below 2^53, where floating point is exact); the
 * first one that would not throws `Overflow`, and the caller then redoes the work on BigInt.
 */
export class Overflow extends Error {}

const LIMIT = Number.MAX_SAFE_INTEGER;
// Rows are divided by their gcd only once their entries grow past this, to keep the work low.
const NORMALISE_ABOVE = 2 ** 20;

interface DenseRow {
  values: Float64Array;
  nonZero: number;
}

function gcdNumber(a: number, b: number): number {
  let x = Math.abs(a);
  let y = Math.abs(b);
  while (y !== 0) [x, y] = [y, x % y];
  return x;
}

function normalise(row: DenseRow): void {
  let divisor = 0;
  for (const value of row.values) if (value !== 0) divisor = gcdNumber(divisor, value);
  if (divisor > 1) for (let i = 0; i < row.values.length; i += 1) row.values[i] /= divisor;
}

/** row ← (a/g)·row − (b/g)·pivotRow, which is 0 in `column`; exact or Overflow. */
function eliminate(row: DenseRow, pivotRow: DenseRow, column: number): void {
  const a = pivotRow.values[column];
  const b = row.values[column];
  const divisor = gcdNumber(a, b);
  const rowFactor = a / divisor;
  const pivotFactor = b / divisor;
  const values = row.values;
  const pivot = pivotRow.values;
  let nonZero = 0;
  let largest = 0;
  for (let i = 0; i < values.length; i += 1) {
    const left = values[i] * rowFactor;
    const right = pivot[i] * pivotFactor;
    const next = left - right;
    if (Math.abs(left) > LIMIT || Math.abs(right) > LIMIT || Math.abs(next) > LIMIT) throw new Overflow();
    values[i] = next;
    if (next !== 0) nonZero += 1;
    if (Math.abs(next) > largest) largest = Math.abs(next);
  }
  row.nonZero = nonZero;
  if (largest > NORMALISE_ABOVE) normalise(row);
}

function pickPivot(rows: DenseRow[], column: number): number {
  let best = -1;
  for (let index = 0; index < rows.length; index += 1) {
    if (rows[index].values[column] !== 0 && (best < 0 || rows[index].nonZero < rows[best].nonZero)) best = index;
  }
  return best;
}

function toDense(row: ReadonlyMap<number, bigint>, columnCount: number): DenseRow {
  const values = new Float64Array(columnCount);
  for (const [column, value] of row) {
    const number = Number(value);
    if (Math.abs(number) > LIMIT) throw new Overflow();
    values[column] = number;
  }
  return { values, nonZero: row.size };
}

function toSparse(row: DenseRow): Map<number, number> {
  normalise(row);
  const sparse = new Map<number, number>();
  row.values.forEach((value, column) => value !== 0 && sparse.set(column, value));
  return sparse;
}

/**
 * Echelon form on numbers, fully reduced unless `full` is false (enough for the rank, at about
 * half the work); throws Overflow when an entry would leave the safe range.
 */
export function reduceNumbers(input: readonly Map<number, bigint>[], columnCount: number, full = true): { rows: Map<number, number>[]; pivots: number[] } {
  const remaining = input.filter((row) => row.size > 0).map((row) => toDense(row, columnCount));
  const rows: DenseRow[] = [];
  const pivots: number[] = [];
  for (let column = 0; column < columnCount && remaining.length > 0; column += 1) {
    const index = pickPivot(remaining, column);
    if (index < 0) continue;
    const [pivotRow] = remaining.splice(index, 1);
    for (const row of remaining) if (row.values[column] !== 0) eliminate(row, pivotRow, column);
    if (full) for (const row of rows) if (row.values[column] !== 0) eliminate(row, pivotRow, column);
    for (let r = remaining.length - 1; r >= 0; r -= 1) if (remaining[r].nonZero === 0) remaining.splice(r, 1);
    rows.push(pivotRow);
    pivots.push(column);
  }
  return { rows: rows.map(toSparse), pivots };
}
