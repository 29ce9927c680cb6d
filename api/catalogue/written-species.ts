import { parseMechanism } from '@grammar/parse';
import { resolveSpecies } from '../chemistry/species-resolve';
import { parseThermoKey, tableKey } from '../chemistry/thermo-key';
import { ParseFailedError } from '../errors';

/** A catalogue formula read exactly as the engine reads a species in a step. */
export interface WrittenSpecies {
  /** The canonical key the engine gives it (`Br•`, `Cl(aq)^-`). */
  key: string;
  /** The enthalpy table key (radical marks and `(g)` dropped): unique in the catalogue. */
  lookupKey: string;
  elements: Record<string, number>;
  charge: number;
  /** State tags without parentheses (`aq`, `1D`), joined by commas; null for a plain gas. */
  state: string | null;
}

const invalid = (formula: string, why: string) =>
  new ParseFailedError(`formula "${formula}" is not a species in the step notation: ${why}`, { field: 'formula' });

/**
 * Reads a written species with the step-notation grammar and the engine's species rules, so the
 * catalogue and the analyses agree on what a formula means.
 * @throws ParseFailedError naming the field `formula` and saying why.
 */
export function readWrittenSpecies(formula: string): WrittenSpecies {
  const text = formula.trim();
  if (/\s/.test(text) || text.includes('->')) throw invalid(formula, 'write one species, without spaces');
  const parsed = parseMechanism(`${text} -> ${text}`);
  const error = parsed.diagnostics.find((d) => d.severity === 'error');
  if (error) throw invalid(formula, error.message);
  const particle = parsed.steps[0]?.reactants[0]?.particle;
  if (!particle || particle.kind !== 'species' || parsed.steps[0].reactants.length !== 1) {
    throw invalid(formula, 'a photon, third body, site or electron is not a catalogue species');
  }
  const { info, problems } = resolveSpecies(particle, new Map());
  if (!info || problems.length > 0) throw invalid(formula, problems.map((p) => p.message).join('; '));
  const parts = parseThermoKey(info.key);
  if (!parts) throw invalid(formula, 'it has no formula of elements');
  return {
    key: info.key,
    lookupKey: tableKey(parts),
    elements: info.elements,
    charge: info.charge,
    state: parts.tags.length > 0 ? parts.tags.join(',') : null,
  };
}
