import { createDb } from '../db';
import { loadEnv } from '../env';
import { DEMO_PASSWORD, DEMO_PEOPLE } from './demo-people';
import { seedDemo } from './seed-demo';

/** `npm run db:seed`: idempotent; prints the demo accounts. */
const env = loadEnv();
const db = createDb(env.DATABASE_URL);
try {
  await seedDemo(db);
  console.log('Demo accounts (password for all: %s):', DEMO_PASSWORD);
  for (const person of DEMO_PEOPLE) console.log(`  ${person.roles.join('+').padEnd(16)} ${person.email}`);
} finally {
  await db.destroy();
}
