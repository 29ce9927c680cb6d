import type { Knex } from 'knex';
import { seedCatalogue } from '../catalogue/catalogue-seed';
import { seedDemoSet } from '../sets/sets-seed';
import { seedMechanisms } from './seed-mechanisms';
import { seedPeople } from './seed-people';

/** The whole demo scenario, idempotent: people first, then what later features add. */
export async function seedDemo(db: Knex): Promise<void> {
  await seedPeople(db);
  // The catalogue first: the demo mechanisms' analyses take their enthalpies from it.
  await seedCatalogue(db);
  await seedMechanisms(db);
  await seedDemoSet(db);
}
