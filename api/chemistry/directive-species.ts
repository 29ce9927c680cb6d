import type { Diagnostic } from '@grammar/diagnostics';
import { finding } from './diagnostic-codes';
import type { MechanismSettings, NamedParticle } from './directives';
import { resolveParticle } from './species-resolve';
import type { SpeciesRegistry } from './species-registry';

function keysOf(named: readonly NamedParticle[], settings: MechanismSettings, registry: SpeciesRegistry, directive: string, diagnostics: Diagnostic[]): string[] {
  const keys: string[] = [];
  for (const item of named) {
    const info = resolveParticle(item.node, settings.declarations).info;
    if (!info || !registry.byKey.has(info.key)) {
      const written = item.node.kind === 'species' ? item.node.text : item.node.text;
      diagnostics.push(finding('unused-directive-species', item, `${directive} names ${written}, which no step uses`, { found: written }));
      continue;
    }
    if (!keys.includes(info.key)) keys.push(info.key);
  }
  return keys;
}

/**
 * An intermediate must cancel in every route, so it must be formed by some step and consumed by
 * another; one that is only formed or only consumed keeps every step that uses it out of the routes.
 */
function reportOneSided(named: readonly NamedParticle[], keys: readonly string[], settings: MechanismSettings, registry: SpeciesRegistry, diagnostics: Diagnostic[]): void {
  for (const key of keys) {
    const species = registry.byKey.get(key);
    if (!species || (species.formed && species.consumed)) continue;
    const missing = species.formed ? 'consumes' : 'forms';
    const place = named.find((item) => resolveParticle(item.node, settings.declarations).info?.key === key) ?? named[0];
    const message = `%intermediates names ${key}, which no step ${missing}: it cannot cancel, so the steps with it are left out of every route`;
    diagnostics.push(finding('intermediate-one-sided', place, message, { found: key }));
  }
}

/** Keys named by %terminal and %intermediates; names no step uses are reported and left out. */
export function resolveDirectiveSpecies(settings: MechanismSettings, registry: SpeciesRegistry, diagnostics: Diagnostic[]) {
  const terminal = new Set(settings.terminal ? keysOf(settings.terminal, settings, registry, '%terminal', diagnostics) : []);
  const intermediates = settings.intermediates ? keysOf(settings.intermediates, settings, registry, '%intermediates', diagnostics) : null;
  if (settings.intermediates && intermediates) reportOneSided(settings.intermediates, intermediates, settings, registry, diagnostics);
  return { terminal, intermediates };
}
