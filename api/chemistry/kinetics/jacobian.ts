import { massActionPower } from './mass-action';
import type { RateSystem, SystemStep } from './rate-system';
import type { SparsePattern } from './solver/sparse-pattern';

/**
 * The analytic Jacobian ∂(dc/dt)/∂c of a mass-action system in compressed sparse rows.
 * For a side rate r = k Π c_l^ν_l, ∂r/∂c_j = k ν_j c_j^(ν_j−1) Π_{l≠j} c_l^ν_l; each such partial
 * is added, times the step's net coefficient of species i, into J[i][j]. The positions in the
 * value array are worked out once, so filling is a loop over precomputed targets.
 */
export interface MassActionJacobian {
  pattern: SparsePattern;
  fill(c: ArrayLike<number>, light: number, values: Float64Array): void;
}

interface Contribution {
  step: SystemStep;
  reverse: boolean;
  slot: number;
  targets: Int32Array;
  factors: Float64Array;
}

function sidePartial(k: number, index: Int32Array, coef: Float64Array, c: ArrayLike<number>, slot: number): number {
  let partial = k * coef[slot] * massActionPower(c[index[slot]], coef[slot] - 1);
  for (let l = 0; l < index.length; l++) if (l !== slot) partial *= massActionPower(c[index[l]], coef[l]);
  return Number.isFinite(partial) ? partial : 0;
}

function collectEntries(system: RateSystem, frozen: Uint8Array): Map<number, Set<number>> {
  const rows = new Map<number, Set<number>>();
  for (const step of system.steps) {
    const columns = step.kReverse === 0 ? [...step.reactantIndex] : [...step.reactantIndex, ...step.productIndex];
    for (const row of step.netIndex) {
      if (frozen[row]) continue;
      const set = rows.get(row) ?? new Set<number>();
      for (const column of columns) set.add(column);
      rows.set(row, set);
    }
  }
  return rows;
}

function buildPattern(size: number, rows: Map<number, Set<number>>): SparsePattern {
  const rowStart = new Int32Array(size + 1);
  const columns: number[] = [];
  for (let i = 0; i < size; i++) {
    const sorted = [...(rows.get(i) ?? [])].sort((a, b) => a - b);
    columns.push(...sorted);
    rowStart[i + 1] = columns.length;
  }
  return { size, rowStart, columns: Int32Array.from(columns) };
}

function position(pattern: SparsePattern, row: number, column: number): number {
  for (let p = pattern.rowStart[row]; p < pattern.rowStart[row + 1]; p++) if (pattern.columns[p] === column) return p;
  throw new Error(`Jacobian entry (${row}, ${column}) missing from the pattern`);
}

function contributionsOf(step: SystemStep, reverse: boolean, pattern: SparsePattern, frozen: Uint8Array): Contribution[] {
  const index = reverse ? step.productIndex : step.reactantIndex;
  const sign = reverse ? -1 : 1;
  const rows = [...step.netIndex.keys()].filter((j) => !frozen[step.netIndex[j]]);
  return [...index].map((column, slot) => ({
    step,
    reverse,
    slot,
    targets: Int32Array.from(rows.map((j) => position(pattern, step.netIndex[j], column))),
    factors: Float64Array.from(rows.map((j) => sign * step.netCoef[j])),
  }));
}

/** Builds the sparse Jacobian of a system, leaving out the rows of frozen (fixed) species. */
export function massActionJacobian(system: RateSystem, frozen: Uint8Array): MassActionJacobian {
  const pattern = buildPattern(system.speciesCount, collectEntries(system, frozen));
  const contributions = system.steps.flatMap((step) => [
    ...contributionsOf(step, false, pattern, frozen),
    ...(step.kReverse === 0 ? [] : contributionsOf(step, true, pattern, frozen)),
  ]);
  const fill = (c: ArrayLike<number>, light: number, values: Float64Array): void => {
    values.fill(0);
    for (const { step, reverse, slot, targets, factors } of contributions) {
      const partial = reverse
        ? sidePartial(step.kReverse, step.productIndex, step.productCoef, c, slot)
        : sidePartial(step.photolysis ? step.kForward * light : step.kForward, step.reactantIndex, step.reactantCoef, c, slot);
      if (partial === 0) continue;
      for (let t = 0; t < targets.length; t++) values[targets[t]] += factors[t] * partial;
    }
  };
  return { pattern, fill };
}
