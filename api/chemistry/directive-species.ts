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

/** Keys named by %terminal and %intermediates; names no step uses are reported and left out. */
export function resolveDirectiveSpecies(settings: MechanismSettings, registry: SpeciesRegistry, diagnostics: Diagnostic[]) {
  const terminal = new Set(settings.terminal ? keysOf(settings.terminal, settings, registry, '%terminal', diagnostics) : []);
  const intermediates = settings.intermediates ? keysOf(settings.intermediates, settings, registry, '%intermediates', diagnostics) : null;
  return { terminal, intermediates };
}
