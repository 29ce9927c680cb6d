import { directRoutes } from './direct-routes';
import { Fraction } from './fraction';
import { nullSpace } from './integer-matrix';
import { coveringRoute, feasible, independentSubset, orient, runForwards, sameRoute, supportOf } from './route-vectors';
import { rowsFor, type Stoichiometry } from './stoichiometry';

/** One route: stoichiometric numbers per step (exact integers). */
export interface RouteVector {
  sigma: bigint[];
  /** null when direct routes were not listed (too many steps), so no route is known to be direct or not. */
  direct: boolean | null;
  basis: boolean;
}

export interface RouteSet {
  routes: RouteVector[];
  /** Index of the overall route in `routes`, or null. */
  overall: number | null;
  /** null when direct routes were not listed (too many steps); false when the work limit stopped them. */
  directComplete: boolean | null;
}

/** Σ σ_s ν_{s,i} per species (zeros dropped), exactly, in order of first appearance. */
export function netOfRoute(stoichiometry: Stoichiometry, sigma: readonly bigint[], skip: ReadonlySet<string>): Map<string, Fraction> {
  const totals = new Map<string, Fraction>();
  sigma.forEach((multiplier, step) => {
    if (multiplier === 0n) return;
    const factor = new Fraction(multiplier);
    for (const [key, value] of stoichiometry.columns[step]) {
      if (!skip.has(key)) totals.set(key, (totals.get(key) ?? Fraction.ZERO).add(value.mul(factor)));
    }
  });
  const net = new Map<string, Fraction>();
  for (const key of stoichiometry.rows.keys()) {
    const total = totals.get(key);
    if (total && !total.isZero()) net.set(key, total);
  }
  return net;
}

/**
 * The raw basis reordered and repaired so that vectors which run one-way steps forwards come
 * first: the feasible ones, then the others repaired with feasible routes, then the rest (analysis.md
 * asks for σ ≥ 0 on one-way steps wherever a non-negative basis exists; the direct routes give one
 * only when their listing is complete). Null when nothing could be repaired: the raw order stands.
 */
function forwardsFirst(rawBasis: readonly bigint[][], direct: readonly bigint[][], reversible: readonly boolean[]): bigint[][] | null {
  const forwards = rawBasis.filter((sigma) => feasible(sigma, reversible));
  const backwards = rawBasis.filter((sigma) => !feasible(sigma, reversible));
  if (backwards.length === 0) return null;
  const helpers = [...direct, ...forwards].map((sigma) => ({ sigma, size: supportOf(sigma).size })).sort((a, b) => a.size - b.size).map(({ sigma }) => sigma);
  const repaired = backwards.map((sigma) => runForwards(sigma, helpers, reversible)).filter((sigma): sigma is bigint[] => sigma !== null);
  return repaired.length > 0 ? [...forwards, ...repaired, ...backwards] : null;
}

function byPreference(productive: (sigma: bigint[]) => boolean) {
  const size = (sigma: bigint[]) => sigma.filter((value) => value !== 0n).length;
  return (a: bigint[], b: bigint[]) => Number(productive(b)) - Number(productive(a)) || size(a) - size(b);
}

/**
 * Routes of the mechanism for the chosen intermediates (Horiuti–Temkin): a basis of the null
 * space of their rows by exact elimination, preferring direct routes as basis vectors when the
 * mechanism has at most `maxDirectSteps` steps; the other direct routes; the overall route.
 */
export function findRoutes(stoichiometry: Stoichiometry, intermediates: readonly string[], maxDirectSteps: number): RouteSet {
  const { reversible, stepCount } = stoichiometry;
  const rows = rowsFor(stoichiometry, intermediates);
  const rawBasis = nullSpace(rows, stepCount).map((sigma) => orient(sigma, reversible));
  const skip = new Set([...intermediates, ...stoichiometry.aside]);
  const memo = new Map<bigint[], boolean>();
  const productive = (sigma: bigint[]) => {
    if (!memo.has(sigma)) memo.set(sigma, netOfRoute(stoichiometry, sigma, skip).size > 0);
    return memo.get(sigma) as boolean;
  };
  if (stepCount > maxDirectSteps) {
    const reordered = forwardsFirst(rawBasis, [], reversible);
    const basis = reordered ? independentSubset(reordered, rawBasis.length, stepCount) : rawBasis;
    const overall = coveringRoute(basis, reversible);
    return assemble(basis.map((sigma) => ({ sigma, direct: null, basis: true })), overall, null);
  }
  const enumerated = directRoutes(rows, reversible);
  const direct = enumerated.routes.map((sigma) => orient(sigma, reversible)).sort(byPreference(productive));
  const basis = independentSubset([...direct, ...(forwardsFirst(rawBasis, direct, reversible) ?? rawBasis)], rawBasis.length, stepCount);
  const isDirect = (sigma: bigint[]) => direct.some((route) => sameRoute(route, sigma));
  const listed: RouteVector[] = basis.map((sigma) => ({ sigma, direct: isDirect(sigma), basis: true }));
  for (const sigma of direct) if (!basis.some((chosen) => sameRoute(chosen, sigma))) listed.push({ sigma, direct: true, basis: false });
  const overall = enumerated.complete ? coveringRoute(direct, reversible) : coveringRoute(basis, reversible);
  return assemble(listed, overall, enumerated.complete);
}

function assemble(routes: RouteVector[], overall: bigint[] | null, directComplete: boolean | null): RouteSet {
  if (!overall) return { routes, overall: null, directComplete };
  const index = routes.findIndex((route) => sameRoute(route.sigma, overall));
  if (index >= 0) return { routes, overall: index, directComplete };
  routes.push({ sigma: overall, direct: directComplete === null ? null : false, basis: false });
  return { routes, overall: routes.length - 1, directComplete };
}
