import { KJ_PER_MOL_PER_WAVENUMBER } from './constants';
import { parseThermoKey, tableKey, type ThermoKeyParts } from './thermo-key';
import { EXCITED_STATES, GROUND_STATE_TAGS } from './thermo-data/electronic-states';
import type { EnthalpyEntry, EnthalpyLookup } from './thermo';

/** What a lookup needs from a stored row (the built-in table and catalogue rows both fit). */
export type EnthalpyRecord = Omit<EnthalpyEntry, 'key'> & { key: string };

/**
 * Builds a lookup over enthalpy records keyed by formula, condensed-phase tag and charge.
 * Radical marks are ignored, `(g)` is the untagged entry, ground-state tags map to the untagged
 * entry and known excited states add their excitation energy to it. Other tags must be in the table.
 * @throws Error when two records share a key, naming it.
 */
export function createEnthalpyLookup(records: readonly EnthalpyRecord[]): EnthalpyLookup {
  const index = new Map<string, EnthalpyRecord>();
  for (const record of records) {
    const parts = parseThermoKey(record.key);
    if (!parts) throw new Error(`enthalpy table: "${record.key}" is not a species key`);
    const key = tableKey(parts);
    if (index.has(key)) throw new Error(`enthalpy table: "${record.key}" is listed twice (as ${key})`);
    index.set(key, record);
  }
  return (speciesKey) => findEntry(index, speciesKey);
}

function findEntry(index: Map<string, EnthalpyRecord>, speciesKey: string): EnthalpyEntry | null {
  const parts = parseThermoKey(speciesKey.trim());
  if (!parts) return null;
  const direct = index.get(tableKey(parts));
  if (direct) return { ...direct, key: speciesKey };
  if (parts.tag === null) return null;
  const base = index.get(tableKey({ ...parts, tag: null }));
  return base ? applyStateTag(base, parts, speciesKey) : null;
}

function applyStateTag(base: EnthalpyRecord, parts: ThermoKeyParts, speciesKey: string): EnthalpyEntry | null {
  const tag = parts.tag as string;
  if (GROUND_STATE_TAGS[parts.formula]?.includes(tag)) {
    return { ...base, key: speciesKey, source: `${base.source}; (${tag}) is the ground state` };
  }
  const excited = EXCITED_STATES[parts.formula]?.find((state) => state.tags.includes(tag));
  if (!excited) return null;
  const excitation = excited.wavenumber * KJ_PER_MOL_PER_WAVENUMBER;
  return {
    key: speciesKey,
    dfH: roundNoise(base.dfH + excitation),
    uncertainty: base.uncertainty,
    source: `${base.source}; + ${excitation.toFixed(2)} kJ/mol excitation of (${tag}), ` +
      `${excited.wavenumber} cm⁻¹ (${excited.source})`,
  };
}

/** Removes floating-point noise from sums of tabulated values (values carry at most 3 decimals). */
export function roundNoise(value: number): number {
  return Math.round(value * 1e6) / 1e6;
}
