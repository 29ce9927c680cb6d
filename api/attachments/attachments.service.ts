import { createHash } from 'node:crypto';
import type { Knex } from 'knex';
import * as audit from '../audit/audit.queries';
import { AppError, NotFoundError } from '../errors';
import { assertEditor, loadVisible, loadVisibleById, type Viewer } from '../mechanisms/access';
import * as attachments from './attachments.queries';
import { sniffMediaType } from './sniff-type';

export interface Upload {
  originalname: string;
  buffer: Buffer;
}

/** Stores a file beside a mechanism (owner and collaborators), with its SHA-256 and sniffed type. */
export async function addAttachment(db: Knex, viewer: Viewer, slug: string, file: Upload | undefined) {
  if (!file) throw new AppError(400, 'UPLOAD_MISSING', 'Send the file as multipart/form-data in the field "file"');
  if (file.buffer.length === 0) throw new AppError(400, 'UPLOAD_EMPTY', `The file "${file.originalname}" is empty`);
  const mediaType = await sniffMediaType(file.buffer);
  const sha256 = createHash('sha256').update(file.buffer).digest('hex');
  return db.transaction(async (trx) => {
    const { mechanism, access } = await loadVisible(trx, slug, viewer);
    assertEditor(access);
    const stored = await attachments.insert(trx, {
      mechanismId: mechanism.id, filename: file.originalname.slice(0, 255), mediaType, size: file.buffer.length,
      sha256, uploadedBy: viewer.id, content: file.buffer,
    });
    await audit.insert(trx, { actorId: viewer.id, action: 'attachment.added', subjectType: 'mechanism', subjectId: mechanism.id, details: { attachmentId: stored.id, sha256, size: stored.size } });
    return stored;
  });
}

export async function listAttachments(db: Knex, viewer: Viewer, slug: string) {
  const { mechanism } = await loadVisible(db, slug, viewer);
  return attachments.listForMechanism(db, mechanism.id);
}

/** The file and its metadata, for those who may see its mechanism (404 otherwise). */
export async function readAttachment(db: Knex, viewer: Viewer, id: number) {
  const meta = await attachments.findMeta(db, id);
  if (!meta) throw new NotFoundError('attachment', id);
  await loadVisibleById(db, meta.mechanismId, viewer).catch(() => {
    throw new NotFoundError('attachment', id);
  });
  return { meta, content: (await attachments.findContent(db, id))! };
}
