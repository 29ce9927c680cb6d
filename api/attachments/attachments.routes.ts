import { Router } from 'express';
import type { Knex } from 'knex';
import multer from 'multer';
import { z } from 'zod';
import { requireUser } from '../middleware/require-auth';
import { MechanismParams } from '../revisions/revisions.schemas';
import * as service from './attachments.service';

const AttachmentParams = z.object({ id: z.coerce.number().int().positive() });

/** Mounted at /api/mechanisms: upload and list a mechanism's attachments. */
export function mechanismAttachmentsRoutes(db: Knex, maxBytes: number): Router {
  const router = Router();
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: maxBytes, files: 1 } });
  router.use(requireUser);
  router.get('/:slug/attachments', async (req, res) => {
    const { slug } = MechanismParams.parse(req.params);
    res.json(await service.listAttachments(db, req.user!, slug));
  });
  router.post('/:slug/attachments', upload.single('file'), async (req, res) => {
    const { slug } = MechanismParams.parse(req.params);
    res.status(201).json(await service.addAttachment(db, req.user!, slug, req.file));
  });
  return router;
}

/** Mounted at /api/attachments: download one file, served as the type its bytes show. */
export function attachmentsRoutes(db: Knex): Router {
  const router = Router();
  router.use(requireUser);
  router.get('/:id/content', async (req, res) => {
    const { meta, content } = await service.readAttachment(db, req.user!, AttachmentParams.parse(req.params).id);
    // attachment() guesses a type from the file name; the sniffed type must win, so it is set after.
    res.attachment(meta.filename).type(meta.mediaType).set('X-Content-Type-Options', 'nosniff').send(content);
  });
  return router;
}
