import type { Knex } from 'knex';
import * as audit from '../audit/audit.queries';
import { AppError, InvalidStateError, NotFoundError } from '../errors';
import { accessTo, assertEditor, canEdit, loadVisible, type Viewer } from '../mechanisms/access';
import * as mechanisms from '../mechanisms/mechanisms.queries';
import { notify } from '../notifications/notify';
import * as revisions from '../revisions/revisions.queries';
import * as users from '../users/users.queries';
import { changeState, findVisibleRound, loadRound } from './round-context';
import { assertActive, assertState } from './round-state';
import type { RoundDetail, RoundListItem } from './reviews.schemas';
import * as rounds from './rounds.queries';

/** Puts a revision (the latest unless named) up for review; one round per mechanism at a time. */
export async function openRound(db: Knex, viewer: Viewer, slug: string, revisionNumber: number | undefined, endorsementsNeeded: number) {
  const id = await db.transaction(async (trx) => {
    const { mechanism, access } = await loadVisible(trx, slug, viewer);
    assertEditor(access);
    const number = revisionNumber ?? mechanism.latestRevisionNumber;
    const revision = await revisions.findByNumber(trx, mechanism.id, number);
    if (!revision) throw new NotFoundError('revision', `r${number}`);
    const id = await rounds.insert(trx, { mechanismId: mechanism.id, revisionId: revision.id, endorsementsNeeded, openedBy: viewer.id });
    if (id === null) {
      const active = await rounds.findActiveForMechanism(trx, mechanism.id);
      throw new InvalidStateError('A review round is already in progress for this mechanism', { roundId: active?.id });
    }
    await audit.insert(trx, { actorId: viewer.id, action: 'round.opened', subjectType: 'review_round', subjectId: id, details: { mechanism: mechanism.slug, revision: number } });
    return id;
  });
  return getRound(db, viewer, id);
}

export async function getRound(db: Knex, viewer: Viewer, roundId: number): Promise<RoundDetail> {
  const { round, mechanism } = await findVisibleRound(db, viewer, roundId);
  const [revision, reviewers, verdicts, timeline] = await Promise.all([
    revisions.findById(db, round.revisionId),
    rounds.reviewers(db, round.id),
    rounds.verdicts(db, round.id),
    audit.findBySubject(db, 'review_round', round.id),
  ]);
  const current = verdicts.filter((v) => v.revision === revision!.number);
  return {
    id: round.id, state: round.state, mechanism: { slug: mechanism.slug, title: mechanism.title },
    revision: revision!.number, endorsementsNeeded: round.endorsementsNeeded,
    endorsements: current.filter((v) => v.verdict === 'endorse').length,
    reviewers: reviewers.map(({ id, name }) => ({ id, name })), verdicts, timeline,
    createdAt: round.createdAt, closedAt: round.closedAt,
  };
}

export async function listRounds(db: Knex, viewer: Viewer, slug: string): Promise<RoundListItem[]> {
  const { mechanism } = await loadVisible(db, slug, viewer);
  return rounds.listForMechanism(db, mechanism.id);
}

/** A curator assigns a reviewer: someone with the reviewer role who is not an author of the mechanism. */
export async function assignReviewer(db: Knex, viewer: Viewer, roundId: number, reviewerId: number) {
  await db.transaction(async (trx) => {
    const { round, mechanism } = await loadRound(trx, viewer, roundId);
    assertActive(round.state, 'assign reviewers');
    const reviewer = await users.findById(trx, reviewerId);
    if (!reviewer) throw new NotFoundError('user', reviewerId);
    if (!reviewer.roles.includes('reviewer')) throw new AppError(422, 'NOT_A_REVIEWER', `${reviewer.name} does not hold the reviewer role`);
    if (canEdit(await accessTo(trx, mechanism, reviewer))) {
      throw new AppError(409, 'OWN_MECHANISM', `${reviewer.name} is an author of this mechanism and cannot review it`);
    }
    if (!(await rounds.assignReviewer(trx, round.id, reviewerId, viewer.id))) return;
    await audit.insert(trx, { actorId: viewer.id, action: 'round.reviewer-assigned', subjectType: 'review_round', subjectId: round.id, details: { reviewerId } });
    const revision = (await revisions.findById(trx, round.revisionId))!;
    await notify(trx, {
      kind: 'review-requested', mechanism, actorId: viewer.id, recipientIds: [reviewerId],
      facts: { mechanismTitle: mechanism.title, slug: mechanism.slug, actorName: await nameOf(trx, viewer.id), revision: revision.number },
    });
  });
  return getRound(db, viewer, roundId);
}

export async function withdrawRound(db: Knex, viewer: Viewer, roundId: number) {
  await db.transaction(async (trx) => {
    const { round, access } = await loadRound(trx, viewer, roundId);
    assertEditor(access);
    assertActive(round.state, 'withdraw it');
    await changeState(trx, round, 'withdrawn', viewer.id, { reason: 'withdrawn by an author' });
  });
  return getRound(db, viewer, roundId);
}

/** A curator adopts an endorsed round: its revision becomes the mechanism's reference revision. */
export async function adoptRound(db: Knex, viewer: Viewer, roundId: number) {
  await db.transaction(async (trx) => {
    const { round, mechanism } = await loadRound(trx, viewer, roundId);
    assertState(round.state, 'endorsed', 'adopted');
    const revision = (await revisions.findById(trx, round.revisionId))!;
    await changeState(trx, round, 'adopted', viewer.id, { revision: revision.number });
    await mechanisms.setReference(trx, mechanism.id, revision.id);
    await audit.insert(trx, { actorId: viewer.id, action: 'mechanism.reference-set', subjectType: 'mechanism', subjectId: mechanism.id, details: { revision: revision.number, roundId } });
    await notify(trx, {
      kind: 'adopted', mechanism, actorId: viewer.id,
      recipientIds: [revision.authorId, mechanism.ownerId, ...(await mechanisms.collaboratorIds(trx, mechanism.id))],
      facts: { mechanismTitle: mechanism.title, slug: mechanism.slug, actorName: await nameOf(trx, viewer.id), revision: revision.number },
    });
  });
  return getRound(db, viewer, roundId);
}

export async function nameOf(db: Knex | Knex.Transaction, userId: number): Promise<string> {
  return (await users.findById(db, userId))?.name ?? 'Someone';
}
