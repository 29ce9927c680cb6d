import { randomBytes } from 'node:crypto';
import knex, { type Knex } from 'knex';
import { TEMPLATE_DB, testDatabaseUrl } from './test-db-config';

/** A fresh database cloned from the migrated template; drop it with the returned function. */
export async function createTestDatabase(): Promise<{ db: Knex; url: string; drop: () => Promise<void> }> {
  const name = `t_${randomBytes(6).toString('hex')}`;
  const admin = knex({ client: 'pg', connection: testDatabaseUrl('postgres') });
  try {
    await admin.raw(`create database ${name} template ${TEMPLATE_DB}`);
  } finally {
    await admin.destroy();
  }
  const url = testDatabaseUrl(name);
  const db = knex({ client: 'pg', connection: url, pool: { min: 0, max: 5 } });
  const drop = async () => {
    await db.destroy();
    const again = knex({ client: 'pg', connection: testDatabaseUrl('postgres') });
    try {
      await again.raw(`drop database if exists ${name} with (force)`);
    } finally {
      await again.destroy();
    }
  };
  return { db, url, drop };
}
