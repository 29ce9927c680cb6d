import type { Router } from 'express';
import type { Knex } from 'knex';

/** What feature routers need besides the database (mail, job queue…), filled in as features arrive. */
export interface FeatureDeps {
  db: Knex;
}

/** Every feature's router with its mount path: the one list app.ts mounts. */
export function apiRouters(_deps: FeatureDeps): Array<[string, Router]> {
  return [];
}
