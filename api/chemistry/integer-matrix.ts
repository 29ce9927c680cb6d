import { gcd, lcm } from './fraction';
import { Overflow, reduceNumbers } from './integer-matrix-fast';

/** A sparse row: column index → non-zero integer. */
export type SparseRow = Map<number, bigint>;

/** Row echelon form: row i has its pivot in column `pivots[i]`; every other row is 0 there. */
export interface Echelon {
  rows: SparseRow[];
  pivots: number[];
}

function abs(value: bigint): bigint {
  return value < 0n ? -value : value;
}

/** Divides a row by the gcd of its entries so that numbers stay small. */
function normalise(row: SparseRow): void {
  let divisor = 0n;
  for (const value of row.values()) divisor = gcd(divisor, value);
  if (divisor > 1n) for (const [column, value] of row) row.set(column, value / divisor);
}

/** Makes `row[column]` zero with an integer combination of `row` and `pivotRow`. */
function eliminate(row: SparseRow, pivotRow: SparseRow, column: number): void {
  const a = pivotRow.get(column) as bigint;
  const b = row.get(column) as bigint;
  const divisor = gcd(a, b);
  const rowFactor = a / divisor;
  const pivotFactor = b / divisor;
  for (const [key, value] of row) row.set(key, value * rowFactor);
  for (const [key, value] of pivotRow) {
    const next = (row.get(key) ?? 0n) - value * pivotFactor;
    if (next === 0n) row.delete(key);
    else row.set(key, next);
  }
  normalise(row);
}

/** Picks the sparsest remaining row with a non-zero entry in `column` (keeps fill-in low). */
function pickPivot(rows: SparseRow[], column: number): number {
  let best = -1;
  for (let index = 0; index < rows.length; index += 1) {
    if (rows[index].has(column) && (best < 0 || rows[index].size < rows[best].size)) best = index;
  }
  return best;
}

/**
 * Fully reduced echelon form of an integer matrix by fraction-free Gauss–Jordan elimination,
 * exact: on safe-integer numbers while they suffice, else on BigInt. The input is not changed.
 */
export function reduce(input: readonly SparseRow[], columnCount: number): Echelon {
  try {
    const fast = reduceNumbers(input, columnCount);
    const rows = fast.rows.map((row) => new Map([...row].map(([column, value]) => [column, BigInt(value)])));
    return { rows, pivots: fast.pivots };
  } catch (error) {
    if (!(error instanceof Overflow)) throw error;
    return reduceBig(input, columnCount);
  }
}

/** The same elimination on BigInt, for matrices whose numbers outgrow 2^53. */
export function reduceBig(input: readonly SparseRow[], columnCount: number): Echelon {
  const remaining = input.filter((row) => row.size > 0).map((row) => new Map(row));
  const rows: SparseRow[] = [];
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

/**
 * A basis of the null space { x : A x = 0 } of an integer matrix, one coprime integer vector per
 * free column (that column's entry is positive). With row i of the reduced form holding p_i in its
 * pivot column c_i, x_f = L and x_{c_i} = −a_{i,f}·L / p_i, where L is the lcm of the |p_i| involved.
 */
export function nullSpace(input: readonly SparseRow[], columnCount: number): bigint[][] {
  const { rows, pivots } = reduce(input, columnCount);
  const pivotSet = new Set(pivots);
  const basis: bigint[][] = [];
  for (let free = 0; free < columnCount; free += 1) {
    if (pivotSet.has(free)) continue;
    const involved = rows.map((row, index) => ({ index, entry: row.get(free), pivot: row.get(pivots[index]) as bigint })).filter((item) => item.entry !== undefined);
    let scale = 1n;
    for (const { pivot } of involved) scale = lcm(scale, abs(pivot));
    const vector = new Array<bigint>(columnCount).fill(0n);
    vector[free] = scale;
    for (const { index, entry, pivot } of involved) vector[pivots[index]] = (-(entry as bigint) * scale) / pivot;
    let divisor = 0n;
    for (const value of vector) if (value !== 0n) divisor = gcd(divisor, value);
    basis.push(divisor > 1n ? vector.map((value) => value / divisor) : vector);
  }
  return basis;
}

/** Rank of an integer matrix. */
export function rank(input: readonly SparseRow[], columnCount: number): number {
  try {
    return reduceNumbers(input, columnCount, false).pivots.length;
  } catch (error) {
    if (!(error instanceof Overflow)) throw error;
    return reduceBig(input, columnCount).pivots.length;
  }
}

/** |x| for BigInt, exported for callers that orient vectors. */
export { abs as absBigInt };
