import type { Knex } from 'knex';
import * as audit from '../audit/audit.queries';
import type { MechanismRow } from '../mechanisms/mechanisms.queries';
import type { RevisionRow } from '../revisions/revisions.queries';
import { anchorOf, followAnchor } from './remark-anchor';
import * as remarks from './remarks.queries';
import { changeState } from './round-context';
import * as rounds from './rounds.queries';

/**
 * A new revision enters the mechanism's round in progress: verdicts start again on it (the round
 * reopens), and each open remark moves to the same step in it — or is kept where it was and marked
 * as no longer matching when that step is gone.
 */
export async function takeNewRevision(trx: Knex.Transaction, mechanism: MechanismRow, revision: RevisionRow, actorId: number) {
  const active = await rounds.findActiveForMechanism(trx, mechanism.id);
  if (!active) return;
  const round = (await rounds.findByIdForUpdate(trx, active.id))!;
  await rounds.update(trx, round.id, { revisionId: revision.id });
  await audit.insert(trx, {
    actorId, action: 'round.revision-entered', subjectType: 'review_round', subjectId: round.id,
    details: { revision: revision.number },
  });
  await changeState(trx, round, 'open', actorId, { reason: `r${revision.number} entered the round` });
  await followRemarks(trx, round.id, revision, actorId);
}

async function followRemarks(trx: Knex.Transaction, roundId: number, revision: RevisionRow, actorId: number) {
  const moved: number[] = [];
  const noLongerMatching: number[] = [];
  for (const remark of await remarks.findFollowing(trx, roundId)) {
    const step = followAnchor({ label: remark.stepLabel, normalised: remark.stepNormalised, line: remark.stepLine }, revision.analysis.steps);
    if (step) {
      await remarks.moveTo(trx, remark.id, { revisionId: revision.id, ...anchorOf(step) });
      moved.push(remark.id);
    } else {
      await remarks.markNoLongerMatching(trx, remark.id);
      noLongerMatching.push(remark.id);
    }
  }
  if (moved.length + noLongerMatching.length === 0) return;
  await audit.insert(trx, {
    actorId, action: 'remarks.followed', subjectType: 'review_round', subjectId: roundId,
    details: { revision: revision.number, moved, noLongerMatching },
  });
}
