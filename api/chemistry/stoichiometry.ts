import { Fraction, lcm } from './fraction';
import { isAside } from './species-model';
import { rank, type SparseRow } from './integer-matrix';
import { netOf, termsOf, type StepModel } from './step-model';

/** The stoichiometric matrix by species: key → (step index → ν), exact. */
export interface Stoichiometry {
  stepCount: number;
  reversible: boolean[];
  rows: Map<string, Map<number, Fraction>>;
  /** The same numbers by step: ν of each species the step changes. */
  columns: Map<string, Fraction>[];
  /** Keys that are not balanced in routes and are reported aside (hν, M). */
  aside: Set<string>;
  /** Rank of the rows of every balanced species, once computed (see fullRank). */
  fullRank?: number;
}

/** Builds ν for every species; photons and M are kept as rows but marked aside. */
export function buildStoichiometry(steps: readonly StepModel[]): Stoichiometry {
  const rows = new Map<string, Map<number, Fraction>>();
  const aside = new Set<string>();
  const columns: Map<string, Fraction>[] = [];
  steps.forEach((step, index) => {
    for (const term of termsOf(step)) {
      if (isAside(term.species)) aside.add(term.species.key);
    }
    const column = netOf(step);
    columns.push(column);
    for (const [key, value] of column) {
      let row = rows.get(key);
      if (!row) rows.set(key, (row = new Map()));
      row.set(index, value);
    }
  });
  return { stepCount: steps.length, reversible: steps.map((step) => step.reversible), rows, columns, aside };
}

/** One species' row scaled to integers (a row scale does not change the null space). */
export function integerRow(row: ReadonlyMap<number, Fraction>): SparseRow {
  let scale = 1n;
  for (const value of row.values()) scale = lcm(scale, value.den);
  const integers: SparseRow = new Map();
  for (const [column, value] of row) integers.set(column, (value.num * scale) / value.den);
  return integers;
}

/** Integer rows for the given species keys (species that no step changes give no row). */
export function rowsFor(stoichiometry: Stoichiometry, keys: Iterable<string>): SparseRow[] {
  const rows: SparseRow[] = [];
  for (const key of keys) {
    const row = stoichiometry.rows.get(key);
    if (row && row.size > 0) rows.push(integerRow(row));
  }
  return rows;
}

/** Rank of the rows of all balanced species; computed once per stoichiometry. */
export function fullRank(stoichiometry: Stoichiometry): number {
  stoichiometry.fullRank ??= rank(rowsFor(stoichiometry, balancedKeys(stoichiometry)), stoichiometry.stepCount);
  return stoichiometry.fullRank;
}

/** Keys of the species that routes balance or report (everything except hν and M). */
export function balancedKeys(stoichiometry: Stoichiometry): string[] {
  return [...stoichiometry.rows.keys()].filter((key) => !stoichiometry.aside.has(key));
}
