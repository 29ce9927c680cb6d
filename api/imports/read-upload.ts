import { AppError } from '../errors';
import { ExportDocument } from '../exports/exports.schemas';

/** One mechanism found in an uploaded file, ready to preview or create. */
export interface ImportCandidate {
  file: string;
  title: string;
  slug: string;
  source: string;
  /** The answer key the file carried (a JSON export with answers), to compare after analysis. */
  exportedAnswers: ExportDocument['mechanisms'][number]['answers'] | null;
  /** Why this mechanism cannot be imported although its file could be read ("the file is empty"), or null. */
  refusal: string | null;
}

export interface UploadedFile {
  originalname: string;
  buffer: Buffer;
}

const decoder = new TextDecoder('utf-8', { fatal: true });
// Tab, line feed, form feed and carriage return are text; any other C0 control byte is not.
const CONTROL = /[\x00-\x08\x0b\x0e-\x1f\x7f]/;

const slugOf = (name: string) =>
  name.toLowerCase().replace(/\.[a-z]+$/, '').normalize('NFKD').replace(/[^a-z0-9]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 60) || 'imported';

/** The file's text; 415 NOT_TEXT naming the file when it is not UTF-8 text. */
function readText(file: UploadedFile): string {
  let text: string;
  try {
    text = decoder.decode(file.buffer);
  } catch {
    throw new AppError(415, 'NOT_TEXT', `${file.originalname}: not UTF-8 text; upload .steps files or a JSON export`, { file: file.originalname });
  }
  const at = text.search(CONTROL);
  if (at >= 0) {
    throw new AppError(415, 'NOT_TEXT', `${file.originalname}: control byte at character ${at + 1}; this is not a text file`, { file: file.originalname });
  }
  return text.replace(/^\uFEFF/, '');
}

/** Comments, blank lines and directives hold no step; what is left after removing them does. */
const NOT_A_STEP = /#.*$|^\s*%.*$/gm;

/** Why a text holds nothing to import: nothing at all, or only blanks, comments and directives. */
export function emptinessOf(text: string, what: string): string | null {
  if (text.trim() === '') return `${what} is empty`;
  if (text.replace(NOT_A_STEP, '').trim() === '') return `${what} has no steps (only blank lines, comments or directives)`;
  return null;
}

function fromSteps(file: UploadedFile, text: string): ImportCandidate[] {
  const title = /^%title\s+(.+)$/m.exec(text)?.[1].trim() ?? file.originalname.replace(/\.steps$/i, '');
  return [{ file: file.originalname, title, slug: slugOf(file.originalname), source: text, exportedAnswers: null, refusal: emptinessOf(text, 'the file') }];
}

function fromJson(file: UploadedFile, text: string): ImportCandidate[] {
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch (error) {
    throw new AppError(422, 'IMPORT_INVALID', `${file.originalname}: not valid JSON (${(error as Error).message})`, { file: file.originalname });
  }
  const parsed = ExportDocument.safeParse(data);
  if (!parsed.success) {
    const issues = parsed.error.issues.map((issue) => ({ path: issue.path.map(String), message: issue.message }));
    const where = issues.slice(0, 5).map((issue) => `${issue.path.join('.') || '(document)'}: ${issue.message}`).join('; ');
    throw new AppError(422, 'IMPORT_INVALID', `${file.originalname}: not a Cyclewright export — ${where}`, { file: file.originalname, issues });
  }
  return parsed.data.mechanisms.map((mechanism) => ({
    file: file.originalname, title: mechanism.title, slug: mechanism.slug, source: mechanism.source, exportedAnswers: mechanism.answers ?? null,
    refusal: emptinessOf(mechanism.source, 'its source'),
  }));
}

/**
 * Reads uploaded files: `.steps` (or `.txt`) files hold one mechanism each; a `.json` file must be
 * an export (its schema) and may hold many. Anything else is refused naming the file.
 */
export function readUploads(files: UploadedFile[]): ImportCandidate[] {
  if (files.length === 0) throw new AppError(400, 'NO_FILES', 'Attach one or more .steps files or a JSON export in the field "files"', { field: 'files' });
  return files.flatMap((file) => {
    const kind = /\.(steps|txt)$/i.test(file.originalname) ? 'steps' : /\.json$/i.test(file.originalname) ? 'json' : null;
    if (!kind) throw new AppError(415, 'UNSUPPORTED_FILE', `${file.originalname}: only .steps, .txt and .json files can be imported`, { file: file.originalname });
    const text = readText(file);
    return kind === 'steps' ? fromSteps(file, text) : fromJson(file, text);
  });
}
