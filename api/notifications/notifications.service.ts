import type { Knex } from 'knex';
import { NotFoundError } from '../errors';
import type { Viewer } from '../mechanisms/access';
import * as notifications from './notifications.queries';

export async function listNotifications(db: Knex, viewer: Viewer, unreadOnly: boolean) {
  return notifications.findForUser(db, viewer, unreadOnly);
}

/** Only the addressee can mark a notification read; anyone else's id is simply not found. */
export async function markRead(db: Knex, viewer: Viewer, id: number): Promise<void> {
  if (!(await notifications.markRead(db, viewer.id, id))) throw new NotFoundError('notification', id);
}
