import { describe, expect, it } from 'vitest';
import { lusolve } from 'mathjs';
import { createIterationSolver } from '@api/chemistry/kinetics/solver/iteration-solver';
import { minimumDegreeOrder } from '@api/chemistry/kinetics/solver/minimum-degree';
import { fillPattern } from '@api/chemistry/kinetics/solver/sparse-lu';
import type { SparsePattern } from '@api/chemistry/kinetics/solver/sparse-pattern';

function patternOf(rows: number[][]): SparsePattern {
  const rowStart = new Int32Array(rows.length + 1);
  const columns: number[] = [];
  rows.forEach((row, i) => {
    row.forEach((value, j) => value !== 0 && columns.push(j));
    rowStart[i + 1] = columns.length;
  });
  return { size: rows.length, rowStart, columns: Int32Array.from(columns) };
}

function valuesOf(rows: number[][]): Float64Array {
  return Float64Array.from(rows.flatMap((row) => row.filter((value) => value !== 0)));
}

/** Solves (d I − J) x = b with the iteration solver and with mathjs lusolve (a general-purpose reference). */
function compare(jacobian: number[][], diagonal: number, b: number[]): void {
  const solver = createIterationSolver(patternOf(jacobian));
  expect(solver.factor(diagonal, valuesOf(jacobian))).toBe(true);
  const x = Float64Array.from(b);
  solver.solve(x);
  const matrix = jacobian.map((row, i) => row.map((value, j) => (i === j ? diagonal : 0) - value));
  const expected = (lusolve(matrix, b) as number[][]).map((row) => row[0]);
  x.forEach((value, i) => expect(value).toBeCloseTo(expected[i], 10));
}

describe('the sparse linear algebra of the stage solves', () => {
  it('keeps an arrow matrix free of fill-in by eliminating the hub last (minimum degree)', () => {
    // Species 0 meets every other species, like OH in an atmospheric mechanism.
    const n = 8;
    const arrow = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => (i === j || i === 0 || j === 0 ? 1 : 0)));
    const order = minimumDegreeOrder(patternOf(arrow));
    // The hub goes once only one other species is left (the last two tie).
    expect([...order].indexOf(0)).toBeGreaterThanOrEqual(n - 2);
    const natural = fillPattern(patternOf(arrow));
    expect(natural.columns.length).toBe(n * n);
    const renumbered = arrow.map((_, i) => arrow[order[i]].map((__, j) => arrow[order[i]][order[j]]));
    expect(fillPattern(patternOf(renumbered)).columns.length).toBe(3 * n - 2);
  });

  it('solves like mathjs lusolve on a sparse 30 × 30 system', () => {
    const n = 30;
    const jacobian = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => ((i * 7 + j * 3) % 11 === 0 || i === j ? ((i + 2 * j) % 5) - 2.5 : 0)));
    compare(jacobian, 4, Array.from({ length: n }, (_, i) => Math.sin(i + 1)));
  });

  it('falls back to pivoting when a pivot of the fixed-pattern LU vanishes', () => {
    // d I − J = [[0, 1], [1, 0]]: no LU without a row exchange exists.
    compare([[2, -1], [-1, 2]], 2, [3, 5]);
  });
});
