/**
 * LU factorisation with partial pivoting of a dense row-major n×n matrix, in place (Golub & Van
 * Loan, Matrix Computations, algorithm 3.4.1). Zero multipliers are skipped, which makes the
 * elimination cheap for the sparse iteration matrices of reaction systems.
 * Returns false when a pivot is exactly zero (singular matrix).
 */
export function factorLu(a: Float64Array, n: number, pivots: Int32Array): boolean {
  for (let k = 0; k < n; k++) {
    const pivotRow = largestInColumn(a, n, k);
    pivots[k] = pivotRow;
    if (a[pivotRow * n + k] === 0) return false;
    if (pivotRow !== k) swapRows(a, n, k, pivotRow);
    eliminateBelow(a, n, k);
  }
  return true;
}

function largestInColumn(a: Float64Array, n: number, k: number): number {
  let best = k;
  let largest = Math.abs(a[k * n + k]);
  for (let i = k + 1; i < n; i++) {
    const size = Math.abs(a[i * n + k]);
    if (size > largest) {
      largest = size;
      best = i;
    }
  }
  return best;
}

function swapRows(a: Float64Array, n: number, r1: number, r2: number): void {
  for (let j = 0; j < n; j++) {
    const held = a[r1 * n + j];
    a[r1 * n + j] = a[r2 * n + j];
    a[r2 * n + j] = held;
  }
}

function eliminateBelow(a: Float64Array, n: number, k: number): void {
  const pivotStart = k * n;
  const inversePivot = 1 / a[pivotStart + k];
  for (let i = k + 1; i < n; i++) {
    const rowStart = i * n;
    if (a[rowStart + k] === 0) continue;
    const multiplier = a[rowStart + k] * inversePivot;
    a[rowStart + k] = multiplier;
    for (let j = k + 1; j < n; j++) {
      const upper = a[pivotStart + j];
      if (upper !== 0) a[rowStart + j] -= multiplier * upper;
    }
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
