import type { Knex } from 'knex';
import { NotFoundError } from '../errors';
import type { StoredUser } from '../users/users.queries';
import type { StartSimulationBody } from './simulations.schemas';

/** The text to simulate: given directly, or the source of a revision the person may read. */
export async function resolveSimulationSource(
  _db: Knex,
  _user: StoredUser,
  body: StartSimulationBody,
): Promise<{ text: string; revisionId: number | null }> {
  if (body.text !== undefined) return { text: body.text, revisionId: null };
  throw new NotFoundError('revision', body.revisionId);
}
