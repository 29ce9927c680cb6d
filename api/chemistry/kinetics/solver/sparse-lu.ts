import type { SparsePattern } from './sparse-pattern';

/**
 * The fill-in pattern of an LU factorisation without pivoting, worked out once: row i of L + U
 * holds row i of the matrix plus, for each k < i in it (in increasing order), the columns right of
 * k in U's row k (symbolic Gaussian elimination; Duff, Erisman & Reid, Direct Methods for Sparse
 * Matrices, ch. 9). Rows are CSR with sorted columns; `diagonal[i]` points at entry (i, i).
 */
export interface FilledPattern {
  size: number;
  rowStart: Int32Array;
  columns: Int32Array;
  diagonal: Int32Array;
}

function filledRow(i: number, rows: number[][], upperRows: number[][], marked: Uint8Array): number[] {
  for (const j of rows[i]) marked[j] = 1;
  marked[i] = 1;
  for (let k = 0; k < i; k++) if (marked[k]) for (const j of upperRows[k]) marked[j] = 1;
  const row: number[] = [];
  for (let j = 0; j < marked.length; j++) if (marked[j]) row.push(j);
  marked.fill(0);
  return row;
}

/** Symbolic factorisation of a pattern whose rows and columns are already in elimination order. */
export function fillPattern(pattern: SparsePattern): FilledPattern {
  const n = pattern.size;
  const rows = Array.from({ length: n }, (_, i) => [...pattern.columns.subarray(pattern.rowStart[i], pattern.rowStart[i + 1])]);
  const marked = new Uint8Array(n);
  const filled: number[][] = [];
  const upperRows: number[][] = [];
  for (let i = 0; i < n; i++) {
    filled.push(filledRow(i, rows, upperRows, marked));
    upperRows.push(filled[i].filter((j) => j > i));
  }
  const rowStart = new Int32Array(n + 1);
  filled.forEach((row, i) => (rowStart[i + 1] = rowStart[i] + row.length));
  const columns = Int32Array.from(filled.flat());
  const diagonal = Int32Array.from(filled, (row, i) => rowStart[i] + row.indexOf(i));
  return { size: n, rowStart, columns, diagonal };
}

/**
 * Numeric LU in place over a filled pattern (row-by-row Doolittle with a dense work row), without
 * pivoting. Returns false when a pivot is tiny against its row (|u_ii| ≤ 1e-12 · max |row|), so the
 * caller can fall back to a pivoting factorisation.
 */
export function factorSparseLu(f: FilledPattern, values: Float64Array, work: Float64Array): boolean {
  for (let i = 0; i < f.size; i++) {
    let largest = 0;
    for (let p = f.rowStart[i]; p < f.rowStart[i + 1]; p++) {
      work[f.columns[p]] = values[p];
      largest = Math.max(largest, Math.abs(values[p]));
    }
    for (let p = f.rowStart[i]; p < f.diagonal[i]; p++) {
      const k = f.columns[p];
      const multiplier = work[k] / values[f.diagonal[k]];
      work[k] = multiplier;
      if (multiplier === 0) continue;
      for (let q = f.diagonal[k] + 1; q < f.rowStart[k + 1]; q++) work[f.columns[q]] -= multiplier * values[q];
    }
    for (let p = f.rowStart[i]; p < f.rowStart[i + 1]; p++) {
      values[p] = work[f.columns[p]];
      work[f.columns[p]] = 0;
    }
    if (!(Math.abs(values[f.diagonal[i]]) > 1e-12 * largest)) return false;
  }
  return true;
}

/** Solves (LU) x = b in place with the factors from factorSparseLu. */
export function solveSparseLu(f: FilledPattern, values: Float64Array, x: Float64Array): void {
  for (let i = 0; i < f.size; i++) {
    let sum = x[i];
    for (let p = f.rowStart[i]; p < f.diagonal[i]; p++) sum -= values[p] * x[f.columns[p]];
    x[i] = sum;
  }
  for (let i = f.size - 1; i >= 0; i--) {
    let sum = x[i];
    for (let p = f.diagonal[i] + 1; p < f.rowStart[i + 1]; p++) sum -= values[p] * x[f.columns[p]];
    x[i] = sum / values[f.diagonal[i]];
  }
}
