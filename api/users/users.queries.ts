import type { Knex } from 'knex';
import type { Role, User } from './users.schemas';

type Db = Knex | Knex.Transaction;

interface UserRow {
  id: number;
  name: string;
  email: string;
  password_hash: string | null;
  github_id: string | null;
  github_login: string | null;
  mail_preferences: Record<string, boolean>;
  created_at: Date;
  roles: Role[] | null;
}

export interface StoredUser extends User {
  passwordHash: string | null;
  mailPreferences: Record<string, boolean>;
}

function toUser(row: UserRow): StoredUser {
  return {
    id: row.id,
    name: row.name,
    email: row.email,
    roles: (row.roles ?? []).filter(Boolean).sort(),
    githubLogin: row.github_login,
    createdAt: row.created_at.toISOString(),
    passwordHash: row.password_hash,
    mailPreferences: row.mail_preferences ?? {},
  };
}

function selectUsers(db: Db) {
  return db('users as u')
    .leftJoin('user_roles as r', 'r.user_id', 'u.id')
    .groupBy('u.id')
    .select(
      'u.id', 'u.name', 'u.email', 'u.password_hash', 'u.github_id', 'u.github_login',
      'u.mail_preferences', 'u.created_at',
      db.raw('array_remove(array_agg(r.role order by r.role), null) as roles'),
    );
}

export async function findById(db: Db, id: number): Promise<StoredUser | undefined> {
  const row = await selectUsers(db).where('u.id', id).first();
  return row ? toUser(row) : undefined;
}

export async function findByEmail(db: Db, email: string): Promise<StoredUser | undefined> {
  const row = await selectUsers(db).whereRaw('lower(u.email) = lower(?)', [email]).first();
  return row ? toUser(row) : undefined;
}

export async function findByGithubId(db: Db, githubId: string): Promise<StoredUser | undefined> {
  const row = await selectUsers(db).where('u.github_id', githubId).first();
  return row ? toUser(row) : undefined;
}

export async function findMany(db: Db): Promise<StoredUser[]> {
  const rows = await selectUsers(db).orderBy('u.name');
  return rows.map(toUser);
}

export async function findByRole(db: Db, role: Role): Promise<StoredUser[]> {
  const rows = await selectUsers(db).havingRaw('? = any(array_agg(r.role))', [role]).orderBy('u.name');
  return rows.map(toUser);
}

export async function insert(
  db: Db,
  values: { name: string; email: string; passwordHash?: string; githubId?: string; githubLogin?: string },
): Promise<number> {
  const [row] = await db('users')
    .insert({
      name: values.name,
      email: values.email,
      password_hash: values.passwordHash ?? null,
      github_id: values.githubId ?? null,
      github_login: values.githubLogin ?? null,
    })
    .returning('id');
  return row.id;
}

export async function linkGithub(db: Db, id: number, githubId: string, githubLogin: string): Promise<void> {
  await db('users').where({ id }).update({ github_id: githubId, github_login: githubLogin });
}

export async function updateProfile(
  db: Db,
  id: number,
  values: { name?: string; mailPreferences?: Record<string, boolean> },
): Promise<void> {
  const patch: Record<string, unknown> = {};
  if (values.name !== undefined) patch.name = values.name;
  if (values.mailPreferences !== undefined) patch.mail_preferences = JSON.stringify(values.mailPreferences);
  if (Object.keys(patch).length > 0) await db('users').where({ id }).update(patch);
}

export async function replaceRoles(db: Db, id: number, roles: readonly Role[]): Promise<void> {
  await db('user_roles').where({ user_id: id }).delete();
  if (roles.length > 0) await db('user_roles').insert(roles.map((role) => ({ user_id: id, role })));
}

/** The public shape: never the hash. */
export function publicUser(user: StoredUser): User {
  const { id, name, email, roles, githubLogin, createdAt } = user;
  return { id, name, email, roles, githubLogin, createdAt };
}
