import { Router } from 'express';
import type { Knex } from 'knex';
import multer from 'multer';
import { z } from 'zod';
import { Visibility } from '../mechanisms/mechanisms.schemas';
import { requireRole } from '../middleware/require-auth';
import * as service from './imports.service';

const ImportFields = z.object({ visibility: Visibility.default('private') });

/** Mounted at /api/imports: multipart field `files` (up to 20), each at most `maxBytes`. */
export function importsRoutes(db: Knex, maxBytes: number): Router {
  const router = Router();
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: maxBytes, files: 20 } });
  router.use(requireRole('author'));

  router.post('/preview', upload.array('files', 20), async (req, res) => {
    res.json(await service.previewImport(db, (req.files as Express.Multer.File[]) ?? []));
  });

  router.post('/', upload.array('files', 20), async (req, res) => {
    const { visibility } = ImportFields.parse(req.body ?? {});
    const created = await service.importMechanisms(db, req.user!, (req.files as Express.Multer.File[]) ?? [], visibility);
    res.status(201).json({ created });
  });

  return router;
}
