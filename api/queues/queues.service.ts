import type { Knex } from 'knex';
import { ForbiddenError } from '../errors';
import { isCurator, type Viewer } from '../mechanisms/access';
import type { QueuedRound } from '../reviews/reviews.schemas';
import * as queues from './queues.queries';

/** The counts shown in the top bar; "to adopt" only for curators. */
export async function queueCounts(db: Knex, viewer: Viewer) {
  return {
    myReviews: await queues.countMyReviews(db, viewer.id),
    toAdopt: isCurator(viewer) ? await queues.countToAdopt(db) : null,
  };
}

export async function myReviews(db: Knex, viewer: Viewer): Promise<QueuedRound[]> {
  return queues.listMyReviews(db, viewer.id);
}

export async function toAdopt(db: Knex, viewer: Viewer): Promise<QueuedRound[]> {
  if (!isCurator(viewer)) throw new ForbiddenError('The adoption queue is for curators');
  return queues.listToAdopt(db);
}
