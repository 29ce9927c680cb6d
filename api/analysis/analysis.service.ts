import type { Knex } from 'knex';
import { analyseMechanism } from '../chemistry/analyse';
import { builtinEnthalpy, type EnthalpyLookup } from '../chemistry/thermo';

/**
 * The enthalpy source for analyses: the built-in table for now; the curated species catalogue is
 * put in front of it when it exists, so a curator's edit changes later analyses.
 */
export async function enthalpySource(_db: Knex): Promise<EnthalpyLookup> {
  return builtinEnthalpy;
}

/** Analyses unsaved text for the workbench: the same engine and JSON as the `check` command. */
export async function analyseText(db: Knex, text: string) {
  return analyseMechanism(text, { enthalpy: await enthalpySource(db) });
}
