import { execFileSync } from 'node:child_process';
import knex from 'knex';
import { migrationSource } from '../../api/migration-source';
import { TEMPLATE_DB, testDatabaseUrl } from './test-db-config';

/**
 * Starts the test cluster (idempotent) and migrates a template database once; each API test file
 * then clones the template (tests/helpers/test-db.ts), so files run in parallel without sharing rows.
 */
export default async function setup(): Promise<void> {
  execFileSync('bash', ['scripts/pg-up.sh'], {
    env: { ...process.env, CLUSTER: 'test', DB_NAME: TEMPLATE_DB },
    stdio: 'ignore',
  });
  const db = knex({
    client: 'pg',
    connection: testDatabaseUrl(TEMPLATE_DB),
    migrations: { migrationSource },
  });
  try {
    await db.migrate.latest();
  } finally {
    await db.destroy();
  }
}
