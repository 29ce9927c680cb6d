import { directRoutes } from './direct-routes';
import { rank } from './integer-matrix';
import { orient } from './route-vectors';
import { netOfRoute } from './routes';
import type { RegisteredSpecies } from './species-registry';
import { fullRank, rowsFor, type Stoichiometry } from './stoichiometry';

/** Which species routes must cancel, and why (analysis.md, "Routes", step 1). */
export interface IntermediateChoice {
  keys: string[];
  explanation: string;
  /** Whether some route has a non-empty net reaction with this choice. */
  productive: boolean;
}

/** How a reversible step counts: both ways (analysis.md's rule), or only as written (the last resort below). */
type Direction = 'both-ways' | 'as-written';

function formedAndConsumed(stoichiometry: Stoichiometry, key: string, direction: Direction): boolean {
  let formed = false;
  let consumed = false;
  for (const [step, value] of stoichiometry.rows.get(key) ?? []) {
    const reversible = direction === 'both-ways' && stoichiometry.reversible[step];
    if (value.sign() > 0 || reversible) formed = true;
    if (value.sign() < 0 || reversible) consumed = true;
  }
  return formed && consumed;
}

/**
 * True when some route that cancels the intermediates has a non-empty net reaction. For small
 * mechanisms the routes must also run one-way steps forwards (checked on the direct routes);
 * for larger ones, or when the direct-route enumeration stops at its limit, the test is the
 * rank: the intermediates' rows do not span the rows of every species.
 */
export function hasProductiveRoute(stoichiometry: Stoichiometry, intermediates: readonly string[], maxDirectSteps = 0): boolean {
  const rows = rowsFor(stoichiometry, intermediates);
  if (stoichiometry.stepCount <= maxDirectSteps) {
    const enumerated = directRoutes(rows, stoichiometry.reversible);
    const skip = new Set([...intermediates, ...stoichiometry.aside]);
    if (enumerated.complete) return enumerated.routes.some((sigma) => netOfRoute(stoichiometry, orient(sigma, stoichiometry.reversible), skip).size > 0);
  }
  const own = rank(rows, stoichiometry.stepCount);
  return fullRank(stoichiometry) > own;
}

function closedShellNeutral(species: RegisteredSpecies): boolean {
  return species.kind === 'species' && !species.reactive && !species.opaque;
}

function listed(keys: readonly string[]): string {
  return keys.length > 0 ? keys.join(', ') : 'none';
}

function fromDeclared(stoichiometry: Stoichiometry, keys: string[], maxDirectSteps: number): IntermediateChoice {
  const explanation = `Intermediates as declared with %intermediates: ${listed(keys)}.`;
  return { keys, explanation, productive: hasProductiveRoute(stoichiometry, keys, maxDirectSteps) };
}

/** Species both formed and consumed (reversible steps count both ways unless told), less the terminal ones. */
export function formedAndConsumedSpecies(stoichiometry: Stoichiometry, species: readonly RegisteredSpecies[], terminal: ReadonlySet<string>, direction: Direction = 'both-ways'): RegisteredSpecies[] {
  return species.filter((s) => s.kind !== 'photon' && s.kind !== 'third-body' && !terminal.has(s.key) && formedAndConsumed(stoichiometry, s.key, direction));
}

/**
 * The last resort when no rule of analysis.md gives a productive route that cancels anything:
 * reversible steps read in the direction they are written. In E + S ⇌ ES → EP ⇌ E + P every
 * species is formed and consumed both ways, and S and P would both have to be released (the rules
 * release one); read as written, S is only consumed and P only formed, which leaves E, ES and EP.
 */
function asWritten(stoichiometry: Stoichiometry, species: readonly RegisteredSpecies[], terminal: ReadonlySet<string>, initial: readonly string[], productive: (keys: readonly string[]) => boolean): string[] | null {
  const keys = formedAndConsumedSpecies(stoichiometry, species, terminal, 'as-written').map((s) => s.key);
  // Read as written, a species is formed and consumed only if it is both ways too: the same count
  // is the same choice, which was already found unproductive.
  return keys.length > 0 && keys.length < initial.length && productive(keys) ? keys : null;
}

/**
 * Chooses the intermediates: the declared ones; else every species both formed and consumed
 * (reversible steps count both ways) minus %terminal ones; if that leaves only null cycles,
 * releases closed-shell neutral species one at a time in order of first appearance; failing
 * that, keeps only the reactive species, unless there are none or they give no productive route
 * and reading reversible steps as written does. The explanation says which rule decided.
 */
export function chooseIntermediates(
  stoichiometry: Stoichiometry,
  species: readonly RegisteredSpecies[],
  declared: { intermediates: string[] | null; terminal: ReadonlySet<string> },
  maxDirectSteps: number,
): IntermediateChoice {
  const productive = (keys: readonly string[]) => hasProductiveRoute(stoichiometry, keys, maxDirectSteps);
  if (declared.intermediates) return fromDeclared(stoichiometry, declared.intermediates, maxDirectSteps);
  const initial = formedAndConsumedSpecies(stoichiometry, species, declared.terminal);
  const keys = initial.map((s) => s.key);
  const terminalNote = declared.terminal.size > 0 ? ` (less the %terminal species ${listed([...declared.terminal])})` : '';
  const base = `Species both formed and consumed${terminalNote}: ${listed(keys)}.`;
  const productiveAsIs = productive(keys);
  if (keys.length === 0) {
    return { keys, explanation: `No species is both formed and consumed${terminalNote}, so there are no intermediates: every step is a route of its own.`, productive: productiveAsIs };
  }
  if (productiveAsIs) {
    return { keys, explanation: `${base} They are treated as intermediates.`, productive: productiveAsIs };
  }
  for (const released of initial.filter(closedShellNeutral)) {
    const trial = keys.filter((key) => key !== released.key);
    if (productive(trial)) {
      const why = `Cancelling all of them leaves no productive route (only null cycles, or routes that would run a one-way step backwards), so ${released.key} (closed-shell, neutral, first met on line ${released.firstLine}) is released as a reactant or product; intermediates: ${listed(trial)}. Pin the choice with %terminal or %intermediates.`;
      return { keys: trial, explanation: `${base} ${why}`, productive: true };
    }
  }
  const reactive = initial.filter((s) => s.reactive).map((s) => s.key);
  // Keeping no species cancels nothing: every step would be a route of its own.
  const reactiveProductive = productive(reactive);
  const written = reactive.length > 0 && reactiveProductive ? null : asWritten(stoichiometry, species, declared.terminal, keys, productive);
  if (written) {
    const why = `Cancelling them leaves no productive route that runs every one-way step forwards, releasing one closed-shell neutral species does not help and no reactive species can carry a route, so reversible steps are read in the direction they are written: the species formed and consumed that way are ${listed(written)}. Pin the choice with %terminal or %intermediates.`;
    return { keys: written, explanation: `${base} ${why}`, productive: true };
  }
  const why = reactive.length === keys.length
    ? `Cancelling them leaves no productive route that runs every one-way step forwards and releasing one closed-shell neutral species does not help; all of them are reactive (radicals, excited or adsorbed species, sites, ions), so all are kept. Pin the choice with %terminal or %intermediates.`
    : `Cancelling them leaves no productive route that runs every one-way step forwards, and releasing one closed-shell neutral species does not help, so only the reactive species (radicals, excited or adsorbed species, sites, ions) are kept: ${listed(reactive)}. Pin the choice with %terminal or %intermediates.`;
  return { keys: reactive, explanation: `${base} ${why}`, productive: reactiveProductive };
}
