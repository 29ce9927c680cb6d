import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('mechanisms', (t) => {
    t.increments('id').primary();
    t.text('slug').notNullable().unique();
    t.text('title').notNullable();
    t.text('summary').notNullable().defaultTo('');
    t.specificType('tags', 'text[]').notNullable().defaultTo('{}');
    t.text('visibility').notNullable().defaultTo('public');
    t.integer('owner_id').notNullable().references('users.id');
    // Bumped with a compare-and-set when a revision is added: the guard against two saves on one base.
    t.integer('latest_revision_number').notNullable().defaultTo(0);
    t.timestamps(true, true);
  });
  await knex.raw("alter table mechanisms add constraint mechanisms_visibility_check check (visibility in ('public','private'))");
  await knex.raw(`alter table mechanisms add column search tsvector generated always as (
    setweight(to_tsvector('english', title), 'A') || setweight(to_tsvector('english', summary), 'B')) stored`);
  await knex.raw('create index mechanisms_search_gin on mechanisms using gin (search)');
  await knex.raw('create index mechanisms_tags_gin on mechanisms using gin (tags)');

  await knex.schema.createTable('mechanism_collaborators', (t) => {
    t.integer('mechanism_id').notNullable().references('mechanisms.id').onDelete('CASCADE');
    t.integer('user_id').notNullable().references('users.id').onDelete('CASCADE');
    t.primary(['mechanism_id', 'user_id']);
  });

  await knex.schema.createTable('revisions', (t) => {
    t.increments('id').primary();
    t.integer('mechanism_id').notNullable().references('mechanisms.id').onDelete('CASCADE');
    t.integer('number').notNullable();
    t.integer('parent_id').references('revisions.id');
    t.text('source').notNullable();
    t.text('change_note').notNullable().defaultTo('');
    t.integer('author_id').notNullable().references('users.id');
    t.jsonb('analysis').notNullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(['mechanism_id', 'number']);
  });
  await knex.schema.alterTable('mechanisms', (t) => {
    t.integer('reference_revision_id').references('revisions.id');
  });

  await knex.schema.createTable('revision_species', (t) => {
    t.integer('revision_id').notNullable().references('revisions.id').onDelete('CASCADE');
    t.text('species_key').notNullable();
    t.primary(['revision_id', 'species_key']);
    t.index(['species_key']);
  });

  // A revision refused because its base was stale: kept so the author's text is never lost.
  await knex.schema.createTable('rejected_submissions', (t) => {
    t.increments('id').primary();
    t.integer('mechanism_id').notNullable().references('mechanisms.id').onDelete('CASCADE');
    t.integer('base_number').notNullable();
    t.integer('latest_number').notNullable();
    t.text('source').notNullable();
    t.text('change_note').notNullable().defaultTo('');
    t.integer('author_id').notNullable().references('users.id');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('rejected_submissions');
  await knex.schema.dropTable('revision_species');
  await knex.schema.alterTable('mechanisms', (t) => t.dropColumn('reference_revision_id'));
  await knex.schema.dropTable('revisions');
  await knex.schema.dropTable('mechanism_collaborators');
  await knex.schema.dropTable('mechanisms');
}
