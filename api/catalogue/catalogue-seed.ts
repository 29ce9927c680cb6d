import type { Knex } from 'knex';
import { THERMO_RECORDS } from '../chemistry/thermo-data';
import * as catalogue from './catalogue.queries';
import { readWrittenSpecies } from './written-species';

/**
 * Fills the catalogue from the engine's built-in table; entries already there (and curators'
 * edits to them) are left alone, so seeding twice changes nothing.
 * @returns how many entries were added.
 */
export async function seedCatalogue(db: Knex): Promise<number> {
  let added = 0;
  await db.transaction(async (trx) => {
    for (const record of THERMO_RECORDS) {
      const written = readWrittenSpecies(record.key);
      if (await catalogue.findByLookupKey(trx, written.lookupKey)) continue;
      await catalogue.insert(trx, {
        name: record.name, formula: written.key, lookupKey: written.lookupKey, charge: written.charge, state: written.state,
        smiles: record.smiles ?? null, dfH: record.dfH, dfHUncertainty: record.uncertainty, dfHSource: record.source, notes: '',
      }, null);
      added++;
    }
  });
  return added;
}
