import { Router } from 'express';
import type { Knex } from 'knex';
import { z } from 'zod';
import { requireUser } from '../middleware/require-auth';
import * as service from './notifications.service';

const ListQuery = z.object({ unread: z.enum(['true', 'false']).default('false') });
const NotificationParams = z.object({ id: z.coerce.number().int().positive() });

/** Mounted at /api/notifications: the signed-in person's own notifications. */
export function notificationsRoutes(db: Knex): Router {
  const router = Router();
  router.use(requireUser);

  router.get('/', async (req, res) => {
    const { unread } = ListQuery.parse(req.query);
    res.json(await service.listNotifications(db, req.user!, unread === 'true'));
  });

  router.post('/:id/read', async (req, res) => {
    const { id } = NotificationParams.parse(req.params);
    await service.markRead(db, req.user!, id);
    res.status(204).end();
  });

  return router;
}
