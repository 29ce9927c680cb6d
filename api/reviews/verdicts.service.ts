import type { Knex } from 'knex';
import * as audit from '../audit/audit.queries';
import { ForbiddenError } from '../errors';
import { canEdit, type Viewer } from '../mechanisms/access';
import * as mechanisms from '../mechanisms/mechanisms.queries';
import { notify } from '../notifications/notify';
import * as revisions from '../revisions/revisions.queries';
import { changeState, loadRound } from './round-context';
import { assertActive, stateFromVerdicts } from './round-state';
import type { VerdictBody } from './reviews.schemas';
import { getRound, nameOf } from './rounds.service';
import * as rounds from './rounds.queries';

/**
 * An assigned reviewer's verdict on the round's current revision (a later verdict by the same
 * reviewer on the same revision replaces theirs); the round's state follows from all of them.
 */
export async function giveVerdict(db: Knex, viewer: Viewer, roundId: number, input: VerdictBody) {
  await db.transaction(async (trx) => {
    const { round, mechanism, access, assignedHere } = await loadRound(trx, viewer, roundId);
    if (!assignedHere) throw new ForbiddenError('Only reviewers assigned to this round give verdicts');
    if (canEdit(access)) throw new ForbiddenError('Authors cannot review their own mechanism');
    assertActive(round.state, 'give a verdict');
    await rounds.upsertVerdict(trx, { roundId, revisionId: round.revisionId, reviewerId: viewer.id, ...input });
    const revision = (await revisions.findById(trx, round.revisionId))!;
    await audit.insert(trx, {
      actorId: viewer.id, action: 'verdict.given', subjectType: 'review_round', subjectId: roundId,
      details: { verdict: input.verdict, revision: revision.number },
    });
    const current = await rounds.verdicts(trx, roundId, round.revisionId);
    const next = stateFromVerdicts(current.map((v) => v.verdict), round.endorsementsNeeded);
    await changeState(trx, round, next, viewer.id, { reason: `verdict ${input.verdict}` });
    await notify(trx, {
      kind: 'verdict', mechanism, actorId: viewer.id,
      recipientIds: [mechanism.ownerId, ...(await mechanisms.collaboratorIds(trx, mechanism.id))],
      facts: { mechanismTitle: mechanism.title, slug: mechanism.slug, actorName: await nameOf(trx, viewer.id), revision: revision.number, verdict: input.verdict, comment: input.comment },
    });
  });
  return getRound(db, viewer, roundId);
}
