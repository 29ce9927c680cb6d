import type { Knex } from 'knex';
import { catalogueLookup } from '../catalogue/catalogue.service';
import { analyseMechanism } from '../chemistry/analyse';
import { builtinEnthalpy, chainLookups, type EnthalpyLookup } from '../chemistry/thermo';

/**
 * The enthalpy source for every analysis: the curated species catalogue in front of the built-in
 * table, read afresh each time, so a curator's edit changes later analyses (each step records the
 * values it used in `usedEnthalpies`).
 */
export async function enthalpySource(db: Knex | Knex.Transaction): Promise<EnthalpyLookup> {
  return chainLookups(await catalogueLookup(db), builtinEnthalpy);
}

/** Analyses unsaved text for the workbench: the same engine and JSON as the `check` command. */
export async function analyseText(db: Knex, text: string) {
  return analyseMechanism(text, { enthalpy: await enthalpySource(db) });
}
