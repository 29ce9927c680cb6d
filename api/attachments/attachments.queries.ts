import type { Knex } from 'knex';
import type { AttachmentMeta } from './attachments.schemas';

export type { AttachmentMeta };

type Db = Knex | Knex.Transaction;

const META = [
  'id', 'mechanism_id as mechanismId', 'filename', 'media_type as mediaType', 'size', 'sha256',
  'uploaded_by as uploadedBy', 'created_at as createdAt',
];

export async function insert(db: Db, values: Omit<AttachmentMeta, 'id' | 'createdAt'> & { content: Buffer }): Promise<AttachmentMeta> {
  const [row] = await db('attachments')
    .insert({
      mechanism_id: values.mechanismId, filename: values.filename, media_type: values.mediaType, size: values.size,
      sha256: values.sha256, content: values.content, uploaded_by: values.uploadedBy,
    })
    .returning(META);
  return row;
}

export async function listForMechanism(db: Db, mechanismId: number): Promise<AttachmentMeta[]> {
  return db('attachments').where({ mechanism_id: mechanismId }).orderBy('id').select(META);
}

export async function findMeta(db: Db, id: number): Promise<AttachmentMeta | undefined> {
  return db('attachments').where({ id }).first(META);
}

export async function findContent(db: Db, id: number): Promise<Buffer | undefined> {
  const row = await db('attachments').where({ id }).first('content');
  return row?.content;
}
