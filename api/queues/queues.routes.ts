import { Router } from 'express';
import type { Knex } from 'knex';
import { requireUser } from '../middleware/require-auth';
import * as service from './queues.service';

/** Mounted at /api/queues: "my reviews" and "to adopt", with counts. */
export function queuesRoutes(db: Knex): Router {
  const router = Router();
  router.use(requireUser);
  router.get('/', async (req, res) => {
    res.json(await service.queueCounts(db, req.user!));
  });
  router.get('/my-reviews', async (req, res) => {
    res.json(await service.myReviews(db, req.user!));
  });
  router.get('/to-adopt', async (req, res) => {
    res.json(await service.toAdopt(db, req.user!));
  });
  return router;
}
