import { isDeepStrictEqual } from 'node:util';
import type { Knex } from 'knex';
import { enthalpySource } from '../analysis/analysis.service';
import { analyseMechanism } from '../chemistry/analyse';
import { answerKey } from '../exports/export-document';
import { AppError } from '../errors';
import type { Viewer } from '../mechanisms/access';
import * as mechanisms from '../mechanisms/mechanisms.queries';
import { CreateMechanismBody } from '../mechanisms/mechanisms.schemas';
import { createMechanism } from '../mechanisms/mechanisms.service';
import { readUploads, type ImportCandidate, type UploadedFile } from './read-upload';

/** What each mechanism in the upload would become: its analysis in brief, nothing stored. */
export async function previewImport(db: Knex, files: UploadedFile[]) {
  const candidates = readUploads(files);
  const enthalpy = await enthalpySource(db);
  return candidates.map((candidate) => {
    const analysis = analyseMechanism(candidate.source, { enthalpy });
    const errors = analysis.diagnostics.filter((d) => d.severity === 'error');
    return {
      file: candidate.file, title: candidate.title, slug: candidate.slug, refusal: candidate.refusal,
      steps: analysis.steps.length,
      routes: analysis.routes.map((route) => route.net),
      errors: errors.length,
      diagnostics: analysis.diagnostics.slice(0, 20),
      // Serialised first: stored answers went through JSON, where exact integers became numbers.
      matchesExport: candidate.exportedAnswers
        ? isDeepStrictEqual(JSON.parse(JSON.stringify(answerKey(analysis), bigIntsAsNumbers)), candidate.exportedAnswers)
        : null,
    };
  });
}

const bigIntsAsNumbers = (_key: string, value: unknown) => (typeof value === 'bigint' ? Number(value) : value);

/** The same rules as a mechanism written by hand (title and source size); 422 naming file and field. */
function validInput(candidate: ImportCandidate, slug: string, visibility: 'public' | 'private') {
  if (candidate.refusal) {
    throw new AppError(422, 'IMPORT_INVALID', `${candidate.file}, mechanism "${candidate.title}": ${candidate.refusal}`, { file: candidate.file, field: 'source' });
  }
  const input = { slug, title: candidate.title, visibility, source: candidate.source, changeNote: `imported from ${candidate.file}` };
  const parsed = CreateMechanismBody.safeParse(input);
  if (parsed.success) return parsed.data;
  const issue = parsed.error.issues[0];
  const field = issue.path.map(String).join('.');
  throw new AppError(422, 'IMPORT_INVALID', `${candidate.file}, mechanism "${candidate.title}": ${field}: ${issue.message}`, { file: candidate.file, field });
}

async function freeSlug(trx: Knex.Transaction, wanted: string, taken: Set<string>): Promise<string> {
  for (let n = 1; ; n++) {
    const slug = n === 1 ? wanted : `${wanted.slice(0, 56)}-${n}`;
    if (!taken.has(slug) && !(await mechanisms.findBySlug(trx, slug))) return slug;
  }
}

/**
 * Creates every mechanism of the upload in one transaction: a bad file, or any failure on the
 * way, leaves nothing behind. Slugs already taken get a numeric suffix.
 */
export async function importMechanisms(db: Knex, viewer: Viewer, files: UploadedFile[], visibility: 'public' | 'private') {
  const candidates = readUploads(files);
  return db.transaction(async (trx) => {
    const taken = new Set<string>();
    const created = [];
    for (const candidate of candidates) {
      const slug = await freeSlug(trx, candidate.slug, taken);
      taken.add(slug);
      const mechanism = await createMechanism(trx, viewer, validInput(candidate, slug, visibility));
      created.push({ file: candidate.file, slug: mechanism.slug, title: mechanism.title });
    }
    return created;
  });
}
