/**
 * The routes, in the order given, that are linearly independent of the ones before them
 * (Gram–Schmidt on the stoichiometric-number vectors): a basis to fit step rates with. Lists of
 * routes often add direct routes that are sums of basis routes; those are left out.
 */
export function independentRoutes(routes: number[][]): number[] {
  const basis: number[][] = [];
  const kept: number[] = [];
  routes.forEach((sigma, r) => {
    const remainder = [...sigma];
    for (const unit of basis) {
      const projection = unit.reduce((sum, value, s) => sum + value * remainder[s], 0);
      unit.forEach((value, s) => (remainder[s] -= projection * value));
    }
    const size = Math.hypot(...remainder);
    if (size <= 1e-9 * Math.max(Math.hypot(...sigma), 1e-300)) return;
    basis.push(remainder.map((value) => value / size));
    kept.push(r);
  });
  return kept;
}
