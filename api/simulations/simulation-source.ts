import type { Knex } from 'knex';
import { NotFoundError } from '../errors';
import { loadVisibleById } from '../mechanisms/access';
import * as revisions from '../revisions/revisions.queries';
import type { StoredUser } from '../users/users.queries';
import type { StartSimulationBody } from './simulations.schemas';

/** The text to simulate: given directly, or the source of a revision the person may read (else 404). */
export async function resolveSimulationSource(
  db: Knex,
  user: StoredUser,
  body: StartSimulationBody,
): Promise<{ text: string; revisionId: number | null }> {
  if (body.text !== undefined) return { text: body.text, revisionId: null };
  const revision = await revisions.findById(db, body.revisionId!);
  if (!revision) throw new NotFoundError('revision', body.revisionId);
  await loadVisibleById(db, revision.mechanismId, user).catch(() => {
    throw new NotFoundError('revision', body.revisionId);
  });
  return { text: revision.source, revisionId: revision.id };
}
