import { gcd } from './fraction';
import type { SparseRow } from './integer-matrix';

/** Rows of the enumeration tableau above this count stop the enumeration (bounded work). */
export const DIRECT_ROUTE_ROW_LIMIT = 5_000;
/** Support comparisons above this count stop it too: the elementarity test is the costly part. */
export const DIRECT_ROUTE_WORK_LIMIT = 5_000_000;

interface TableauRow {
  /** Balance of each intermediate, for the part not processed yet. */
  values: bigint[];
  /** Multiplier of each step direction (≥ 0). */
  coefs: bigint[];
  /** Bit d set when direction d is used. */
  support: bigint;
}

export interface DirectRoutes {
  routes: bigint[][];
  /** False when the work limit stopped the enumeration (the list is then incomplete). */
  complete: boolean;
}

interface Direction {
  step: number;
  sign: bigint;
}

function directionsOf(reversible: readonly boolean[]): Direction[] {
  const directions: Direction[] = [];
  reversible.forEach((both, step) => {
    directions.push({ step, sign: 1n });
    if (both) directions.push({ step, sign: -1n });
  });
  return directions;
}

function initialRows(intermediateRows: readonly SparseRow[], directions: readonly Direction[]): TableauRow[] {
  return directions.map((direction, d) => ({
    values: intermediateRows.map((row) => (row.get(direction.step) ?? 0n) * direction.sign),
    coefs: directions.map((_, e) => (e === d ? 1n : 0n)),
    support: 1n << BigInt(d),
  }));
}

function combine(p: TableauRow, q: TableauRow, k: number): TableauRow {
  const a = -q.values[k];
  const b = p.values[k];
  const values = p.values.map((value, i) => a * value + b * q.values[i]);
  const coefs = p.coefs.map((value, i) => a * value + b * q.coefs[i]);
  let divisor = 0n;
  for (const value of coefs) divisor = gcd(divisor, value);
  const scale = (values: bigint[]) => (divisor > 1n ? values.map((value) => value / divisor) : values);
  return { values: scale(values), coefs: scale(coefs), support: p.support | q.support };
}

/** Elementarity: no other row uses only directions that the union of p and q uses. */
function elementary(union: bigint, rows: readonly TableauRow[], p: TableauRow, q: TableauRow): boolean {
  for (const row of rows) if (row !== p && row !== q && (row.support & ~union) === 0n) return false;
  return true;
}

function processIntermediate(rows: TableauRow[], k: number, budget: { work: number }): TableauRow[] | null {
  const next = rows.filter((row) => row.values[k] === 0n);
  const positive = rows.filter((row) => row.values[k] > 0n);
  const negative = rows.filter((row) => row.values[k] < 0n);
  for (const p of positive) {
    for (const q of negative) {
      budget.work += rows.length;
      if (budget.work > DIRECT_ROUTE_WORK_LIMIT) return null;
      const union = p.support | q.support;
      if (elementary(union, rows, p, q)) next.push(combine(p, q, k));
      if (next.length > DIRECT_ROUTE_ROW_LIMIT) return null;
    }
  }
  return next;
}

function toRoute(row: TableauRow, directions: readonly Direction[], stepCount: number): bigint[] {
  const sigma = new Array<bigint>(stepCount).fill(0n);
  row.coefs.forEach((coef, d) => (sigma[directions[d].step] += coef * directions[d].sign));
  let divisor = 0n;
  for (const value of sigma) divisor = gcd(divisor, value);
  return divisor > 1n ? sigma.map((value) => value / divisor) : sigma;
}

/**
 * Direct routes: the routes whose set of steps contains no other route's set (support-minimal
 * vectors of the null space that run one-way steps forwards only). Reversible steps are split
 * into two one-way directions and the extreme rays of the resulting pointed cone are found by
 * the double-description method, one intermediate at a time; the trivial forward-plus-backward
 * pairs are dropped and ± duplicates merged.
 */
export function directRoutes(intermediateRows: readonly SparseRow[], reversible: readonly boolean[]): DirectRoutes {
  const directions = directionsOf(reversible);
  let rows = initialRows(intermediateRows, directions);
  const budget = { work: 0 };
  for (let k = 0; k < intermediateRows.length; k += 1) {
    const next = processIntermediate(rows, k, budget);
    if (!next) return { routes: [], complete: false };
    rows = next;
  }
  const seen = new Set<string>();
  const routes: bigint[][] = [];
  for (const row of rows) {
    const sigma = toRoute(row, directions, reversible.length);
    if (sigma.every((value) => value === 0n)) continue;
    const first = sigma.find((value) => value !== 0n) as bigint;
    const key = (first > 0n ? sigma : sigma.map((value) => -value)).join(',');
    if (seen.has(key)) continue;
    seen.add(key);
    routes.push(sigma);
  }
  return { routes, complete: true };
}
