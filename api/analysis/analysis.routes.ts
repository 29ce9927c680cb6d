import { Router } from 'express';
import type { Knex } from 'knex';
import { rateLimit } from 'express-rate-limit';
import { requireUser } from '../middleware/require-auth';
import { AnalyseBody } from './analysis.schemas';
import { analyseText } from './analysis.service';

/**
 * The workbench analyses as the author types: generous, but bounded per person. It asks 120 ms
 * into each pause and never twice at once (web/composables/useLiveAnalysis.ts), so even steady
 * typing on a small mechanism stays under 8 a second; 10 a second leaves room for a second tab.
 */
const perPerson = rateLimit({
  windowMs: 60_000,
  limit: 600,
  standardHeaders: 'draft-8',
  legacyHeaders: false,
  keyGenerator: (req) => `user:${req.user?.id ?? 'anonymous'}`,
  handler: (_req, res) => {
    res.status(429).json({ error: { code: 'RATE_LIMITED', message: 'Too many analyses in a minute; wait a moment' } });
  },
});

export function analysisRoutes(db: Knex): Router {
  const router = Router();
  router.post('/', requireUser, perPerson, async (req, res) => {
    const { text } = AnalyseBody.parse(req.body);
    const started = performance.now();
    const analysis = await analyseText(db, text);
    const analysed = performance.now();
    const body = JSON.stringify(analysis);
    // The server's share of a refresh, for the browser's timing panel and `npm run bench web`.
    res.set('Server-Timing', `analyse;dur=${(analysed - started).toFixed(1)}, json;dur=${(performance.now() - analysed).toFixed(1)}`);
    res.type('json').send(body);
  });
  return router;
}
