import { Router } from 'express';
import type { Knex } from 'knex';
import { requireUser } from '../middleware/require-auth';
import { CreateRevisionBody, MechanismParams, RevisionParams } from './revisions.schemas';
import * as service from './revisions.service';

/** Mounted at /api/mechanisms: the revision history of one mechanism. */
export function revisionsRoutes(db: Knex): Router {
  const router = Router();
  router.use(requireUser);

  router.get('/:slug/revisions', async (req, res) => {
    const { slug } = MechanismParams.parse(req.params);
    res.json(await service.listRevisions(db, req.user!, slug));
  });

  router.post('/:slug/revisions', async (req, res) => {
    const { slug } = MechanismParams.parse(req.params);
    const body = CreateRevisionBody.parse(req.body);
    res.status(201).json(await service.addRevision(db, req.user!, slug, body));
  });

  router.get('/:slug/revisions/:number', async (req, res) => {
    const { slug, number } = RevisionParams.parse(req.params);
    res.json(await service.getRevision(db, req.user!, slug, number));
  });

  router.get('/:slug/rejected-submissions', async (req, res) => {
    const { slug } = MechanismParams.parse(req.params);
    res.json(await service.listRejectedSubmissions(db, req.user!, slug));
  });

  return router;
}
