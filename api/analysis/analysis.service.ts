import type { Knex } from 'knex';
import { cachedCatalogueLookup } from '../catalogue/catalogue-lookup-cache';
import { analyseMechanism } from '../chemistry/analyse';
import { builtinEnthalpy, chainLookups, type EnthalpyLookup } from '../chemistry/thermo';

/**
 * The enthalpy source for every analysis: the curated species catalogue in front of the built-in
 * table. The catalogue is kept in memory until it changes, so a curator's edit still changes every
 * later analysis (each step records the values it used in `usedEnthalpies`).
 */
export async function enthalpySource(db: Knex | Knex.Transaction): Promise<EnthalpyLookup> {
  return chainLookups(await cachedCatalogueLookup(db), builtinEnthalpy);
}

/** Analyses unsaved text for the workbench: the same engine and JSON as the `check` command. */
export async function analyseText(db: Knex, text: string) {
  return analyseMechanism(text, { enthalpy: await enthalpySource(db) });
}
