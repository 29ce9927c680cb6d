import { Router } from 'express';
import { NotFoundError } from '../errors';
import { requireRole } from '../middleware/require-auth';
import type { CapturedMail } from './fake-smtp';

/** GET /api/dev/inbox: what the local fake SMTP server caught, newest first; admins only. */
export function inboxRoutes(messages: CapturedMail[] | null): Router {
  const router = Router();
  router.get('/inbox', requireRole('admin'), (_req, res) => {
    if (!messages) throw new NotFoundError('development inbox (no fake mail server runs here)');
    res.json([...messages].reverse());
  });
  return router;
}
