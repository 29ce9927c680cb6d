import { Router } from 'express';
import type { Knex } from 'knex';
import { z } from 'zod';
import { requireUser } from '../middleware/require-auth';
import { Role } from '../users/users.schemas';
import { findPeople } from './people.service';

const PeopleQuery = z.object({
  q: z.string().trim().max(100).default(''),
  role: Role.optional(),
});

/** Mounted at /api/people: names to pick collaborators and reviewers from (never e-mail addresses). */
export function peopleRoutes(db: Knex): Router {
  const router = Router();
  router.use(requireUser);
  router.get('/', async (req, res) => {
    const { q, role } = PeopleQuery.parse(req.query);
    res.json(await findPeople(db, q, role));
  });
  return router;
}
