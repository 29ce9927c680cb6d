import type { Knex } from 'knex';
import { ForbiddenError, NotFoundError } from '../errors';
import type { Role } from '../users/users.schemas';
import * as mechanisms from './mechanisms.queries';
import type { MechanismRow } from './mechanisms.queries';

/** Who is asking: the signed-in person's id and roles. */
export interface Viewer {
  id: number;
  roles: readonly Role[];
}

export interface Access {
  isOwner: boolean;
  isCollaborator: boolean;
  isAssignedReviewer: boolean;
  isCurator: boolean;
  isAdmin: boolean;
}

export const isCurator = (viewer: Viewer) => viewer.roles.includes('curator');
export const seesEverything = (viewer: Viewer) => viewer.roles.includes('curator') || viewer.roles.includes('admin');

export async function accessTo(db: Knex | Knex.Transaction, mechanism: MechanismRow, viewer: Viewer): Promise<Access> {
  const [collaborators, reviewer] = await Promise.all([
    mechanisms.collaboratorIds(db, mechanism.id),
    mechanisms.isAssignedReviewer(db, mechanism.id, viewer.id),
  ]);
  return {
    isOwner: mechanism.ownerId === viewer.id,
    isCollaborator: collaborators.includes(viewer.id),
    isAssignedReviewer: reviewer,
    isCurator: isCurator(viewer),
    isAdmin: viewer.roles.includes('admin'),
  };
}

export const canSee = (mechanism: MechanismRow, access: Access) =>
  mechanism.visibility === 'public' || Object.values(access).some(Boolean);
export const canEdit = (access: Access) => access.isOwner || access.isCollaborator;
/** Owner, collaborators, assigned reviewers and curators take part in a round's threads. */
export const takesPart = (access: Access) => canEdit(access) || access.isAssignedReviewer || access.isCurator;

/**
 * The mechanism and the viewer's access to it. A private mechanism the viewer may not see answers
 * exactly like a missing one (404), so its existence does not leak.
 */
export async function loadVisible(db: Knex | Knex.Transaction, slug: string, viewer: Viewer) {
  const mechanism = await mechanisms.findBySlug(db, slug);
  if (!mechanism) throw new NotFoundError('mechanism', slug);
  const access = await accessTo(db, mechanism, viewer);
  if (!canSee(mechanism, access)) throw new NotFoundError('mechanism', slug);
  return { mechanism, access };
}

export async function loadVisibleById(db: Knex | Knex.Transaction, id: number, viewer: Viewer) {
  const mechanism = await mechanisms.findById(db, id);
  if (!mechanism) throw new NotFoundError('mechanism', id);
  return loadVisible(db, mechanism.slug, viewer);
}

export function assertEditor(access: Access): void {
  if (!canEdit(access)) throw new ForbiddenError('Only the owner and collaborators of this mechanism may do this');
}

export function assertOwner(access: Access): void {
  if (!access.isOwner) throw new ForbiddenError('Only the owner of this mechanism may do this');
}
