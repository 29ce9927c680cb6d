import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('species_catalogue', (t) => {
    t.increments('id').primary();
    t.text('name').notNullable();
    // The species as written in the step notation (`O3`, `Cl(aq)^-`); lookup_key is its enthalpy
    // table key (radical marks and `(g)` dropped), unique so the lookup never sees a species twice.
    t.text('formula').notNullable();
    t.text('lookup_key').notNullable().unique();
    t.integer('charge').notNullable().defaultTo(0);
    t.text('state');
    t.text('smiles');
    t.double('dfh');
    t.double('dfh_uncertainty');
    t.text('dfh_source');
    t.text('notes').notNullable().defaultTo('');
    t.integer('created_by').references('users.id').onDelete('SET NULL');
    t.integer('updated_by').references('users.id').onDelete('SET NULL');
    t.timestamps(true, true);
  });
  await knex.raw('alter table species_catalogue add constraint species_catalogue_source_check check (dfh is null or dfh_source is not null)');
  await knex.raw("create index species_catalogue_name_lower on species_catalogue (lower(name) text_pattern_ops)");

  await knex.schema.createTable('mechanism_sets', (t) => {
    t.increments('id').primary();
    t.integer('owner_id').notNullable().references('users.id');
    t.text('title').notNullable();
    t.text('audience').notNullable().defaultTo('');
    t.timestamps(true, true);
  });

  await knex.schema.createTable('mechanism_set_items', (t) => {
    t.increments('id').primary();
    t.integer('set_id').notNullable().references('mechanism_sets.id').onDelete('CASCADE');
    t.integer('position').notNullable();
    t.integer('mechanism_id').notNullable().references('mechanisms.id').onDelete('CASCADE');
    t.integer('revision_id').notNullable().references('revisions.id').onDelete('CASCADE');
    t.text('note').notNullable().defaultTo('');
    t.unique(['set_id', 'position']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('mechanism_set_items');
  await knex.schema.dropTable('mechanism_sets');
  await knex.schema.dropTable('species_catalogue');
}
