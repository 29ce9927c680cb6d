import { randomBytes } from 'node:crypto';
import knex from 'knex';
import { describe, expect, it } from 'vitest';
import { migrationSource } from '@api/migration-source';
import { testDatabaseUrl } from '../helpers/test-db-config';

describe('migrations', () => {
  it('run up, all the way down and up again on an empty database', async () => {
    const name = `m_${randomBytes(5).toString('hex')}`;
    const admin = knex({ client: 'pg', connection: testDatabaseUrl('postgres') });
    await admin.raw(`create database ${name}`);
    const db = knex({ client: 'pg', connection: testDatabaseUrl(name), migrations: { migrationSource } });
    try {
      const [, applied] = await db.migrate.latest();
      expect(applied.length).toBe((await migrationSource.getMigrations([])).length);
      await db.migrate.rollback(undefined, true);
      const left = await db.raw("select tablename from pg_tables where schemaname = 'public' and tablename not like 'knex_%'");
      expect(left.rows).toEqual([]);
      await db.migrate.latest();
      expect((await db.migrate.currentVersion()) !== 'none').toBe(true);
    } finally {
      await db.destroy();
      await admin.raw(`drop database ${name} with (force)`);
      await admin.destroy();
    }
  });
});
