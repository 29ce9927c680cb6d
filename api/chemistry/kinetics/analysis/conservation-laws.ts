import type { RateSystem } from '../rate-system';

/** A linear combination Σ w_i c_i that no step changes, and the species whose equation it replaces. */
export interface ConservationLaw {
  weights: Float64Array;
  pivot: number;
}

const PIVOT_TOLERANCE = 1e-10;

/** Dense matrix (steps × free species) of net stoichiometric coefficients. */
function stoichiometryRows(system: RateSystem, free: number[]): number[][] {
  const column = new Map(free.map((species, k) => [species, k]));
  return system.steps.map((step) => {
    const row = new Array<number>(free.length).fill(0);
    step.netIndex.forEach((species, j) => {
      const k = column.get(species);
      if (k !== undefined) row[k] = step.netCoef[j];
    });
    return row;
  });
}

/** Reduced row echelon form in place; returns the pivot column of each pivot row. */
function reduceRows(rows: number[][], width: number): number[] {
  const pivotColumns: number[] = [];
  let r = 0;
  for (let c = 0; c < width && r < rows.length; c++) {
    let best = r;
    for (let i = r + 1; i < rows.length; i++) if (Math.abs(rows[i][c]) > Math.abs(rows[best][c])) best = i;
    if (Math.abs(rows[best][c]) < PIVOT_TOLERANCE) continue;
    [rows[r], rows[best]] = [rows[best], rows[r]];
    const pivot = rows[r][c];
    rows[r] = rows[r].map((value) => value / pivot);
    for (let i = 0; i < rows.length; i++) {
      if (i === r || rows[i][c] === 0) continue;
      const factor = rows[i][c];
      rows[i] = rows[i].map((value, j) => value - factor * rows[r][j]);
    }
    pivotColumns.push(c);
    r++;
  }
  return pivotColumns;
}

/**
 * A basis of the conservation laws among the free (not fixed) species: the null space of the
 * stoichiometric matrix, w · ν_s = 0 for every step s (e.g. element or catalyst-site totals).
 * Each law has a distinct pivot species (a free variable of the elimination) whose coefficient is 1
 * and which no other law contains, so its rate equation can be swapped for the law.
 */
export function conservationLaws(system: RateSystem, fixed: Uint8Array): ConservationLaw[] {
  const free = [...Array(system.speciesCount).keys()].filter((i) => !fixed[i]);
  const rows = stoichiometryRows(system, free);
  const pivotColumns = reduceRows(rows, free.length);
  const freeColumns = [...free.keys()].filter((k) => !pivotColumns.includes(k));
  return freeColumns.map((k) => {
    const weights = new Float64Array(system.speciesCount);
    weights[free[k]] = 1;
    pivotColumns.forEach((c, r) => {
      weights[free[c]] = -rows[r][k];
    });
    return { weights, pivot: free[k] };
  });
}
