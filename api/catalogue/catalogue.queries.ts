import type { Knex } from 'knex';
import type { CatalogueRow } from './catalogue.schemas';

export type { CatalogueRow };

type Db = Knex | Knex.Transaction;

export type CatalogueValues = Omit<CatalogueRow, 'id' | 'updatedAt'>;

const COLUMNS = [
  'id', 'name', 'formula', 'lookup_key as lookupKey', 'charge', 'state', 'smiles', 'dfh as dfH',
  'dfh_uncertainty as dfHUncertainty', 'dfh_source as dfHSource', 'notes', 'updated_at as updatedAt',
];

const toColumns = (values: CatalogueValues) => ({
  name: values.name,
  formula: values.formula,
  lookup_key: values.lookupKey,
  charge: values.charge,
  state: values.state,
  smiles: values.smiles,
  dfh: values.dfH,
  dfh_uncertainty: values.dfHUncertainty,
  dfh_source: values.dfHSource,
  notes: values.notes,
});

export async function findById(db: Db, id: number): Promise<CatalogueRow | undefined> {
  return db('species_catalogue').where({ id }).first(COLUMNS);
}

export async function findByLookupKey(db: Db, lookupKey: string): Promise<CatalogueRow | undefined> {
  return db('species_catalogue').where({ lookup_key: lookupKey }).first(COLUMNS);
}

/** Name or formula containing the text, case-insensitive; exact formula matches first. */
export async function search(db: Db, text: string | undefined): Promise<CatalogueRow[]> {
  const query = db('species_catalogue').select(COLUMNS);
  if (text) {
    const pattern = `%${text.replace(/[\\%_]/g, (ch) => `\\${ch}`)}%`;
    query.where((q) => q.whereILike('name', pattern).orWhereILike('formula', pattern).orWhereILike('lookup_key', pattern))
      .orderByRaw('(lower(formula) = lower(?) or lower(lookup_key) = lower(?)) desc', [text, text]);
  }
  return query.orderBy('name').orderBy('id');
}

/** The catalogue's change counter; a trigger adds one with every write (migration 20261202000710). */
export async function version(db: Db): Promise<string> {
  const row = await db('catalogue_version').first('version');
  if (!row) throw new Error('catalogue_version has no row: run the migrations');
  return String(row.version);
}

export async function withEnthalpy(db: Db): Promise<CatalogueRow[]> {
  return db('species_catalogue').whereNotNull('dfh').select(COLUMNS).orderBy('id');
}

export async function insert(db: Db, values: CatalogueValues, actorId: number | null): Promise<number> {
  const [row] = await db('species_catalogue')
    .insert({ ...toColumns(values), created_by: actorId, updated_by: actorId })
    .returning('id');
  return row.id;
}

export async function update(db: Db, id: number, values: CatalogueValues, actorId: number): Promise<void> {
  await db('species_catalogue').where({ id }).update({ ...toColumns(values), updated_by: actorId, updated_at: db.fn.now() });
}
