import { Router } from 'express';
import type { Knex } from 'knex';
import { isDatabaseUp } from '../db';

/** 200 when PostgreSQL answers, 503 while it does not; the pool reconnects by itself when it returns. */
export function healthRoutes(db: Knex): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    const up = await isDatabaseUp(db);
    res.status(up ? 200 : 503).json({ status: up ? 'ok' : 'degraded', database: up ? 'up' : 'down' });
  });
  return router;
}
