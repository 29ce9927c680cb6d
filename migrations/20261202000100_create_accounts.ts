import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('users', (t) => {
    t.increments('id').primary();
    t.text('name').notNullable();
    t.text('email').notNullable();
    t.text('password_hash');
    t.text('github_id').unique();
    t.text('github_login');
    t.jsonb('mail_preferences').notNullable().defaultTo('{}');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw('create unique index users_email_lower_unique on users (lower(email))');
  await knex.schema.createTable('user_roles', (t) => {
    t.integer('user_id').notNullable().references('users.id').onDelete('CASCADE');
    t.text('role').notNullable();
    t.primary(['user_id', 'role']);
  });
  await knex.raw(
    "alter table user_roles add constraint user_roles_role_check check (role in ('author','reviewer','curator','instructor','admin'))",
  );
  // The table connect-pg-simple expects (its table.sql), so sessions survive a server restart.
  await knex.schema.createTable('session', (t) => {
    t.string('sid').primary();
    t.json('sess').notNullable();
    t.timestamp('expire', { precision: 6 }).notNullable();
  });
  await knex.raw('create index "IDX_session_expire" on session (expire)');
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('session');
  await knex.schema.dropTable('user_roles');
  await knex.schema.dropTable('users');
}
