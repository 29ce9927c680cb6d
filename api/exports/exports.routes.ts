import { Router, type Response } from 'express';
import type { Knex } from 'knex';
import { requireUser } from '../middleware/require-auth';
import { RevisionParams } from '../revisions/revisions.schemas';
import { SetParams } from '../sets/sets.schemas';
import { exportJsonSchema } from './export-json-schema';
import { ExportQuery } from './exports.schemas';
import * as service from './exports.service';

function send(res: Response, file: { contentType: string; filename: string; body: string | Buffer }): void {
  res.attachment(file.filename).type(file.contentType).set('X-Content-Type-Options', 'nosniff').send(file.body);
}

/** Mounted at /api/exports: `?format=md|tex|csv|json|pdf&answers=true|false`. */
export function exportsRoutes(db: Knex): Router {
  const router = Router();
  router.use(requireUser);

  router.get('/mechanisms/:slug/revisions/:number', async (req, res) => {
    const { slug, number } = RevisionParams.parse(req.params);
    const { format, answers } = ExportQuery.parse(req.query);
    send(res, await service.exportRevision(db, req.user!, slug, number, format, answers));
  });

  router.get('/sets/:id', async (req, res) => {
    const { format, answers } = ExportQuery.parse(req.query);
    send(res, await service.exportSet(db, req.user!, SetParams.parse(req.params).id, format, answers));
  });

  return router;
}

/** Mounted at /api/schemas: the published JSON Schema of exports, public, at a stable address. */
export function schemasRoutes(): Router {
  const router = Router();
  const schema = exportJsonSchema();
  router.get('/mechanism-export.json', (_req, res) => {
    res.type('application/schema+json').json(schema);
  });
  return router;
}
