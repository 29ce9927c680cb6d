import bcrypt from 'bcryptjs';
import type { Knex } from 'knex';
import { AppError, ConflictError, NotFoundError } from '../errors';
import * as audit from '../audit/audit.queries';
import * as users from '../users/users.queries';
import type { StoredUser } from '../users/users.queries';
import type { SignInBody, SignUpBody, UpdateAccountBody } from './auth.schemas';

const BCRYPT_ROUNDS = 10;
// Compared against when the e-mail is unknown, so both failures take the same time.
const DUMMY_HASH = bcrypt.hashSync('not-a-real-password', BCRYPT_ROUNDS);

export class InvalidCredentialsError extends AppError {
  constructor() {
    super(401, 'INVALID_CREDENTIALS', 'E-mail or password is wrong');
  }
}

export async function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, BCRYPT_ROUNDS);
}

/** New local accounts are authors; other roles come from an admin. */
export async function signUp(db: Knex, input: SignUpBody): Promise<StoredUser> {
  const passwordHash = await hashPassword(input.password);
  return db.transaction(async (trx) => {
    if (await users.findByEmail(trx, input.email)) {
      throw new ConflictError('An account with this e-mail exists; sign in instead', { field: 'email' });
    }
    const id = await users.insert(trx, { name: input.name, email: input.email, passwordHash });
    await users.replaceRoles(trx, id, ['author']);
    await audit.insert(trx, { actorId: id, action: 'account.created', subjectType: 'user', subjectId: id });
    return (await users.findById(trx, id))!;
  });
}

export async function verifyCredentials(db: Knex, input: SignInBody): Promise<StoredUser> {
  const user = await users.findByEmail(db, input.email);
  const matches = await bcrypt.compare(input.password, user?.passwordHash ?? DUMMY_HASH);
  if (!user || !user.passwordHash || !matches) throw new InvalidCredentialsError();
  return user;
}

export interface GithubIdentity {
  id: string;
  login: string;
  name: string;
  email: string | null;
}

/** The account for a GitHub identity: the linked one, else the one with its e-mail, else a new author. */
export async function findOrCreateGithubUser(db: Knex, identity: GithubIdentity): Promise<StoredUser> {
  return db.transaction(async (trx) => {
    const linked = await users.findByGithubId(trx, identity.id);
    if (linked) return linked;
    const byEmail = identity.email ? await users.findByEmail(trx, identity.email) : undefined;
    if (byEmail) {
      await users.linkGithub(trx, byEmail.id, identity.id, identity.login);
      await audit.insert(trx, { actorId: byEmail.id, action: 'account.github-linked', subjectType: 'user', subjectId: byEmail.id });
      return (await users.findById(trx, byEmail.id))!;
    }
    const email = identity.email ?? `${identity.login}@users.noreply.github.invalid`;
    const id = await users.insert(trx, { name: identity.name || identity.login, email, githubId: identity.id, githubLogin: identity.login });
    await users.replaceRoles(trx, id, ['author']);
    await audit.insert(trx, { actorId: id, action: 'account.created', subjectType: 'user', subjectId: id, details: { via: 'github' } });
    return (await users.findById(trx, id))!;
  });
}

export async function updateAccount(db: Knex, userId: number, input: UpdateAccountBody): Promise<StoredUser> {
  await users.updateProfile(db, userId, input);
  const user = await users.findById(db, userId);
  if (!user) throw new NotFoundError('user', userId);
  return user;
}
