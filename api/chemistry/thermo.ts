import { MOLAR_PHOTON_ENERGY_KJ_NM } from './constants';
import { THERMO_RECORDS } from './thermo-data';
import { createEnthalpyLookup, roundNoise } from './thermo-lookup';
import { ScratchList } from '@grammar/scratch-list';

export { createEnthalpyLookup } from './thermo-lookup';

/** ΔfH°(298.15 K) of one species, kJ/mol, with its uncertainty and published source. */
export interface EnthalpyEntry {
  key: string;
  dfH: number;
  uncertainty: number | null;
  source: string;
}

/** Finds the enthalpy of formation of a species by its canonical key, or null when unknown. */
export type EnthalpyLookup = (speciesKey: string) => EnthalpyEntry | null;

/** The built-in table (`thermo-data/`), with state-tag and radical-mark normalisation. */
export const builtinEnthalpy: EnthalpyLookup = createEnthalpyLookup(THERMO_RECORDS);

// Shared by every reaction with all its enthalpies known, and by every one with none known
// (frozen: they are never filled in).
const NONE_MISSING = Object.freeze([]) as unknown as string[];
const NONE_USED = Object.freeze([]) as unknown as EnthalpyEntry[];

// A photon and a third body take part in a step without an enthalpy of formation of their own.
const NOT_SPECIES = new Set(['hν', 'hv', 'M']);

export interface ReactionEnthalpy {
  /** ΔH in kJ/mol, or null when any species is missing. */
  dH: number | null;
  missing: string[];
  used: EnthalpyEntry[];
  /** √Σ(ν·u)², or null when dH is null or a used value has no stated uncertainty. */
  uncertainty: number | null;
}

/**
 * Reaction enthalpy by Hess's law: ΔH = Σ ν ΔfH°, with ν signed (products +, reactants −).
 * Terms with the same key are summed first; species whose net coefficient is 0 are not looked up.
 * `hν`, `hv` and `M` are skipped; every other key the lookup does not know (including the empty
 * site `*` and `e^-`) is listed in `missing` and makes ΔH null.
 * @throws Error when a coefficient is not a finite number.
 */
export function reactionEnthalpy(
  terms: { key: string; coef: number }[],
  lookup: EnthalpyLookup,
): ReactionEnthalpy {
  const net = newNetReaction();
  for (const { key, coef } of terms) addToNet(net, key, coef);
  return netEnthalpy(net, lookup);
}

/**
 * A net reaction as two parallel lists (species key, ν). A step or route has a handful of
 * species, so a scan finds a key faster than a Map, and the lists can be reused step after step.
 */
export interface NetReaction {
  keys: ScratchList<string>;
  coefs: ScratchList<number>;
  /** The entry of each key when the caller already knows it (undefined: ask the lookup). */
  entries: ScratchList<EnthalpyEntry | null | undefined>;
}

export function newNetReaction(): NetReaction {
  return { keys: new ScratchList(), coefs: new ScratchList(), entries: new ScratchList() };
}

/** Empties a net reaction for reuse. */
export function clearNet(net: NetReaction): void {
  net.keys.clear();
  net.coefs.clear();
  net.entries.clear();
}

/** Adds ν of one term to a net reaction (photons and third bodies left out); `entry` when already known. */
export function addToNet(net: NetReaction, key: string, coef: number, entry?: EnthalpyEntry | null): void {
  if (!Number.isFinite(coef)) throw new Error(`reactionEnthalpy: coefficient of "${key}" is ${coef}, not a finite number`);
  if (NOT_SPECIES.has(key)) return;
  const { keys, coefs } = net;
  let index = keys.size - 1;
  while (index >= 0 && keys.at(index) !== key) index -= 1;
  if (index < 0) {
    keys.push(key);
    coefs.push(coef);
    net.entries.push(entry);
  } else coefs.items[index] += coef;
}

// Scratch lists for one net reaction at a time, copied out at their exact size: lists grown by
// `push` would keep room for 16 entries, on every step of a large text.
const missingScratch = new ScratchList<string>();
const usedScratch = new ScratchList<EnthalpyEntry>();

/** ΔH = Σ ν ΔfH° of a net reaction built with `addToNet`; species whose ν is 0 are not looked up. */
export function netEnthalpy(net: NetReaction, lookup: EnthalpyLookup): ReactionEnthalpy {
  missingScratch.clear(); // in case a lookup threw halfway through the last reaction
  usedScratch.clear();
  let dH = 0;
  let variance: number | null = 0;
  for (let index = 0; index < net.keys.size; index += 1) {
    const key = net.keys.at(index);
    const coef = net.coefs.at(index);
    if (Math.abs(coef) < 1e-12) continue;
    const known = net.entries.at(index);
    const entry = known === undefined ? lookup(key) : known;
    if (!entry) {
      missingScratch.push(key);
      continue;
    }
    usedScratch.push(entry);
    dH += coef * entry.dfH;
    variance = entry.uncertainty === null || variance === null ? null : variance + (coef * entry.uncertainty) ** 2;
  }
  const used = usedScratch.size === 0 ? NONE_USED : usedScratch.copy();
  if (missingScratch.size > 0) {
    const missing = missingScratch.copy();
    return { dH: null, missing, used, uncertainty: null };
  }
  return { dH: roundNoise(dH), missing: NONE_MISSING, used, uncertainty: variance === null ? null : roundNoise(Math.sqrt(variance)) };
}

/**
 * Photolysis threshold λ = N_A·h·c / ΔH in nm (CODATA 2018 constants), or null when ΔH ≤ 0 or
 * is not a finite number (no light needed, or nothing to compute).
 */
export function thresholdWavelengthNm(dH: number): number | null {
  if (!Number.isFinite(dH) || dH <= 0) return null;
  return MOLAR_PHOTON_ENERGY_KJ_NM / dH;
}

/** Combines lookups: the first one that knows a species wins (catalogue before built-in table). */
export function chainLookups(...lookups: EnthalpyLookup[]): EnthalpyLookup {
  return (speciesKey) => {
    for (const lookup of lookups) {
      const entry = lookup(speciesKey);
      if (entry) return entry;
    }
    return null;
  };
}
