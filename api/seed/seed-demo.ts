import type { Knex } from 'knex';
import { seedMechanisms } from './seed-mechanisms';
import { seedPeople } from './seed-people';

/** The whole demo scenario, idempotent: people first, then what later features add. */
export async function seedDemo(db: Knex): Promise<void> {
  await seedPeople(db);
  await seedMechanisms(db);
}
