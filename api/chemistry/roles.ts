import type { SpeciesRole } from './analysis-types';
import type { Fraction } from './fraction';
import type { RegisteredSpecies } from './species-registry';
import type { StepModel } from './step-model';

const FIXED_ROLES: Partial<Record<RegisteredSpecies['kind'], SpeciesRole>> = { photon: 'photon', 'third-body': 'third-body', site: 'site' };

/** Which side each species is first met on, walking the route's steps in order (σ < 0 swaps the sides); σ is by position in `steps`. */
function firstSides(steps: readonly StepModel[], sigma: readonly bigint[]): Map<string, 'reactant' | 'product'> {
  const first = new Map<string, 'reactant' | 'product'>();
  for (let position = 0; position < steps.length; position += 1) {
    const step = steps[position];
    const value = sigma[position];
    if (!value) continue;
    const [left, right] = value > 0n ? [step.reactants, step.products] : [step.products, step.reactants];
    for (const term of left) if (!first.has(term.species.key)) first.set(term.species.key, 'reactant');
    for (const term of right) if (!first.has(term.species.key)) first.set(term.species.key, 'product');
  }
  return first;
}

/**
 * Roles from one route (analysis.md step 5): a net-consumed species is a reactant, a net-formed
 * one a product; a species with zero net is a catalyst when first met as a reactant and an
 * intermediate when first met as a product; M, hν and `*` keep their own roles. Species the
 * route does not touch are intermediates when the routes cancel them (a pinned intermediate, or one
 * that only other routes use), else `unused`.
 */
export function assignRoles(
  species: readonly RegisteredSpecies[],
  steps: readonly StepModel[],
  sigma: readonly bigint[] | null,
  net: ReadonlyMap<string, Fraction>,
  intermediates: ReadonlySet<string> = new Set(),
): Map<string, SpeciesRole> {
  const roles = new Map<string, SpeciesRole>();
  const first = sigma ? firstSides(steps, sigma) : new Map<string, 'reactant' | 'product'>();
  for (const item of species) {
    const fixed = FIXED_ROLES[item.kind];
    const change = net.get(item.key);
    const side = first.get(item.key);
    if (fixed) roles.set(item.key, fixed);
    else if (change && !change.isZero()) roles.set(item.key, change.sign() < 0 ? 'reactant' : 'product');
    else if (side) roles.set(item.key, side === 'reactant' ? 'catalyst' : 'intermediate');
    else roles.set(item.key, intermediates.has(item.key) ? 'intermediate' : 'unused');
  }
  return roles;
}
