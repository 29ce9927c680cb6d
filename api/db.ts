import knex, { type Knex } from 'knex';
import pg from 'pg';

// Bigint counts (count(*)) as numbers: our tables stay far below 2^53 rows.
pg.types.setTypeParser(pg.types.builtins.INT8, (value) => Number(value));

/** One pool for the process; the session store shares it. */
export function createDb(databaseUrl: string): Knex {
  return knex({ client: 'pg', connection: databaseUrl, pool: { min: 0, max: 10 } });
}

/** True when PostgreSQL answers a trivial query within the timeout. */
export async function isDatabaseUp(db: Knex, timeoutMs = 2000): Promise<boolean> {
  try {
    await Promise.race([
      db.raw('select 1'),
      new Promise((_, reject) => setTimeout(() => reject(new Error('timeout')), timeoutMs)),
    ]);
    return true;
  } catch {
    return false;
  }
}
