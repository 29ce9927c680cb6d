import type { Knex } from 'knex';

/**
 * A change counter for the species catalogue: every statement that writes to it adds one, in the
 * same transaction, so a server process can keep the catalogue's enthalpies in memory and know, with
 * one tiny read, when another process, a seed or a curator has changed them (api/catalogue/catalogue-lookup-cache.ts).
 */
export async function up(knex: Knex): Promise<void> {
  await knex.raw(`
    create table catalogue_version (
      only_row boolean primary key default true check (only_row),
      version bigint not null
    )`);
  await knex.raw('insert into catalogue_version (only_row, version) values (true, 0)');
  await knex.raw(`
    create function bump_catalogue_version() returns trigger language plpgsql as $$
    begin
      update catalogue_version set version = version + 1;
      return null;
    end $$`);
  await knex.raw(`
    create trigger species_catalogue_changed
    after insert or update or delete or truncate on species_catalogue
    for each statement execute function bump_catalogue_version()`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('drop trigger species_catalogue_changed on species_catalogue');
  await knex.raw('drop function bump_catalogue_version()');
  await knex.raw('drop table catalogue_version');
}
