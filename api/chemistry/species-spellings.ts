import type { Diagnostic } from '@grammar/diagnostics';
import { finding } from './diagnostic-codes';
import { enthalpyOf } from './enthalpy';
import type { RegisteredSpecies } from './species-registry';
import { parseThermoKey, tableKey } from './thermo-key';
import type { EnthalpyLookup } from './thermo';

/**
 * What makes two spellings one species: the same elements, charge and sites, and either the same
 * tabulated ΔfH° (`O` and `O(3P)`, `NO` and `NO•`) or, with no
 * tabulated value, the same formula and state once radical marks and `(g)` are set aside
 * (`CH3` and `CH3•`). Isomers differ in ΔfH° or in how their formula is written, so they stay apart.
 */
function sameness(item: RegisteredSpecies, lookup: EnthalpyLookup): string | null {
  // A declared name is chosen on purpose (an energised AneHot beside Ane), so it is never a slip.
  if (item.kind !== 'species' || item.opaque || item.declared) return null;
  const composition = `${Object.entries(item.elements).map(([symbol, count]) => `${symbol}${count}`).join('')}|${item.charge}|${item.sites}`;
  const entry = enthalpyOf(item, lookup);
  if (entry) return `${composition}|ΔfH ${entry.dfH}`;
  const parts = parseThermoKey(item.key);
  return parts ? `${composition}|${tableKey(parts)}` : null;
}

/**
 * Species are told apart by how they are written (step-notation.md), so `O` on one line and
 * `O(3P)` on another are two species to the routes and the kinetics: almost always a slip. Each
 * later spelling is reported once, at its first place, naming the first one.
 */
export function reportTwoSpellings(species: readonly RegisteredSpecies[], lookup: EnthalpyLookup, diagnostics: Diagnostic[]): void {
  const first = new Map<string, RegisteredSpecies>();
  for (const item of species) {
    const same = sameness(item, lookup);
    if (same === null) continue;
    const earlier = first.get(same);
    if (!earlier) {
      first.set(same, item);
      continue;
    }
    const message = `${item.key} and ${earlier.key} (line ${earlier.firstLine}) look like one species written two ways (same composition and ΔfH°); the routes and the kinetics keep them apart: write one spelling`;
    diagnostics.push(finding('species-two-spellings', { line: item.firstLine, column: item.firstColumn }, message, { found: item.key, expected: [earlier.key] }));
  }
}
