import type { Knex } from 'knex';
import { hashPassword } from '../auth/auth.service';
import * as users from '../users/users.queries';
import { DEMO_PASSWORD, DEMO_PEOPLE } from './demo-people';

/** Creates the demo accounts that are missing; existing ones (and their later changes) are left alone. */
export async function seedPeople(db: Knex): Promise<Map<string, number>> {
  const ids = new Map<string, number>();
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  for (const person of DEMO_PEOPLE) {
    await db.transaction(async (trx) => {
      const existing = await users.findByEmail(trx, person.email);
      if (existing) return void ids.set(person.email, existing.id);
      const id = await users.insert(trx, { name: person.name, email: person.email, passwordHash });
      await users.replaceRoles(trx, id, person.roles);
      ids.set(person.email, id);
    });
  }
  return ids;
}
