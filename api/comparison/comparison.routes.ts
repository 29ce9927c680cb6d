import { Router } from 'express';
import type { Knex } from 'knex';
import { z } from 'zod';
import { requireUser } from '../middleware/require-auth';
import { MechanismParams } from '../revisions/revisions.schemas';
import { compareMechanismRevisions } from './comparison.service';

const CompareQuery = z.object({
  from: z.coerce.number().int().positive(),
  to: z.coerce.number().int().positive(),
});

/** Mounted at /api/mechanisms: GET /:slug/compare?from=1&to=2. */
export function comparisonRoutes(db: Knex): Router {
  const router = Router();
  router.use(requireUser);
  router.get('/:slug/compare', async (req, res) => {
    const { slug } = MechanismParams.parse(req.params);
    const { from, to } = CompareQuery.parse(req.query);
    res.json(await compareMechanismRevisions(db, req.user!, slug, from, to));
  });
  return router;
}
