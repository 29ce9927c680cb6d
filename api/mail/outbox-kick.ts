import { Router } from 'express';
import type { Knex } from 'knex';
import { createOutboxDeliverer } from './deliver-outbox';
import type { MailTransport } from './mail-transport';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * After every write under /api has been answered (so its transaction has committed), starts a
 * delivery of the mail outbox in the background. Retries of earlier failures ride along; the
 * server process also retries on a timer (api/index.ts).
 */
export function outboxKick(db: Knex, transport: MailTransport, onError?: (error: unknown) => void): Router {
  const deliverer = createOutboxDeliverer(db, transport, onError);
  const router = Router();
  router.use((req, res, next) => {
    if (!SAFE_METHODS.has(req.method)) res.on('finish', () => void deliverer.kick());
    next();
  });
  return router;
}
