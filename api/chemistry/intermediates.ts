import { directRoutes } from './direct-routes';
import { nullSpace, rank, type SparseRow } from './integer-matrix';
import { orient } from './route-vectors';
import { netOfRoute } from './routes';
import type { RegisteredSpecies } from './species-registry';
import { fullRank, integerRow, rowsFor, type Stoichiometry } from './stoichiometry';

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

/**
 * The keys whose row is not in the span of the other keys' rows: removing one of them lowers the
 * rank. Read off one exact left null space (the dependencies among the rows): a row is in the span
 * of the others exactly when some dependency uses it.
 */
export function essentialKeys(stoichiometry: Stoichiometry, keys: readonly string[]): Set<string> {
  const transposed: SparseRow[] = Array.from({ length: stoichiometry.stepCount }, () => new Map<number, bigint>());
  keys.forEach((key, column) => {
    const row = stoichiometry.rows.get(key);
    if (!row) return;
    for (const [step, value] of integerRow(row)) transposed[step].set(column, value);
  });
  const dependencies = nullSpace(transposed.filter((row) => row.size > 0), keys.length);
  return new Set(keys.filter((key, column) => (stoichiometry.rows.get(key)?.size ?? 0) > 0 && dependencies.every((vector) => vector[column] === 0n)));
}

/**
 * The first of `candidates` (in order) whose release from `keys` leaves a productive route; `keys`
 * must give none. Small mechanisms try each in turn (the test there also asks that one-way steps
 * run forwards); larger ones are decided by rank, where releasing a species helps exactly when its
 * row is essential, so one elimination answers for every candidate (trying each was one
 * elimination per candidate: a minute for 600 steps and 150 candidates).
 */
function firstRelease(stoichiometry: Stoichiometry, keys: readonly string[], candidates: readonly RegisteredSpecies[], maxDirectSteps: number): RegisteredSpecies | null {
  if (candidates.length === 0) return null;
  if (stoichiometry.stepCount <= maxDirectSteps) {
    return candidates.find((candidate) => hasProductiveRoute(stoichiometry, keys.filter((key) => key !== candidate.key), maxDirectSteps)) ?? null;
  }
  const essential = essentialKeys(stoichiometry, keys);
  return candidates.find((candidate) => essential.has(candidate.key)) ?? null;
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
  // is the same choice, which was already found unproductive. None at all (a lone N2O5 ⇌ NO2• +
  // NO3•) leaves every step a route of its own.
  return keys.length < initial.length && productive(keys) ? keys : null;
}

/**
 * Chooses the intermediates: the declared ones; else every species both formed and consumed
 * (reversible steps count both ways) minus %terminal ones; if that leaves only null cycles,
 * releases closed-shell neutral species one at a time in order of first appearance; failing
 * that, keeps only the reactive species, releasing one of them the same way when they give no
 * productive route either, unless there are none and reading reversible steps as written gives
 * one. The explanation says which rule decided.
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
  const released = firstRelease(stoichiometry, keys, initial.filter(closedShellNeutral), maxDirectSteps);
  if (released) {
    const trial = keys.filter((key) => key !== released.key);
    const why = `Cancelling all of them leaves no productive route (only null cycles, or routes that would run a one-way step backwards), so ${released.key} (closed-shell, neutral, first met on line ${released.firstLine}) is released as a reactant or product; intermediates: ${listed(trial)}. Pin the choice with %terminal or %intermediates.`;
    return { keys: trial, explanation: `${base} ${why}`, productive: true };
  }
  const reactiveSpecies = initial.filter((s) => s.reactive);
  const reactive = reactiveSpecies.map((s) => s.key);
  // Keeping no species cancels nothing: every step would be a route of its own.
  const reactiveProductive = productive(reactive);
  // Beyond analysis.md, which stops at the reactive species: when they give no productive route
  // either, one of them is released the same way (NO• + O3 → NO2• + O2 with NO• + O(3P) ⇌ NO2•
  // cycles through NO• and NO2• only once O(3P) is a product).
  const releasedReactive = reactive.length > 0 && !reactiveProductive ? firstRelease(stoichiometry, reactive, reactiveSpecies, maxDirectSteps) : null;
  if (releasedReactive) {
    const trial = reactive.filter((key) => key !== releasedReactive.key);
    const kept = reactive.length === keys.length ? 'All of them are reactive' : `Only the reactive species are kept (${listed(reactive)})`;
    const why = `Cancelling them leaves no productive route that runs every one-way step forwards, and releasing one closed-shell neutral species does not help. ${kept}, and cancelling those leaves none either, so ${releasedReactive.key} (first met on line ${releasedReactive.firstLine}) is released as a reactant or product; intermediates: ${listed(trial)}. Pin the choice with %terminal or %intermediates.`;
    return { keys: trial, explanation: `${base} ${why}`, productive: true };
  }
  const written = reactive.length > 0 && reactiveProductive ? null : asWritten(stoichiometry, species, declared.terminal, keys, productive);
  if (written) {
    const wayWritten = written.length > 0 ? `the species formed and consumed that way are ${listed(written)}` : 'no species is formed and consumed that way, so every step is a route of its own';
    const why = `Cancelling them leaves no productive route that runs every one-way step forwards, releasing one closed-shell neutral species does not help and no reactive species can carry a route, so reversible steps are read in the direction they are written: ${wayWritten}. Pin the choice with %terminal or %intermediates.`;
    return { keys: written, explanation: `${base} ${why}`, productive: true };
  }
  const why = reactive.length === keys.length
    ? `Cancelling them leaves no productive route that runs every one-way step forwards and releasing one closed-shell neutral species does not help; all of them are reactive (radicals, excited or adsorbed species, sites, ions), so all are kept. Pin the choice with %terminal or %intermediates.`
    : `Cancelling them leaves no productive route that runs every one-way step forwards, and releasing one closed-shell neutral species does not help, so only the reactive species (radicals, excited or adsorbed species, sites, ions) are kept: ${listed(reactive)}. Pin the choice with %terminal or %intermediates.`;
  return { keys: reactive, explanation: `${base} ${why}`, productive: reactiveProductive };
}
