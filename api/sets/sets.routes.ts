import { Router } from 'express';
import type { Knex } from 'knex';
import { requireRole, requireUser } from '../middleware/require-auth';
import { CreateSetBody, MechanismChoicesQuery, SetParams, UpdateSetBody } from './sets.schemas';
import * as service from './sets.service';

/** Mounted at /api/sets: instructors build sets; signed-in people read those they may see whole. */
export function setsRoutes(db: Knex): Router {
  const router = Router();
  router.use(requireUser);

  router.get('/', async (req, res) => {
    res.json(await service.listSets(db, req.user!));
  });

  router.post('/', requireRole('instructor'), async (req, res) => {
    res.status(201).json(await service.createSet(db, req.user!, CreateSetBody.parse(req.body)));
  });

  // Before `/:id`, which would read "mechanism-choices" as a set id.
  router.get('/mechanism-choices', requireRole('instructor'), async (req, res) => {
    res.json(await service.mechanismChoices(db, req.user!, MechanismChoicesQuery.parse(req.query).q));
  });

  router.get('/:id', async (req, res) => {
    res.json(await service.getSet(db, req.user!, SetParams.parse(req.params).id));
  });

  router.patch('/:id', requireRole('instructor'), async (req, res) => {
    const { id } = SetParams.parse(req.params);
    res.json(await service.updateSet(db, req.user!, id, UpdateSetBody.parse(req.body)));
  });

  router.delete('/:id', requireRole('instructor'), async (req, res) => {
    await service.deleteSet(db, req.user!, SetParams.parse(req.params).id);
    res.status(204).end();
  });

  return router;
}
