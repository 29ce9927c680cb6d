import { gcd } from './fraction';
import { rank, type SparseRow } from './integer-matrix';

/** Orients a route so that one-way steps run forwards when that is possible, else first entry positive. */
export function orient(sigma: bigint[], reversible: readonly boolean[]): bigint[] {
  let forwards = false;
  let backwards = false;
  sigma.forEach((value, step) => {
    if (reversible[step] || value === 0n) return;
    if (value > 0n) forwards = true;
    else backwards = true;
  });
  const first = sigma.find((value) => value !== 0n) ?? 0n;
  const flip = backwards ? !forwards : !forwards && first < 0n;
  return flip ? sigma.map((value) => -value) : sigma;
}

/** True when no one-way step runs backwards. */
export function feasible(sigma: readonly bigint[], reversible: readonly boolean[]): boolean {
  return sigma.every((value, step) => reversible[step] || value >= 0n);
}

export function supportOf(sigma: readonly bigint[]): Set<number> {
  const steps = new Set<number>();
  sigma.forEach((value, step) => value !== 0n && steps.add(step));
  return steps;
}

function coprime(sigma: bigint[]): bigint[] {
  let divisor = 0n;
  for (const value of sigma) divisor = gcd(divisor, value);
  return divisor > 1n ? sigma.map((value) => value / divisor) : sigma;
}

function toRow(sigma: readonly bigint[]): SparseRow {
  const row: SparseRow = new Map();
  sigma.forEach((value, step) => value !== 0n && row.set(step, value));
  return row;
}

/** Picks, in order, the vectors that raise the rank, until `dimension` is reached. */
export function independentSubset(candidates: readonly bigint[][], dimension: number, stepCount: number): bigint[][] {
  const chosen: bigint[][] = [];
  for (const candidate of candidates) {
    if (chosen.length === dimension) break;
    const rows = [...chosen, candidate].map(toRow);
    if (rank(rows, stepCount) > chosen.length) chosen.push(candidate);
  }
  return chosen;
}

/**
 * A non-negative route that uses every step used by any of `candidates`: the sum of the
 * feasible candidates (weighted 1, 2, 3… when a plain sum cancels a reversible step), or null.
 */
export function coveringRoute(candidates: readonly bigint[][], reversible: readonly boolean[]): bigint[] | null {
  const usable = candidates.filter((sigma) => feasible(sigma, reversible));
  if (usable.length === 0) return null;
  const wanted = new Set(candidates.flatMap((sigma) => [...supportOf(sigma)]));
  for (const weighted of [false, true]) {
    const total = new Array<bigint>(reversible.length).fill(0n);
    usable.forEach((sigma, index) => sigma.forEach((value, step) => (total[step] += value * (weighted ? BigInt(index + 1) : 1n))));
    if (supportOf(total).size === wanted.size && [...wanted].every((step) => total[step] !== 0n) && feasible(total, reversible)) return coprime(total);
  }
  return null;
}

export function sameRoute(a: readonly bigint[], b: readonly bigint[]): boolean {
  return a.length === b.length && a.every((value, index) => value === b[index]);
}

/**
 * σ made to run its one-way steps forwards by adding feasible routes (`helpers`, the smallest first,
 * so that the fewest other steps are drawn in) through the steps it runs backwards (−F3 becomes
 * +B3 by adding the null cycle F3 + B3), or null when some backward step
 * has no such route. Adding a feasible route never lowers a one-way entry, so each round removes
 * one backward step for good.
 */
export function runForwards(sigma: readonly bigint[], helpers: readonly bigint[][], reversible: readonly boolean[]): bigint[] | null {
  let current = sigma.slice();
  for (;;) {
    const step = current.findIndex((value, index) => !reversible[index] && value < 0n);
    if (step < 0) return current.some((value) => value !== 0n) ? coprime(current) : null;
    const helper = helpers.find((route) => route[step] > 0n);
    if (!helper) return null;
    const times = (-current[step] + helper[step] - 1n) / helper[step];
    current = current.map((value, index) => value + times * helper[index]);
  }
}
