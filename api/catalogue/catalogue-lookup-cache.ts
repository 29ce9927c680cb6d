import type { Knex } from 'knex';
import type { EnthalpyLookup } from '../chemistry/thermo';
import { version as catalogueVersion } from './catalogue.queries';
import { catalogueLookup } from './catalogue.service';

interface CachedLookup {
  version: string;
  lookup: EnthalpyLookup;
}

// One entry per database handle (the app has one; tests open several).
const cache = new WeakMap<Knex, CachedLookup>();

/**
 * The curated enthalpies as a lookup, read from the table again only when the catalogue has
 * changed since the last read. The workbench analyses on every pause in typing; this costs it one
 * one-row read instead of the whole table. Any write counts, from any process, once committed, so a
 * curator's edit changes the very next analysis. Inside a transaction the table is read afresh: the
 * transaction may hold edits of its own that must neither be missed nor kept after a rollback.
 */
export async function cachedCatalogueLookup(db: Knex | Knex.Transaction): Promise<EnthalpyLookup> {
  if (db.isTransaction) return catalogueLookup(db);
  // The counter is read before the rows, so the rows are never older than the version they are kept under.
  const version = await catalogueVersion(db);
  const known = cache.get(db);
  if (known?.version === version) return known.lookup;
  const lookup = await catalogueLookup(db);
  cache.set(db, { version, lookup });
  return lookup;
}
