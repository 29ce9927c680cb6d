/** One step in numeric form: index/coefficient arrays and rate constants at the run's conditions. */
export interface SystemStep {
  reactantIndex: Int32Array;
  reactantCoef: Float64Array;
  productIndex: Int32Array;
  productCoef: Float64Array;
  /** Net stoichiometry (products − reactants) with zero entries dropped. */
  netIndex: Int32Array;
  netCoef: Float64Array;
  /** Forward rate constant, [M] folded in; for photolysis the J at full light. */
  kForward: number;
  /** Reverse rate constant ([M] folded in), 0 for one-way steps. */
  kReverse: number;
  photolysis: boolean;
}

/** The mass-action system the solver integrates. */
export interface RateSystem {
  speciesCount: number;
  steps: SystemStep[];
  /** [M] used for the run, or null when no step needed it and it could not be computed. */
  thirdBody: number | null;
}

/** Builds the merged net stoichiometry of a step (a species on both sides counts once). */
export function netStoichiometry(
  reactants: { index: number; coef: number }[],
  products: { index: number; coef: number }[],
): { netIndex: Int32Array; netCoef: Float64Array } {
  const net = new Map<number, number>();
  for (const term of reactants) net.set(term.index, (net.get(term.index) ?? 0) - term.coef);
  for (const term of products) net.set(term.index, (net.get(term.index) ?? 0) + term.coef);
  const kept = [...net].filter(([, coef]) => coef !== 0);
  return {
    netIndex: Int32Array.from(kept.map(([index]) => index)),
    netCoef: Float64Array.from(kept.map(([, coef]) => coef)),
  };
}

/** Merges repeated species on one side (`A + A` is `2 A`) into index and coefficient arrays. */
export function mergeSide(terms: { index: number; coef: number }[]): { index: Int32Array; coef: Float64Array } {
  const merged = new Map<number, number>();
  for (const term of terms) merged.set(term.index, (merged.get(term.index) ?? 0) + term.coef);
  return { index: Int32Array.from(merged.keys()), coef: Float64Array.from(merged.values()) };
}
