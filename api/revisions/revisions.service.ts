import type { Knex } from 'knex';
import { enthalpySource } from '../analysis/analysis.service';
import * as audit from '../audit/audit.queries';
import { ConflictError, NotFoundError } from '../errors';
import { assertEditor, loadVisible, type Viewer } from '../mechanisms/access';
import * as mechanisms from '../mechanisms/mechanisms.queries';
import type { MechanismRow } from '../mechanisms/mechanisms.queries';
import { takeNewRevision } from '../reviews/round-revision.service';
import { analyseSource } from './analyse-source';
import * as revisions from './revisions.queries';
import type { CreateRevisionBody } from './revisions.schemas';
import { presentRevision, storeRevision } from './store-revision';

/**
 * Adds revision base+1. Two saves on one base race on a compare-and-set of the mechanism's latest
 * number: the loser gets 409 with the latest revision, and its own text is kept as a rejected
 * submission, so neither text is lost and the author can rebase.
 */
export async function addRevision(db: Knex, viewer: Viewer, slug: string, input: CreateRevisionBody) {
  const analysed = analyseSource(input.source, await enthalpySource(db));
  const outcome = await db.transaction(async (trx) => {
    const { mechanism, access } = await loadVisible(trx, slug, viewer);
    assertEditor(access);
    if (!(await mechanisms.advanceLatest(trx, mechanism.id, input.base))) return { stale: mechanism, revision: null };
    const parent = await revisions.findByNumber(trx, mechanism.id, input.base);
    const revision = await storeRevision(trx, {
      mechanismId: mechanism.id, number: input.base + 1, parentId: parent!.id,
      source: input.source, changeNote: input.changeNote, authorId: viewer.id,
    }, analysed);
    await takeNewRevision(trx, mechanism, revision, viewer.id);
    return { stale: null, revision };
  });
  if (outcome.stale) throw await rejectStale(db, viewer, outcome.stale, input);
  return presentRevision(outcome.revision!);
}

async function rejectStale(db: Knex, viewer: Viewer, mechanism: MechanismRow, input: CreateRevisionBody) {
  const current = (await mechanisms.findById(db, mechanism.id))!;
  if (input.base > current.latestRevisionNumber) return new NotFoundError('revision', `r${input.base}`);
  const latest = (await revisions.findByNumber(db, mechanism.id, current.latestRevisionNumber))!;
  const rejectedId = await db.transaction(async (trx) => {
    const id = await revisions.insertRejected(trx, {
      mechanismId: mechanism.id, baseNumber: input.base, latestNumber: latest.number,
      source: input.source, changeNote: input.changeNote, authorId: viewer.id,
    });
    await audit.insert(trx, {
      actorId: viewer.id, action: 'revision.rejected-stale', subjectType: 'mechanism', subjectId: mechanism.id,
      details: { rejectedSubmissionId: id, base: input.base, latest: latest.number },
    });
    return id;
  });
  return new ConflictError(`r${input.base} is no longer the latest revision (r${latest.number} is); rebase your text on it`, {
    latest: { number: latest.number, source: latest.source, changeNote: latest.changeNote, authorId: latest.authorId },
    yours: { rejectedSubmissionId: rejectedId, base: input.base, source: input.source, changeNote: input.changeNote },
  });
}

export async function listRevisions(db: Knex, viewer: Viewer, slug: string) {
  const { mechanism } = await loadVisible(db, slug, viewer);
  return revisions.listForMechanism(db, mechanism.id);
}

export async function getRevision(db: Knex, viewer: Viewer, slug: string, number: number) {
  const { mechanism } = await loadVisible(db, slug, viewer);
  const revision = await revisions.findByNumber(db, mechanism.id, number);
  if (!revision) throw new NotFoundError('revision', `r${number}`);
  const [author] = await mechanisms.peopleByIds(db, [revision.authorId]);
  return presentRevision(revision, author?.name);
}

/** Texts refused because their base was stale: the owner and collaborators can recover them. */
export async function listRejectedSubmissions(db: Knex, viewer: Viewer, slug: string) {
  const { mechanism, access } = await loadVisible(db, slug, viewer);
  assertEditor(access);
  return revisions.listRejected(db, mechanism.id);
}
