import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('simulations', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.integer('created_by').references('users.id').onDelete('SET NULL');
    // The revision simulated, when it was one (null for unsaved text); no FK so revisions stay independent.
    t.integer('revision_id');
    t.text('source_text').notNullable();
    t.jsonb('inputs').notNullable();
    t.text('cache_key').notNullable();
    t.text('status').notNullable().defaultTo('queued');
    t.double('progress').notNullable().defaultTo(0);
    t.boolean('cancel_requested').notNullable().defaultTo(false);
    t.jsonb('result');
    t.jsonb('error');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('started_at', { useTz: true });
    t.timestamp('finished_at', { useTz: true });
    t.index(['cache_key', 'status']);
  });
  await knex.raw(
    "alter table simulations add constraint simulations_status_check check (status in ('queued','running','succeeded','failed','cancelled'))",
  );
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('simulations');
}
