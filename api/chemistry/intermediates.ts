import { rank } from './integer-matrix';
import type { RegisteredSpecies } from './species-registry';
import { balancedKeys, rowsFor, type Stoichiometry } from './stoichiometry';

/** Which species routes must cancel, and why (analysis.md, "Routes", step 1). */
export interface IntermediateChoice {
  keys: string[];
  explanation: string;
  /** Whether some route has a non-empty net reaction with this choice. */
  productive: boolean;
}

function formedAndConsumed(stoichiometry: Stoichiometry, key: string): boolean {
  let formed = false;
  let consumed = false;
  for (const [step, value] of stoichiometry.rows.get(key) ?? []) {
    const reversible = stoichiometry.reversible[step];
    if (value.sign() > 0 || reversible) formed = true;
    if (value.sign() < 0 || reversible) consumed = true;
  }
  return formed && consumed;
}

/** True when the null space of the intermediates' rows holds a route with a non-empty net. */
export function hasProductiveRoute(stoichiometry: Stoichiometry, intermediates: readonly string[]): boolean {
  const own = rank(rowsFor(stoichiometry, intermediates), stoichiometry.stepCount);
  return rank(rowsFor(stoichiometry, balancedKeys(stoichiometry)), stoichiometry.stepCount) > own;
}

function closedShellNeutral(species: RegisteredSpecies): boolean {
  return species.kind === 'species' && !species.reactive && !species.opaque;
}

function listed(keys: readonly string[]): string {
  return keys.length > 0 ? keys.join(', ') : 'none';
}

function fromDeclared(stoichiometry: Stoichiometry, keys: string[]): IntermediateChoice {
  const explanation = `Intermediates as declared with %intermediates: ${listed(keys)}.`;
  return { keys, explanation, productive: hasProductiveRoute(stoichiometry, keys) };
}

/** Species both formed and consumed (reversible steps count both ways), less the terminal ones. */
export function formedAndConsumedSpecies(stoichiometry: Stoichiometry, species: readonly RegisteredSpecies[], terminal: ReadonlySet<string>): RegisteredSpecies[] {
  return species.filter((s) => s.kind !== 'photon' && s.kind !== 'third-body' && !terminal.has(s.key) && formedAndConsumed(stoichiometry, s.key));
}

/**
 * Chooses the intermediates: the declared ones; else every species both formed and consumed
 * (reversible steps count both ways) minus %terminal ones; if that leaves only null cycles,
 * releases closed-shell neutral species one at a time in order of first appearance; failing
 * that, keeps only the reactive species. The explanation says which rule decided.
 */
export function chooseIntermediates(
  stoichiometry: Stoichiometry,
  species: readonly RegisteredSpecies[],
  declared: { intermediates: string[] | null; terminal: ReadonlySet<string> },
): IntermediateChoice {
  if (declared.intermediates) return fromDeclared(stoichiometry, declared.intermediates);
  const initial = formedAndConsumedSpecies(stoichiometry, species, declared.terminal);
  const keys = initial.map((s) => s.key);
  const terminalNote = declared.terminal.size > 0 ? ` (less the %terminal species ${listed([...declared.terminal])})` : '';
  const base = `Species both formed and consumed${terminalNote}: ${listed(keys)}.`;
  if (keys.length === 0 || hasProductiveRoute(stoichiometry, keys)) {
    return { keys, explanation: `${base} They are treated as intermediates.`, productive: hasProductiveRoute(stoichiometry, keys) };
  }
  for (const released of initial.filter(closedShellNeutral)) {
    const trial = keys.filter((key) => key !== released.key);
    if (hasProductiveRoute(stoichiometry, trial)) {
      const why = `Cancelling all of them leaves only null cycles, so ${released.key} (closed-shell, neutral, first met on line ${released.firstLine}) is released as a reactant or product; intermediates: ${listed(trial)}. Pin the choice with %terminal or %intermediates.`;
      return { keys: trial, explanation: `${base} ${why}`, productive: true };
    }
  }
  const reactive = initial.filter((s) => s.reactive).map((s) => s.key);
  const productive = hasProductiveRoute(stoichiometry, reactive);
  const why = `Cancelling them leaves only null cycles, and releasing one closed-shell neutral species does not help, so only the reactive species (radicals, excited or adsorbed species, sites, ions) are kept: ${listed(reactive)}. Pin the choice with %terminal or %intermediates.`;
  return { keys: reactive, explanation: `${base} ${why}`, productive };
}
