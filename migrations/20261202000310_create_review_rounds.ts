import type { Knex } from 'knex';

const ACTIVE = "('open','revise-requested','endorsed')";

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('review_rounds', (t) => {
    t.increments('id').primary();
    t.integer('mechanism_id').notNullable().references('mechanisms.id').onDelete('CASCADE');
    t.integer('revision_id').notNullable().references('revisions.id');
    t.integer('opened_revision_id').notNullable().references('revisions.id');
    t.text('state').notNullable().defaultTo('open');
    t.integer('endorsements_needed').notNullable();
    t.integer('opened_by').notNullable().references('users.id');
    t.timestamp('closed_at', { useTz: true });
    t.timestamps(true, true);
  });
  await knex.raw(`alter table review_rounds add constraint review_rounds_state_check
    check (state in ('open','revise-requested','endorsed','adopted','declined','withdrawn'))`);
  // At most one round in progress per mechanism.
  await knex.raw(`create unique index review_rounds_one_active on review_rounds (mechanism_id) where state in ${ACTIVE}`);

  await knex.schema.createTable('round_reviewers', (t) => {
    t.integer('round_id').notNullable().references('review_rounds.id').onDelete('CASCADE');
    t.integer('reviewer_id').notNullable().references('users.id');
    t.integer('assigned_by').notNullable().references('users.id');
    t.timestamp('assigned_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(['round_id', 'reviewer_id']);
    t.index(['reviewer_id']);
  });

  await knex.schema.createTable('verdicts', (t) => {
    t.increments('id').primary();
    t.integer('round_id').notNullable().references('review_rounds.id').onDelete('CASCADE');
    t.integer('revision_id').notNullable().references('revisions.id');
    t.integer('reviewer_id').notNullable().references('users.id');
    t.text('verdict').notNullable();
    t.text('comment').notNullable().defaultTo('');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(['round_id', 'revision_id', 'reviewer_id']);
  });
  await knex.raw("alter table verdicts add constraint verdicts_verdict_check check (verdict in ('endorse','revise','decline'))");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('verdicts');
  await knex.schema.dropTable('round_reviewers');
  await knex.schema.dropTable('review_rounds');
}
