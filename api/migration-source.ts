import { readdirSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import type { Knex } from 'knex';

const migrationsDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', 'migrations');

/**
 * Loads the TypeScript migrations through our own dynamic import, so they run wherever this module
 * runs (tsx, Vitest's module runner) — Knex's own loader cannot import .ts files in an ES module package.
 */
export const migrationSource: Knex.MigrationSource<string> = {
  async getMigrations() {
    return readdirSync(migrationsDir).filter((name) => /^\d+_.+\.ts$/.test(name)).sort();
  },
  getMigrationName(name) {
    return name;
  },
  async getMigration(name) {
    return import(pathToFileURL(path.join(migrationsDir, name)).href);
  },
};
