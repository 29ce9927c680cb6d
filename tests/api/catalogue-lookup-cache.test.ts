import type { Knex } from 'knex';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { cachedCatalogueLookup } from '@api/catalogue/catalogue-lookup-cache';
import { seedCatalogue } from '@api/catalogue/catalogue-seed';
import { createTestDatabase } from '../helpers/test-db';

let db: Knex;
let drop: () => Promise<void>;

beforeAll(async () => {
  ({ db, drop } = await createTestDatabase());
  await seedCatalogue(db);
});
afterAll(async () => drop());

// ΔfH°(O3, g, 298.15 K) = 142.674 kJ/mol, the seeded built-in value (NIST-JANAF tables).
const OZONE = 142.674;
const ozone = async (handle: Knex | Knex.Transaction = db) => (await cachedCatalogueLookup(handle))('O3')?.dfH;

describe('the catalogue lookup kept in memory', () => {
  it('is read once while the catalogue stays as it is', async () => {
    const first = await cachedCatalogueLookup(db);
    expect(first('O3')?.dfH).toBe(OZONE);
    expect(await cachedCatalogueLookup(db)).toBe(first);
  });

  it('sees a write made outside the service (another process, a seed, psql) at the next analysis', async () => {
    const before = await cachedCatalogueLookup(db);
    await db('species_catalogue').where({ formula: 'O3' }).update({ dfh: 150, dfh_source: 'written directly' });
    const after = await cachedCatalogueLookup(db);
    expect(after).not.toBe(before);
    expect(after('O3')).toMatchObject({ dfH: 150, source: expect.stringContaining('written directly') });
    await db('species_catalogue').where({ formula: 'O3' }).update({ dfh: OZONE });
    expect(await ozone()).toBe(OZONE);
  });

  it('sees entries added and removed', async () => {
    expect((await cachedCatalogueLookup(db))('XeF2')).toBeNull();
    // A made-up value for a species the built-in table lacks: only the lookup's behaviour is tested here.
    await db('species_catalogue').insert({ name: 'test entry', formula: 'XeF2', lookup_key: 'XeF2', dfh: -100, dfh_source: 'test value' });
    expect((await cachedCatalogueLookup(db))('XeF2')?.dfH).toBe(-100);
    await db('species_catalogue').where({ formula: 'XeF2' }).delete();
    expect((await cachedCatalogueLookup(db))('XeF2')).toBeNull();
  });

  it('reads a transaction’s own edits inside it and forgets them after a rollback', async () => {
    expect(await ozone()).toBe(OZONE);
    const rolledBack = new Error('roll back');
    await expect(db.transaction(async (trx) => {
      await trx('species_catalogue').where({ formula: 'O3' }).update({ dfh: 160 });
      expect(await ozone(trx)).toBe(160);
      throw rolledBack;
    })).rejects.toBe(rolledBack);
    expect(await ozone()).toBe(OZONE);
  });
});
