import { Router } from 'express';
import type { Knex } from 'knex';
import { requireUser } from '../middleware/require-auth';
import * as remarks from './remarks.service';
import { RemarkParams, ReplyBody } from './reviews.schemas';

/** Mounted at /api/remarks: threads under a remark. */
export function remarksRoutes(db: Knex): Router {
  const router = Router();
  router.use(requireUser);
  router.post('/:id/replies', async (req, res) => {
    const { id } = RemarkParams.parse(req.params);
    const { body } = ReplyBody.parse(req.body);
    res.status(201).json(await remarks.replyToRemark(db, req.user!, id, body));
  });
  router.post('/:id/settle', async (req, res) => {
    await remarks.settleRemark(db, req.user!, RemarkParams.parse(req.params).id);
    res.status(204).end();
  });
  return router;
}
