import type { Knex } from 'knex';
import type { MechanismAnalysis } from '../chemistry/analysis-types';
import { NotFoundError } from '../errors';
import { loadVisible, type Viewer } from '../mechanisms/access';
import * as mechanisms from '../mechanisms/mechanisms.queries';
import * as revisions from '../revisions/revisions.queries';
import { loadReadableSet } from '../sets/set-access';
import { exportDocument, type ExportItem } from './export-document';
import type { ExportFormat } from './exports.schemas';
import { renderExport } from './render';

async function revisionItem(db: Knex, viewer: Viewer, slug: string, number: number, note: string): Promise<ExportItem> {
  const { mechanism } = await loadVisible(db, slug, viewer);
  const revision = await revisions.findByNumber(db, mechanism.id, number);
  if (!revision) throw new NotFoundError('revision', `r${number}`);
  return {
    title: mechanism.title, slug: mechanism.slug, revision: revision.number, note, source: revision.source,
    analysis: revision.analysis as unknown as MechanismAnalysis,
  };
}

/** One revision in one format; the viewer must be allowed to see the mechanism (else 404). */
export async function exportRevision(db: Knex, viewer: Viewer, slug: string, number: number, format: ExportFormat, answers: boolean) {
  const item = await revisionItem(db, viewer, slug, number, '');
  const rendered = await renderExport(exportDocument([item], { answers, set: null }), format);
  return { ...rendered, filename: `${slug}-r${number}${answers ? '-answers' : ''}.${rendered.extension}` };
}

/**
 * A whole set in one format. Every mechanism is checked again for this viewer, so even the set's
 * owner cannot export a mechanism that has become private to them.
 */
export async function exportSet(db: Knex, viewer: Viewer, setId: number, format: ExportFormat, answers: boolean) {
  const { set, items } = await loadReadableSet(db, viewer, setId);
  if (items.length === 0) throw new NotFoundError(`anything to export: set ${setId} has no items`);
  const exportItems: ExportItem[] = [];
  for (const item of items) {
    const mechanism = (await mechanisms.findById(db, item.mechanismId))!;
    const revision = (await revisions.findById(db, item.revisionId))!;
    exportItems.push(await revisionItem(db, viewer, mechanism.slug, revision.number, item.note));
  }
  const rendered = await renderExport(exportDocument(exportItems, { answers, set: { title: set.title, audience: set.audience } }), format);
  return { ...rendered, filename: `set-${set.id}${answers ? '-answers' : ''}.${rendered.extension}` };
}
