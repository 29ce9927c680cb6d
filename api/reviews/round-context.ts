import type { Knex } from 'knex';
import * as audit from '../audit/audit.queries';
import { NotFoundError } from '../errors';
import { loadVisibleById, type Viewer } from '../mechanisms/access';
import type { RoundState } from './round-state';
import * as rounds from './rounds.queries';
import type { RoundRow } from './rounds.queries';

/**
 * A round (row-locked inside a transaction), its mechanism and the viewer's access; a round of a
 * private mechanism the viewer may not see is "not found", like the mechanism itself.
 */
export async function loadRound(trx: Knex.Transaction, viewer: Viewer, roundId: number) {
  const round = await rounds.findByIdForUpdate(trx, roundId);
  if (!round) throw new NotFoundError('review round', roundId);
  const { mechanism, access } = await loadVisibleById(trx, round.mechanismId, viewer);
  const reviewers = await rounds.reviewers(trx, round.id);
  return { round, mechanism, access, assignedHere: reviewers.some((r) => r.id === viewer.id), reviewers };
}

/** A round to read (no lock) and its mechanism; 404 for a round the viewer may not see. */
export async function findVisibleRound(db: Knex | Knex.Transaction, viewer: Viewer, roundId: number) {
  const round = await rounds.findById(db, roundId);
  if (!round) throw new NotFoundError('review round', roundId);
  const { mechanism } = await loadVisibleById(db, round.mechanismId, viewer);
  return { round, mechanism };
}

/** Moves a round to a new state and records who did it and why. */
export async function changeState(
  trx: Knex.Transaction,
  round: RoundRow,
  to: RoundState,
  actorId: number,
  details: Record<string, unknown> = {},
): Promise<void> {
  if (round.state === to) return;
  await rounds.update(trx, round.id, { state: to });
  await audit.insert(trx, {
    actorId, action: 'round.state-changed', subjectType: 'review_round', subjectId: round.id,
    details: { from: round.state, to, ...details },
  });
  round.state = to;
}
