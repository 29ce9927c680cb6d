import { factorLu, solveLu } from './dense-lu';
import { minimumDegreeOrder } from './minimum-degree';
import { factorSparseLu, fillPattern, solveSparseLu, type FilledPattern } from './sparse-lu';
import type { SparsePattern } from './sparse-pattern';

/** Factors and solves with M = d·I − J, J given as values over a fixed sparse pattern. */
export interface IterationSolver {
  /** Returns false when M is singular. */
  factor(diagonal: number, jacobian: Float64Array): boolean;
  /** Solves M x = b in place. */
  solve(b: Float64Array): void;
}

/** The pattern of I + J with species renumbered so that species `order[k]` becomes k. */
function renumbered(pattern: SparsePattern, position: Int32Array): SparsePattern {
  const n = pattern.size;
  const rows: number[][] = Array.from({ length: n }, (_, k) => [k]);
  for (let i = 0; i < n; i++) {
    for (let p = pattern.rowStart[i]; p < pattern.rowStart[i + 1]; p++) rows[position[i]].push(position[pattern.columns[p]]);
  }
  const sorted = rows.map((row) => [...new Set(row)].sort((a, b) => a - b));
  const rowStart = new Int32Array(n + 1);
  sorted.forEach((row, i) => (rowStart[i + 1] = rowStart[i] + row.length));
  return { size: n, rowStart, columns: Int32Array.from(sorted.flat()) };
}

function entryIndex(f: FilledPattern, row: number, column: number): number {
  for (let p = f.rowStart[row]; p < f.rowStart[row + 1]; p++) if (f.columns[p] === column) return p;
  throw new Error(`entry (${row}, ${column}) missing from the filled pattern`);
}

/** Where each CSR entry of J lands among the filled factor's values. */
function factorTargets(pattern: SparsePattern, position: Int32Array, filled: FilledPattern): Int32Array {
  const target = new Int32Array(pattern.columns.length);
  for (let i = 0; i < pattern.size; i++) {
    for (let p = pattern.rowStart[i]; p < pattern.rowStart[i + 1]; p++) target[p] = entryIndex(filled, position[i], position[pattern.columns[p]]);
  }
  return target;
}

/** Dense LU with pivoting over the renumbered matrix: used when a sparse pivot is too small. */
function denseFallback(filled: FilledPattern) {
  const n = filled.size;
  const matrix = new Float64Array(n * n);
  const pivots = new Int32Array(n);
  return {
    factor(values: Float64Array): boolean {
      matrix.fill(0);
      for (let i = 0; i < n; i++) for (let p = filled.rowStart[i]; p < filled.rowStart[i + 1]; p++) matrix[i * n + filled.columns[p]] = values[p];
      return factorLu(matrix, n, pivots);
    },
    solve: (x: Float64Array) => solveLu(matrix, n, pivots, x),
  };
}

/**
 * The linear algebra of the Rosenbrock stages. Species are renumbered in a minimum-degree order,
 * the fill-in of LU without pivoting is worked out once, and each step factors M = d·I − J over
 * that fixed pattern (sparse, no searching); M is diagonally dominant for small steps, and when a
 * pivot is nonetheless tiny the step falls back to a dense LU with partial pivoting.
 */
export function createIterationSolver(pattern: SparsePattern): IterationSolver {
  const n = pattern.size;
  const position = new Int32Array(n);
  minimumDegreeOrder(pattern).forEach((species, k) => (position[species] = k));
  const filled = fillPattern(renumbered(pattern, position));
  const target = factorTargets(pattern, position, filled);
  const values = new Float64Array(filled.columns.length);
  const backup = new Float64Array(filled.columns.length);
  const workRow = new Float64Array(n);
  const scratch = new Float64Array(n);
  const fallback = denseFallback(filled);
  let sparse = true;
  return {
    factor(diagonal, jacobian) {
      values.fill(0);
      for (let k = 0; k < n; k++) values[filled.diagonal[k]] = diagonal;
      for (let p = 0; p < jacobian.length; p++) values[target[p]] -= jacobian[p];
      backup.set(values);
      sparse = factorSparseLu(filled, values, workRow);
      return sparse || fallback.factor(backup);
    },
    solve(b) {
      for (let i = 0; i < n; i++) scratch[position[i]] = b[i];
      if (sparse) solveSparseLu(filled, values, scratch);
      else fallback.solve(scratch);
      for (let i = 0; i < n; i++) b[i] = scratch[position[i]];
    },
  };
}
