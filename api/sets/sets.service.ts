import type { Knex } from 'knex';
import * as audit from '../audit/audit.queries';
import { AppError, NotFoundError } from '../errors';
import { loadVisible, type Viewer } from '../mechanisms/access';
import * as mechanisms from '../mechanisms/mechanisms.queries';
import * as revisions from '../revisions/revisions.queries';
import { loadOwnSet, loadReadableSet, visibleMechanismIds } from './set-access';
import * as sets from './sets.queries';
import { findChoices } from './set-choices.queries';
import type { CreateSetBody, MechanismChoice, SetDetail, SetItemInput, SetSummary, UpdateSetBody } from './sets.schemas';

/**
 * Each item's mechanism must be visible to the instructor and its revision must exist. Refusals
 * name the item as the editor numbers it (from 1) and the field, so the message stands beside it.
 */
async function resolveItems(trx: Knex.Transaction, viewer: Viewer, items: SetItemInput[]) {
  const resolved = [];
  for (const [index, item] of items.entries()) {
    const mechanism = await visibleMechanism(trx, viewer, item.mechanism, index);
    const revision = await revisions.findByNumber(trx, mechanism.id, item.revision);
    if (!revision) {
      const message = `Mechanism ${index + 1}: ${item.mechanism} has no revision r${item.revision} (latest is r${mechanism.latestRevisionNumber})`;
      throw new AppError(422, 'UNKNOWN_REVISION', message, { field: `items.${index}.revision`, latest: mechanism.latestRevisionNumber });
    }
    resolved.push({ mechanismId: mechanism.id, revisionId: revision.id, note: item.note });
  }
  return resolved;
}

/** Still a 404, as for any mechanism one may not see, but saying that it may exist out of sight. */
async function visibleMechanism(trx: Knex.Transaction, viewer: Viewer, slug: string, index: number) {
  try {
    return (await loadVisible(trx, slug, viewer)).mechanism;
  } catch (error) {
    if (!(error instanceof NotFoundError)) throw error;
    const message = `Mechanism ${index + 1}: ${slug} is not visible to you or does not exist`;
    throw new AppError(404, 'UNKNOWN_MECHANISM', message, { field: `items.${index}.mechanism` });
  }
}

async function presentSet(db: Knex | Knex.Transaction, viewer: Viewer, id: number): Promise<SetDetail> {
  const { set, items } = await loadReadableSet(db, viewer, id);
  const [owner] = await mechanisms.peopleByIds(db, [set.ownerId]);
  const shown = await Promise.all(items.map(async (item) => {
    const [mechanism, revision] = await Promise.all([mechanisms.findById(db, item.mechanismId), revisions.findById(db, item.revisionId)]);
    const reference = mechanism!.referenceRevisionId === null ? undefined : await revisions.findById(db, mechanism!.referenceRevisionId);
    return {
      position: item.position, revision: revision!.number, note: item.note,
      mechanism: { slug: mechanism!.slug, title: mechanism!.title, latestRevision: mechanism!.latestRevisionNumber, referenceRevision: reference?.number ?? null },
    };
  }));
  return { id: set.id, title: set.title, audience: set.audience, owner, items: shown, youOwn: set.ownerId === viewer.id, createdAt: set.createdAt, updatedAt: set.updatedAt };
}

export async function createSet(db: Knex, viewer: Viewer, input: CreateSetBody) {
  const id = await db.transaction(async (trx) => {
    const items = await resolveItems(trx, viewer, input.items);
    const newId = await sets.insert(trx, { ownerId: viewer.id, title: input.title, audience: input.audience });
    await sets.replaceItems(trx, newId, items);
    await audit.insert(trx, { actorId: viewer.id, action: 'set.created', subjectType: 'set', subjectId: newId, details: { title: input.title, items: items.length } });
    return newId;
  });
  return presentSet(db, viewer, id);
}

export async function updateSet(db: Knex, viewer: Viewer, id: number, patch: UpdateSetBody) {
  await db.transaction(async (trx) => {
    await loadOwnSet(trx, viewer, id);
    const { items, ...fields } = patch;
    if (Object.keys(fields).length > 0) await sets.update(trx, id, fields);
    if (items) await sets.replaceItems(trx, id, await resolveItems(trx, viewer, items));
    if (items && Object.keys(fields).length === 0) await sets.update(trx, id, {});
    await audit.insert(trx, { actorId: viewer.id, action: 'set.updated', subjectType: 'set', subjectId: id, details: { fields: Object.keys(patch) } });
  });
  return presentSet(db, viewer, id);
}

export async function deleteSet(db: Knex, viewer: Viewer, id: number): Promise<void> {
  await db.transaction(async (trx) => {
    await loadOwnSet(trx, viewer, id);
    await sets.remove(trx, id);
    await audit.insert(trx, { actorId: viewer.id, action: 'set.deleted', subjectType: 'set', subjectId: id });
  });
}

export const getSet = presentSet;

/** What the set editor's picker offers: mechanisms the instructor can see, matching the typed text. */
export function mechanismChoices(db: Knex, viewer: Viewer, text: string): Promise<MechanismChoice[]> {
  return findChoices(db, viewer, text, 20);
}

/** Sets the viewer may read: their own, and those whose every mechanism they may see. */
export async function listSets(db: Knex, viewer: Viewer): Promise<SetSummary[]> {
  const all = await sets.listAll(db);
  const items = await sets.itemsOfSets(db, all.map((set) => set.id));
  const visible = await visibleMechanismIds(db, viewer, items.map((item) => item.mechanismId));
  const readable = all.filter((set) => set.ownerId === viewer.id
    || items.filter((item) => item.setId === set.id).every((item) => visible.has(item.mechanismId)));
  const owners = await mechanisms.peopleByIds(db, [...new Set(readable.map((set) => set.ownerId))]);
  return readable.map((set) => ({
    id: set.id, title: set.title, audience: set.audience,
    owner: owners.find((person) => person.id === set.ownerId)!,
    itemCount: items.filter((item) => item.setId === set.id).length,
    youOwn: set.ownerId === viewer.id, updatedAt: set.updatedAt,
  }));
}
