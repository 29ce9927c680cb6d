import { Router } from 'express';
import type { Knex } from 'knex';
import { requireRole } from '../middleware/require-auth';
import { SetRolesBody, UserParams } from '../users/users.schemas';
import * as admin from './admin.service';

export function adminRoutes(db: Knex): Router {
  const router = Router();
  router.use(requireRole('admin'));

  router.get('/users', async (_req, res) => {
    res.json(await admin.listUsers(db));
  });

  router.put('/users/:id/roles', async (req, res) => {
    const { id } = UserParams.parse(req.params);
    const { roles } = SetRolesBody.parse(req.body);
    res.json(await admin.setRoles(db, req.user!.id, id, roles));
  });

  return router;
}
