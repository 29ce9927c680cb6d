import type { Knex } from 'knex';
import * as audit from '../audit/audit.queries';
import { parseSmiles } from '../chemistry/structure';
import { createEnthalpyLookup, type EnthalpyLookup } from '../chemistry/thermo';
import { AppError, ConflictError, NotFoundError } from '../errors';
import type { Viewer } from '../mechanisms/access';
import * as catalogue from './catalogue.queries';
import type { CatalogueRow, CatalogueValues } from './catalogue.queries';
import type { CatalogueEntry, CataloguePage, CatalogueSearchQuery, CreateCatalogueEntryBody, UpdateCatalogueEntryBody } from './catalogue.schemas';
import { checkedStructure, structureSummary } from './structure-check';
import { substructureFilter } from './substructure';
import { readWrittenSpecies } from './written-species';

type EntryInput = CreateCatalogueEntryBody;

/** An entry with what its structure says: formal charges and unpaired electrons. */
export function presentEntry(row: CatalogueRow): CatalogueEntry {
  return { ...row, structure: structureSummary(row.smiles) };
}

function validated(input: EntryInput): CatalogueValues {
  const written = readWrittenSpecies(input.formula);
  if (input.smiles) checkedStructure(input.smiles, written);
  if (input.dfH !== null && !input.dfHSource) {
    throw new AppError(422, 'SOURCE_REQUIRED', 'dfHSource: an enthalpy of formation needs its published source', { field: 'dfHSource' });
  }
  return { ...input, formula: written.key, lookupKey: written.lookupKey, charge: written.charge, state: written.state };
}

async function assertKeyFree(db: Knex.Transaction, lookupKey: string, ownId: number | null) {
  const existing = await catalogue.findByLookupKey(db, lookupKey);
  if (existing && existing.id !== ownId) {
    throw new ConflictError(`formula: the catalogue already has ${existing.formula} (entry ${existing.id}, ${existing.name})`, { field: 'formula', existingId: existing.id });
  }
}

export async function listEntries(db: Knex, query: CatalogueSearchQuery): Promise<CataloguePage> {
  const rows = await catalogue.search(db, query.q);
  const contains = query.substructure ? substructureFilter(query.substructure) : null;
  const matching = contains ? rows.filter((row) => contains(row.smiles)) : rows;
  const start = (query.page - 1) * query.pageSize;
  return { total: matching.length, page: query.page, items: matching.slice(start, start + query.pageSize).map(presentEntry) };
}

export async function getEntry(db: Knex, id: number) {
  const row = await catalogue.findById(db, id);
  if (!row) throw new NotFoundError('catalogue entry', id);
  return presentEntry(row);
}

export async function createEntry(db: Knex, viewer: Viewer, input: EntryInput) {
  const values = validated(input);
  const id = await db.transaction(async (trx) => {
    await assertKeyFree(trx, values.lookupKey, null);
    const newId = await catalogue.insert(trx, values, viewer.id);
    await audit.insert(trx, { actorId: viewer.id, action: 'catalogue.entry-created', subjectType: 'catalogue-entry', subjectId: newId, details: { ...values } });
    return newId;
  });
  return getEntry(db, id);
}

export async function updateEntry(db: Knex, viewer: Viewer, id: number, patch: UpdateCatalogueEntryBody) {
  await db.transaction(async (trx) => {
    const before = await catalogue.findById(trx, id);
    if (!before) throw new NotFoundError('catalogue entry', id);
    const { id: _id, updatedAt: _at, lookupKey: _key, charge: _charge, state: _state, ...current } = before;
    const values = validated({ ...current, ...patch });
    await assertKeyFree(trx, values.lookupKey, id);
    await catalogue.update(trx, id, values, viewer.id);
    const changed = Object.keys(patch).filter((field) => (before as never)[field] !== (values as never)[field]);
    const was = Object.fromEntries(changed.map((field) => [field, (before as never)[field]]));
    const now = Object.fromEntries(changed.map((field) => [field, (values as never)[field]]));
    await audit.insert(trx, { actorId: viewer.id, action: 'catalogue.entry-updated', subjectType: 'catalogue-entry', subjectId: id, details: { before: was, after: now } });
  });
  return getEntry(db, id);
}

export async function depiction(db: Knex, id: number): Promise<string> {
  const row = await catalogue.findById(db, id);
  if (!row) throw new NotFoundError('catalogue entry', id);
  if (!row.smiles) throw new NotFoundError(`a structure for catalogue entry ${id} (it has no SMILES)`);
  return parseSmiles(row.smiles, { svgId: `species-${id}` }).svg;
}

/** The curated values as an enthalpy lookup; each value's source names its catalogue entry. */
export async function catalogueLookup(db: Knex | Knex.Transaction): Promise<EnthalpyLookup> {
  const rows = await catalogue.withEnthalpy(db);
  return createEnthalpyLookup(rows.map((row) => ({
    key: row.lookupKey,
    dfH: row.dfH!,
    uncertainty: row.dfHUncertainty,
    source: `${row.dfHSource} [catalogue entry ${row.id}]`,
  })));
}
