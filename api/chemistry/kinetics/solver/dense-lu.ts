/**
 * LU factorisation with (threshold) partial pivoting of a dense row-major n×n matrix, in place (Golub & Van
 * Loan, Matrix Computations, algorithm 3.4.1). Zero multipliers are skipped and each row update
 * runs only over the pivot row's non-zeros, which makes the elimination cheap for the sparse
 * iteration matrices of reaction systems (cost grows with the fill-in, not with n³).
 * Returns false when a pivot is exactly zero (singular matrix).
 */
export function factorLu(a: Float64Array, n: number, pivots: Int32Array): boolean {
  const columns = new Int32Array(n);
  for (let k = 0; k < n; k++) {
    const pivotRow = choosePivot(a, n, k);
    pivots[k] = pivotRow;
    if (a[pivotRow * n + k] === 0) return false;
    if (pivotRow !== k) swapRows(a, n, k, pivotRow);
    eliminateBelow(a, n, k, columns);
  }
  return true;
}

/** Threshold partial pivoting: keep the diagonal while it is at least this fraction of the column's largest entry. */
const DIAGONAL_THRESHOLD = 0.1;

/**
 * The pivot row for column k: the diagonal when it is within the threshold of the largest entry
 * (which keeps a fill-reducing order intact; Duff, Erisman & Reid, Direct Methods for Sparse
 * Matrices, threshold pivoting), else the row with the largest entry.
 */
function choosePivot(a: Float64Array, n: number, k: number): number {
  let best = k;
  let largest = Math.abs(a[k * n + k]);
  for (let i = k + 1; i < n; i++) {
    const size = Math.abs(a[i * n + k]);
    if (size > largest) {
      largest = size;
      best = i;
    }
  }
  return Math.abs(a[k * n + k]) >= DIAGONAL_THRESHOLD * largest && largest > 0 ? k : best;
}

function swapRows(a: Float64Array, n: number, r1: number, r2: number): void {
  for (let j = 0; j < n; j++) {
    const held = a[r1 * n + j];
    a[r1 * n + j] = a[r2 * n + j];
    a[r2 * n + j] = held;
  }
}

/** Column indices of the non-zeros right of the diagonal in row k (reused buffer). */
function nonZerosRightOf(a: Float64Array, n: number, k: number, columns: Int32Array): number {
  let count = 0;
  const start = k * n;
  for (let j = k + 1; j < n; j++) if (a[start + j] !== 0) columns[count++] = j;
  return count;
}

function subtractDenseRow(a: Float64Array, n: number, k: number, i: number, multiplier: number): void {
  const pivotStart = k * n;
  const rowStart = i * n;
  for (let j = k + 1; j < n; j++) a[rowStart + j] -= multiplier * a[pivotStart + j];
}

function subtractSparseRow(a: Float64Array, n: number, k: number, i: number, multiplier: number, columns: Int32Array, count: number): void {
  const pivotStart = k * n;
  const rowStart = i * n;
  for (let c = 0; c < count; c++) {
    const j = columns[c];
    a[rowStart + j] -= multiplier * a[pivotStart + j];
  }
}

/** Row updates below pivot k; a mostly-full pivot row is swept contiguously, a sparse one by its non-zeros. */
function eliminateBelow(a: Float64Array, n: number, k: number, columns: Int32Array): void {
  const inversePivot = 1 / a[k * n + k];
  const count = nonZerosRightOf(a, n, k, columns);
  const dense = count > (n - k - 1) / 2;
  for (let i = k + 1; i < n; i++) {
    const below = a[i * n + k];
    if (below === 0) continue;
    const multiplier = below * inversePivot;
    a[i * n + k] = multiplier;
    if (dense) subtractDenseRow(a, n, k, i, multiplier);
    else subtractSparseRow(a, n, k, i, multiplier, columns, count);
  }
}

/** Solves A x = b in place in `b`, given the factors and pivots from factorLu. */
export function solveLu(a: Float64Array, n: number, pivots: Int32Array, b: Float64Array): void {
  for (let k = 0; k < n; k++) {
    const p = pivots[k];
    if (p !== k) {
      const held = b[k];
      b[k] = b[p];
      b[p] = held;
    }
  }
  for (let i = 1; i < n; i++) {
    let sum = b[i];
    for (let j = 0; j < i; j++) sum -= a[i * n + j] * b[j];
    b[i] = sum;
  }
  for (let i = n - 1; i >= 0; i--) {
    let sum = b[i];
    for (let j = i + 1; j < n; j++) sum -= a[i * n + j] * b[j];
    b[i] = sum / a[i * n + i];
  }
}
