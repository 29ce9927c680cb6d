import { execFileSync } from 'node:child_process';
import knex from 'knex';
import { migrationSource } from '../../api/migration-source';
import { TEMPLATE_DB, testDatabaseUrl } from './test-db-config';

const TEMPLATE_LOCK = 734_211;

/**
 * Starts the test cluster (idempotent) and makes the migrated template database once; each API test
 * file then clones it (tests/helpers/test-db.ts), so files run in parallel without sharing rows.
 * An advisory lock keeps two test runs from building the same template at once.
 */
export default async function setup(): Promise<void> {
  execFileSync('bash', ['scripts/pg-up.sh'], { env: { ...process.env, CLUSTER: 'test', DB_NAME: 'app_test' }, stdio: 'ignore' });
  const admin = knex({ client: 'pg', connection: testDatabaseUrl('postgres'), pool: { min: 1, max: 1 } });
  try {
    await admin.raw('select pg_advisory_lock(?)', [TEMPLATE_LOCK]);
    const exists = await admin.raw('select 1 from pg_database where datname = ?', [TEMPLATE_DB]);
    if (exists.rows.length === 0) await buildTemplate(admin);
  } finally {
    await admin.raw('select pg_advisory_unlock(?)', [TEMPLATE_LOCK]).catch(() => undefined);
    await admin.destroy();
  }
}

async function buildTemplate(admin: knex.Knex): Promise<void> {
  const building = `${TEMPLATE_DB}_building`;
  await admin.raw(`drop database if exists ${building}`);
  await admin.raw(`create database ${building}`);
  const db = knex({ client: 'pg', connection: testDatabaseUrl(building), migrations: { migrationSource } });
  try {
    await db.migrate.latest();
  } finally {
    await db.destroy();
  }
  // Renamed only when complete, so a half-migrated template is never cloned.
  await admin.raw(`alter database ${building} rename to ${TEMPLATE_DB}`);
}
