import type { Knex } from 'knex';
import { enthalpySource } from '../analysis/analysis.service';
import * as audit from '../audit/audit.queries';
import { AppError, ConflictError } from '../errors';
import { analyseSource } from '../revisions/analyse-source';
import * as revisions from '../revisions/revisions.queries';
import { storeRevision } from '../revisions/store-revision';
import * as rounds from '../reviews/rounds.queries';
import { assertOwner, canEdit, loadVisible, type Viewer } from './access';
import * as mechanisms from './mechanisms.queries';
import type { CreateMechanismBody, UpdateMechanismBody } from './mechanisms.schemas';

const slugFromTitle = (title: string) =>
  title.toLowerCase().normalize('NFKD').replace(/[^a-z0-9]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 60) || 'mechanism';

/** A new mechanism owned by the author, with its first revision r1. */
export async function createMechanism(db: Knex, viewer: Viewer, input: CreateMechanismBody) {
  const analysed = analyseSource(input.source, await enthalpySource(db));
  const slug = input.slug ?? slugFromTitle(input.title);
  await db.transaction(async (trx) => {
    const id = await mechanisms.insert(trx, { ...input, slug, ownerId: viewer.id });
    if (id === null) throw new ConflictError(`The address "${slug}" is taken; choose another slug`, { field: 'slug' });
    await audit.insert(trx, { actorId: viewer.id, action: 'mechanism.created', subjectType: 'mechanism', subjectId: id, details: { slug } });
    await mechanisms.advanceLatest(trx, id, 0);
    await storeRevision(trx, { mechanismId: id, number: 1, parentId: null, source: input.source, changeNote: input.changeNote, authorId: viewer.id }, analysed);
  });
  return getMechanism(db, viewer, slug);
}

export async function getMechanism(db: Knex, viewer: Viewer, slug: string) {
  const { mechanism, access } = await loadVisible(db, slug, viewer);
  const [collaboratorIds, reference, activeRound] = await Promise.all([
    mechanisms.collaboratorIds(db, mechanism.id),
    mechanism.referenceRevisionId ? revisions.findById(db, mechanism.referenceRevisionId) : undefined,
    rounds.findActiveForMechanism(db, mechanism.id),
  ]);
  const people = await mechanisms.peopleByIds(db, [mechanism.ownerId, ...collaboratorIds]);
  const { id, title, summary, tags, visibility, latestRevisionNumber, createdAt, updatedAt } = mechanism;
  return {
    id, slug: mechanism.slug, title, summary, tags, visibility, latestRevisionNumber, createdAt, updatedAt,
    owner: people.find((p) => p.id === mechanism.ownerId)!,
    collaborators: people.filter((p) => collaboratorIds.includes(p.id)),
    referenceRevision: reference?.number ?? null,
    activeRound: activeRound ? { id: activeRound.id, state: activeRound.state } : null,
    youCanEdit: canEdit(access),
  };
}

export async function updateMechanism(db: Knex, viewer: Viewer, slug: string, patch: UpdateMechanismBody) {
  await db.transaction(async (trx) => {
    const { mechanism, access } = await loadVisible(trx, slug, viewer);
    assertOwner(access);
    await mechanisms.update(trx, mechanism.id, patch);
    await audit.insert(trx, { actorId: viewer.id, action: 'mechanism.updated', subjectType: 'mechanism', subjectId: mechanism.id, details: { fields: Object.keys(patch), visibility: patch.visibility } });
  });
  return getMechanism(db, viewer, slug);
}

export async function setCollaborators(db: Knex, viewer: Viewer, slug: string, userIds: number[]) {
  await db.transaction(async (trx) => {
    const { mechanism, access } = await loadVisible(trx, slug, viewer);
    assertOwner(access);
    const unique = [...new Set(userIds)].filter((id) => id !== mechanism.ownerId);
    const found = await mechanisms.peopleByIds(trx, unique);
    if (found.length !== unique.length) {
      const missing = unique.filter((id) => !found.some((p) => p.id === id));
      throw new AppError(422, 'UNKNOWN_PEOPLE', `No account with id ${missing.join(', ')}`, { missing });
    }
    const before = await mechanisms.collaboratorIds(trx, mechanism.id);
    await mechanisms.replaceCollaborators(trx, mechanism.id, unique);
    await audit.insert(trx, { actorId: viewer.id, action: 'mechanism.collaborators-changed', subjectType: 'mechanism', subjectId: mechanism.id, details: { before, after: unique.sort((a, b) => a - b) } });
  });
  return getMechanism(db, viewer, slug);
}
