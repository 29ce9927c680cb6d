import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('attachments', (t) => {
    t.increments('id').primary();
    t.integer('mechanism_id').notNullable().references('mechanisms.id').onDelete('CASCADE');
    t.text('filename').notNullable();
    t.text('media_type').notNullable();
    t.integer('size').notNullable();
    t.specificType('sha256', 'char(64)').notNullable();
    t.binary('content').notNullable();
    t.integer('uploaded_by').notNullable().references('users.id');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['mechanism_id']);
  });

  await knex.schema.createTable('notifications', (t) => {
    t.bigIncrements('id').primary();
    t.integer('user_id').notNullable().references('users.id').onDelete('CASCADE');
    t.integer('mechanism_id').notNullable().references('mechanisms.id').onDelete('CASCADE');
    t.text('kind').notNullable();
    t.text('message').notNullable();
    t.jsonb('details').notNullable().defaultTo('{}');
    t.timestamp('read_at', { useTz: true });
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['user_id', 'read_at']);
  });

  // Written in the same transaction as the state change; a deliverer sends after commit and retries.
  await knex.schema.createTable('mail_outbox', (t) => {
    t.bigIncrements('id').primary();
    t.integer('user_id').references('users.id').onDelete('SET NULL');
    t.text('to_address').notNullable();
    t.text('kind').notNullable();
    t.text('subject').notNullable();
    t.text('text').notNullable();
    t.text('status').notNullable().defaultTo('pending');
    t.integer('attempts').notNullable().defaultTo(0);
    t.text('last_error');
    t.timestamp('next_attempt_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('sent_at', { useTz: true });
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw("alter table mail_outbox add constraint mail_outbox_status_check check (status in ('pending','sent','failed'))");
  await knex.raw("create index mail_outbox_pending on mail_outbox (next_attempt_at) where status = 'pending'");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('mail_outbox');
  await knex.schema.dropTable('notifications');
  await knex.schema.dropTable('attachments');
}
