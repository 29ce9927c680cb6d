import type { ExportFormat } from '@api/exports/exports.schemas';
import type { CreateSetBody, SetDetail as ServerSetDetail, SetSummary as ServerSetSummary } from '@api/sets/sets.schemas';
import { http } from './http';
import type { Jsonified } from './jsonified';

/** The sets API's answers as JSON: the server's types with dates as strings. */
export type SetSummary = Jsonified<ServerSetSummary>;
export type SetDetail = Jsonified<ServerSetDetail>;

export type SetInput = CreateSetBody;

export function listSets(): Promise<SetSummary[]> {
  return http.get<SetSummary[]>('/api/sets');
}

export function getSet(id: number): Promise<SetDetail> {
  return http.get<SetDetail>(`/api/sets/${id}`);
}

export function createSet(input: SetInput): Promise<SetDetail> {
  return http.post<SetDetail>('/api/sets', input);
}

export function deleteSet(id: number): Promise<void> {
  return http.delete<void>(`/api/sets/${id}`);
}

/** A download address: the browser fetches it with the session cookie, no JSON involved. */
export function setExportUrl(id: number, format: ExportFormat, answers: boolean): string {
  return `/api/exports/sets/${id}?format=${format}&answers=${answers}`;
}

export const EXPORT_FORMAT_LABELS: Record<ExportFormat, string> = {
  md: 'Markdown', tex: 'LaTeX', csv: 'CSV', json: 'JSON', pdf: 'PDF worksheet',
};
