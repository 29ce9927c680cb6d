import type { Knex } from 'knex';
import * as audit from '../audit/audit.queries';
import type { analyseSource } from './analyse-source';
import * as revisions from './revisions.queries';

export type NewRevision = Omit<revisions.RevisionRow, 'id' | 'createdAt' | 'analysis'>;

/**
 * Writes an analysed revision, its species index and the audit record, inside the caller's
 * transaction. The analysis is done before the transaction, so no lock is held while it runs.
 */
export async function storeRevision(trx: Knex.Transaction, values: NewRevision, analysed: ReturnType<typeof analyseSource>) {
  const { analysis, speciesKeys } = analysed;
  const revision = await revisions.insert(trx, { ...values, analysis });
  await revisions.insertSpecies(trx, revision.id, speciesKeys);
  await audit.insert(trx, {
    actorId: values.authorId,
    action: 'revision.created',
    subjectType: 'mechanism',
    subjectId: values.mechanismId,
    details: { revision: values.number, parent: values.parentId, changeNote: values.changeNote },
  });
  return revision;
}

/** The public shape of a revision: numbered, with its author and analysis. */
export function presentRevision(revision: revisions.RevisionRow, authorName?: string) {
  return {
    id: revision.id,
    number: revision.number,
    parentId: revision.parentId,
    source: revision.source,
    changeNote: revision.changeNote,
    author: { id: revision.authorId, name: authorName ?? null },
    analysis: revision.analysis,
    createdAt: revision.createdAt,
  };
}
