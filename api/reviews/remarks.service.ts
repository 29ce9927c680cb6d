import type { Knex } from 'knex';
import * as audit from '../audit/audit.queries';
import { AppError, ForbiddenError, InvalidStateError, NotFoundError } from '../errors';
import { canEdit, takesPart, type Viewer } from '../mechanisms/access';
import * as mechanisms from '../mechanisms/mechanisms.queries';
import { notify } from '../notifications/notify';
import * as revisions from '../revisions/revisions.queries';
import { renderMarkdown } from './markdown';
import { anchorOf, findStep, lineText } from './remark-anchor';
import * as remarks from './remarks.queries';
import type { Remark, RemarkBody, RemarkReply } from './reviews.schemas';
import { findVisibleRound, loadRound } from './round-context';
import { assertActive } from './round-state';
import { nameOf } from './rounds.service';

/** An assigned reviewer or a curator remarks on one step of the round's current revision. */
export async function addRemark(db: Knex, viewer: Viewer, roundId: number, input: RemarkBody): Promise<Remark> {
  return db.transaction(async (trx) => {
    const { round, mechanism, access, assignedHere } = await loadRound(trx, viewer, roundId);
    if (!assignedHere && !access.isCurator) throw new ForbiddenError('Only assigned reviewers and curators leave remarks');
    assertActive(round.state, 'add remarks');
    const revision = (await revisions.findById(trx, round.revisionId))!;
    const step = findStep(revision.analysis.steps, input.step);
    if (!step) {
      const labels = revision.analysis.steps.map((s, i) => s.label ?? `#${i + 1}`);
      throw new AppError(422, 'STEP_NOT_FOUND', `r${revision.number} has no step "${input.step}"`, { available: labels });
    }
    const id = await remarks.insert(trx, {
      roundId, authorId: viewer.id, body: input.body, bodyHtml: renderMarkdown(input.body), revisionId: revision.id,
      ...anchorOf(step), context: lineText(revision.source, step.line) || step.equation,
    });
    await audit.insert(trx, { actorId: viewer.id, action: 'remark.created', subjectType: 'review_round', subjectId: roundId, details: { remarkId: id, step: input.step, revision: revision.number } });
    await notify(trx, {
      kind: 'remark', mechanism, actorId: viewer.id,
      recipientIds: [mechanism.ownerId, ...(await mechanisms.collaboratorIds(trx, mechanism.id))],
      facts: { mechanismTitle: mechanism.title, slug: mechanism.slug, actorName: await nameOf(trx, viewer.id), revision: revision.number, step: step.label ?? input.step, remark: input.body },
    });
    const created = (await remarks.listForRound(trx, roundId)).find((remark) => remark.id === id)!;
    return { ...created, replies: [] };
  });
}

export async function listRemarks(db: Knex, viewer: Viewer, roundId: number): Promise<Remark[]> {
  await findVisibleRound(db, viewer, roundId);
  const list = await remarks.listForRound(db, roundId);
  const replies = await remarks.repliesFor(db, list.map((remark) => remark.id));
  return list.map((remark) => ({ ...remark, replies: replies.filter((reply) => reply.remarkId === remark.id) }));
}

async function loadRemark(trx: Knex.Transaction, viewer: Viewer, remarkId: number) {
  const remark = await remarks.findById(trx, remarkId);
  if (!remark) throw new NotFoundError('remark', remarkId);
  return { remark, ...(await loadRound(trx, viewer, remark.roundId)) };
}

/** Anyone taking part in the round answers in the thread. */
export async function replyToRemark(db: Knex, viewer: Viewer, remarkId: number, body: string): Promise<RemarkReply> {
  return db.transaction(async (trx) => {
    const { remark, access, assignedHere } = await loadRemark(trx, viewer, remarkId);
    if (!takesPart(access) && !assignedHere) throw new ForbiddenError('Only the people taking part in this review reply to remarks');
    const id = await remarks.insertReply(trx, { remarkId: remark.id, authorId: viewer.id, body, bodyHtml: renderMarkdown(body) });
    await audit.insert(trx, { actorId: viewer.id, action: 'remark.replied', subjectType: 'review_round', subjectId: remark.roundId, details: { remarkId, replyId: id } });
    return (await remarks.repliesFor(trx, [remark.id])).find((reply) => reply.id === id)!;
  });
}

/** The mechanism's authors or the remark's own author mark it settled. */
export async function settleRemark(db: Knex, viewer: Viewer, remarkId: number) {
  await db.transaction(async (trx) => {
    const { remark, access } = await loadRemark(trx, viewer, remarkId);
    if (!canEdit(access) && remark.authorId !== viewer.id) throw new ForbiddenError('Only the authors or the remark\'s writer settle it');
    if (remark.state !== 'open') throw new InvalidStateError('This remark is already settled', { state: remark.state });
    await remarks.settle(trx, remark.id);
    await audit.insert(trx, { actorId: viewer.id, action: 'remark.settled', subjectType: 'review_round', subjectId: remark.roundId, details: { remarkId } });
  });
}
