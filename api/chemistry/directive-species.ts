import type { Diagnostic } from '@grammar/diagnostics';
import { finding } from './diagnostic-codes';
import type { MechanismSettings, NamedParticle } from './directives';
import { resolveParticle } from './species-resolve';
import type { SpeciesRegistry } from './species-registry';

/** A species of the steps written like `key` but for its radical marks (NO2 for NO2•), if any. */
function sameBesidesMarks(key: string, registry: SpeciesRegistry): string | null {
  const bare = key.replace(/•+/, '');
  for (const other of registry.byKey.keys()) if (other.replace(/•+/, '') === bare) return other;
  return null;
}

/** The species keys a directive names, each with the place it was first written there (in order). */
function placesOf(named: readonly NamedParticle[], settings: MechanismSettings, registry: SpeciesRegistry, directive: string, diagnostics: Diagnostic[]): Map<string, NamedParticle> {
  const places = new Map<string, NamedParticle>();
  for (const item of named) {
    const info = resolveParticle(item.node, settings.declarations).info;
    if (!info || !registry.byKey.has(info.key)) {
      const written = item.node.text;
      const near = info ? sameBesidesMarks(info.key, registry) : null;
      const hint = near ? ` (the steps write ${near}; a radical mark is part of a species' name)` : '';
      diagnostics.push(finding('unused-directive-species', item, `${directive} names ${written}, which no step uses${hint}`, { found: written, ...(near ? { expected: [near] } : {}) }));
      continue;
    }
    if (!places.has(info.key)) places.set(info.key, item);
  }
  return places;
}

/**
 * An intermediate must cancel in every route, so it must be formed by some step and consumed by
 * another; one that is only formed or only consumed keeps every step that uses it out of the routes.
 */
function reportOneSided(places: ReadonlyMap<string, NamedParticle>, registry: SpeciesRegistry, diagnostics: Diagnostic[]): void {
  for (const [key, place] of places) {
    const species = registry.byKey.get(key);
    if (!species || (species.formed && species.consumed)) continue;
    const missing = species.formed ? 'consumes' : 'forms';
    const message = `%intermediates names ${key}, which no step ${missing}: it cannot cancel, so the steps with it are left out of every route`;
    diagnostics.push(finding('intermediate-one-sided', place, message, { found: key }));
  }
}

/** %intermediates decides the routes, so a species it shares with %terminal is a contradiction to resolve. */
function reportBothWays(intermediates: ReadonlyMap<string, NamedParticle>, terminal: ReadonlyMap<string, NamedParticle>, diagnostics: Diagnostic[]): void {
  for (const [key, place] of intermediates) {
    const there = terminal.get(key);
    if (!there) continue;
    const message = `%intermediates names ${key}, which %terminal on line ${there.line} names too; a species is either cancelled in every route or kept in the net reactions (it is treated as an intermediate)`;
    diagnostics.push(finding('bad-directive', place, message, { found: key }));
  }
}

/** Keys named by %terminal and %intermediates; names no step uses are reported and left out. */
export function resolveDirectiveSpecies(settings: MechanismSettings, registry: SpeciesRegistry, diagnostics: Diagnostic[]) {
  const terminalPlaces = settings.terminal ? placesOf(settings.terminal, settings, registry, '%terminal', diagnostics) : new Map<string, NamedParticle>();
  const terminal = new Set(terminalPlaces.keys());
  if (!settings.intermediates) return { terminal, intermediates: null };
  const places = placesOf(settings.intermediates, settings, registry, '%intermediates', diagnostics);
  reportOneSided(places, registry, diagnostics);
  reportBothWays(places, terminalPlaces, diagnostics);
  // Every name a slip (each reported above): the automatic choice serves better than cancelling nothing.
  if (places.size === 0) return { terminal, intermediates: null };
  return { terminal, intermediates: [...places.keys()] };
}
