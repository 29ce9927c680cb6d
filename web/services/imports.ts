import type { Diagnostic } from '@grammar/diagnostics';
import { ApiError, csrfToken, errorFromResponse, NETWORK_ERROR, reportSessionProblem } from './http';

/** One mechanism found in the upload, analysed but not stored (`POST /api/imports/preview`). */
export interface ImportPreview {
  file: string;
  title: string;
  slug: string;
  steps: number;
  routes: string[];
  errors: number;
  diagnostics: Diagnostic[];
  /** For a JSON export with answers: whether the analysis here gives the same answers. */
  matchesExport: boolean | null;
  /** Why this mechanism cannot be imported ("the file is empty"), or null. */
  refusal: string | null;
}

export interface ImportedMechanism {
  file: string;
  slug: string;
  title: string;
}

/** Sends files as multipart field `files`; fails with an ApiError like every other call. */
async function upload<T>(path: string, files: File[], fields: Record<string, string> = {}): Promise<T> {
  const form = new FormData();
  for (const [name, value] of Object.entries(fields)) form.append(name, value);
  for (const file of files) form.append('files', file, file.name);
  let response: Response;
  try {
    response = await fetch(path, { method: 'POST', body: form, credentials: 'same-origin', headers: { Accept: 'application/json', 'X-CSRF-Token': csrfToken() } });
  } catch {
    throw new ApiError(0, NETWORK_ERROR, 'The upload could not reach the Cyclewright server. Check your connection and try again.');
  }
  const body = await response.json().catch(() => null);
  if (response.ok) return body as T;
  const error = errorFromResponse(response.status, response.statusText, body);
  reportSessionProblem(error);
  throw error;
}

export const previewImport = (files: File[]) => upload<ImportPreview[]>('/api/imports/preview', files);

export const importFiles = (files: File[], visibility: 'public' | 'private') =>
  upload<{ created: ImportedMechanism[] }>('/api/imports', files, { visibility }).then((body) => body.created);
