import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('remarks', (t) => {
    t.increments('id').primary();
    t.integer('round_id').notNullable().references('review_rounds.id').onDelete('CASCADE');
    t.integer('author_id').notNullable().references('users.id');
    t.text('body').notNullable();
    t.text('body_html').notNullable();
    t.text('state').notNullable().defaultTo('open');
    // Where the remark sits now; moved when a new revision enters the round.
    t.integer('revision_id').notNullable().references('revisions.id');
    t.text('step_label');
    t.text('step_normalised').notNullable();
    t.integer('step_line').notNullable();
    t.boolean('matching').notNullable().defaultTo(true);
    // Where it was first made, kept for remarks whose step disappears.
    t.integer('original_revision_id').notNullable().references('revisions.id');
    t.text('original_label');
    t.text('original_normalised').notNullable();
    t.integer('original_line').notNullable();
    t.text('original_context').notNullable();
    t.timestamps(true, true);
    t.index(['round_id']);
  });
  await knex.raw("alter table remarks add constraint remarks_state_check check (state in ('open','settled'))");

  await knex.schema.createTable('remark_replies', (t) => {
    t.increments('id').primary();
    t.integer('remark_id').notNullable().references('remarks.id').onDelete('CASCADE');
    t.integer('author_id').notNullable().references('users.id');
    t.text('body').notNullable();
    t.text('body_html').notNullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['remark_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('remark_replies');
  await knex.schema.dropTable('remarks');
}
