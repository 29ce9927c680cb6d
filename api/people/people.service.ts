import type { Knex } from 'knex';
import * as users from '../users/users.queries';
import type { Role } from '../users/users.schemas';

const LIMIT = 20;

/** People whose name contains the text (any case), optionally holding a role; id, name and roles only. */
export async function findPeople(db: Knex, text: string, role?: Role) {
  const candidates = role ? await users.findByRole(db, role) : await users.findMany(db);
  const needle = text.toLowerCase();
  return candidates
    .filter((person) => person.name.toLowerCase().includes(needle))
    .slice(0, LIMIT)
    .map(({ id, name, roles }) => ({ id, name, roles }));
}
