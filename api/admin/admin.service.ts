import type { Knex } from 'knex';
import { AppError, NotFoundError } from '../errors';
import * as audit from '../audit/audit.queries';
import * as users from '../users/users.queries';
import type { Role } from '../users/users.schemas';

export async function listUsers(db: Knex) {
  return (await users.findMany(db)).map(users.publicUser);
}

/** Replaces a person's roles; an admin cannot drop their own admin role (someone must stay admin). */
export async function setRoles(db: Knex, actorId: number, userId: number, roles: Role[]) {
  if (actorId === userId && !roles.includes('admin')) {
    throw new AppError(409, 'LAST_ADMIN_GUARD', 'You cannot remove your own admin role; ask another admin');
  }
  return db.transaction(async (trx) => {
    const before = await users.findById(trx, userId);
    if (!before) throw new NotFoundError('user', userId);
    const unique = [...new Set(roles)];
    await users.replaceRoles(trx, userId, unique);
    await audit.insert(trx, {
      actorId,
      action: 'account.roles-changed',
      subjectType: 'user',
      subjectId: userId,
      details: { before: before.roles, after: [...unique].sort() },
    });
    return users.publicUser((await users.findById(trx, userId))!);
  });
}
