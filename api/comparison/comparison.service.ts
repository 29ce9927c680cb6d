import type { Knex } from 'knex';
import { NotFoundError } from '../errors';
import { loadVisible, type Viewer } from '../mechanisms/access';
import * as revisions from '../revisions/revisions.queries';
import { compareRevisions } from './compare';

/** Compares any two revisions of a mechanism the viewer may see. */
export async function compareMechanismRevisions(db: Knex, viewer: Viewer, slug: string, fromNumber: number, toNumber: number) {
  const { mechanism } = await loadVisible(db, slug, viewer);
  const [from, to] = await Promise.all([
    revisions.findByNumber(db, mechanism.id, fromNumber),
    revisions.findByNumber(db, mechanism.id, toNumber),
  ]);
  if (!from) throw new NotFoundError('revision', `r${fromNumber}`);
  if (!to) throw new NotFoundError('revision', `r${toNumber}`);
  return compareRevisions(from, to);
}
