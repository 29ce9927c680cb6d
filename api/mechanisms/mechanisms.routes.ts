import { Router } from 'express';
import type { Knex } from 'knex';
import { requireRole, requireUser } from '../middleware/require-auth';
import { MechanismParams } from '../revisions/revisions.schemas';
import { listMechanisms } from '../search/search.service';
import { CreateMechanismBody, ListMechanismsQuery, SetCollaboratorsBody, UpdateMechanismBody } from './mechanisms.schemas';
import * as service from './mechanisms.service';

export function mechanismsRoutes(db: Knex): Router {
  const router = Router();
  router.use(requireUser);

  router.get('/', async (req, res) => {
    const filters = ListMechanismsQuery.parse(req.query);
    res.json(await listMechanisms(db, req.user!, filters));
  });

  router.post('/', requireRole('author'), async (req, res) => {
    const body = CreateMechanismBody.parse(req.body);
    res.status(201).json(await service.createMechanism(db, req.user!, body));
  });

  router.get('/:slug', async (req, res) => {
    const { slug } = MechanismParams.parse(req.params);
    res.json(await service.getMechanism(db, req.user!, slug));
  });

  router.patch('/:slug', async (req, res) => {
    const { slug } = MechanismParams.parse(req.params);
    res.json(await service.updateMechanism(db, req.user!, slug, UpdateMechanismBody.parse(req.body)));
  });

  router.put('/:slug/collaborators', async (req, res) => {
    const { slug } = MechanismParams.parse(req.params);
    const { userIds } = SetCollaboratorsBody.parse(req.body);
    res.json(await service.setCollaborators(db, req.user!, slug, userIds));
  });

  return router;
}
