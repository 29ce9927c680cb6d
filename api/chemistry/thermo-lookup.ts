import { KJ_PER_MOL_PER_WAVENUMBER } from './constants';
import { parseThermoKey, tableKey } from './thermo-key';
import { EXCITED_STATES, GROUND_STATE_TAGS } from './thermo-data/electronic-states';
import type { EnthalpyEntry, EnthalpyLookup } from './thermo';

/**
 * Builds a lookup over enthalpy rows (the built-in table, catalogue rows) keyed by formula,
 * condensed-phase tag and charge; `*` and `e^-` rows are kept as written. Radical marks are ignored, `(g)` is the untagged entry, ground-state tags map to the untagged
 * entry and known excited states add their excitation energy to it. Other tags must be in the table.
 * @throws Error naming the key when two records are the same species or a key is not a species.
 */
export function createEnthalpyLookup(records: readonly EnthalpyEntry[]): EnthalpyLookup {
  const index = new Map<string, EnthalpyEntry>();
  for (const record of records) {
    const key = indexKey(record.key);
    if (key === null) throw new Error(`enthalpy table: "${record.key}" is not a species key`);
    if (index.has(key)) throw new Error(`enthalpy table: "${record.key}" is listed twice (as ${key})`);
    index.set(key, record);
  }
  return (speciesKey) => findEntry(index, speciesKey);
}

// The empty site and the electron have no formula; a table may still give them a value
// (e.g. a convention for electrode steps), so they are indexed as written.
const FORMULA_LESS = new Set(['*', 'e^-']);

function indexKey(key: string): string | null {
  const trimmed = key.trim();
  if (FORMULA_LESS.has(trimmed)) return trimmed;
  const parts = parseThermoKey(trimmed);
  return parts ? tableKey(parts) : null;
}

function findEntry(index: Map<string, EnthalpyEntry>, speciesKey: string): EnthalpyEntry | null {
  const key = indexKey(speciesKey);
  if (key === null) return null;
  const direct = index.get(key);
  if (direct) return toEntry(direct, speciesKey, direct.source);
  const parts = parseThermoKey(speciesKey.trim());
  if (!parts || parts.tags.length !== 1) return null;
  const base = index.get(tableKey({ ...parts, tags: [] }));
  return base ? applyStateTag(base, parts.formula, parts.tags[0], speciesKey) : null;
}

function applyStateTag(base: EnthalpyEntry, formula: string, tag: string, speciesKey: string): EnthalpyEntry | null {
  if (GROUND_STATE_TAGS[formula]?.includes(tag)) {
    return toEntry(base, speciesKey, `${base.source}; (${tag}) is the ground state`);
  }
  const excited = EXCITED_STATES[formula]?.find((state) => state.tags.includes(tag));
  if (!excited) return null;
  const excitation = excited.wavenumber * KJ_PER_MOL_PER_WAVENUMBER;
  return {
    key: speciesKey,
    dfH: Math.round((base.dfH + excitation) * 1000) / 1000,
    uncertainty: base.uncertainty,
    source: `${base.source}; + ${excitation.toFixed(2)} kJ/mol excitation of (${tag}), ` +
      `${excited.wavenumber} cm⁻¹ (${excited.source})`,
  };
}

function toEntry(record: EnthalpyEntry, key: string, source: string): EnthalpyEntry {
  return { key, dfH: record.dfH, uncertainty: record.uncertainty, source };
}

/** Removes floating-point noise from sums of tabulated values (values carry at most 3 decimals). */
export function roundNoise(value: number): number {
  return Math.round(value * 1e6) / 1e6;
}
