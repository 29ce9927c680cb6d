import type { ExportFormat } from '@api/exports/exports.schemas';
import type { CreateSetBody, MechanismChoice, SetDetail as ServerSetDetail, SetSummary as ServerSetSummary } from '@api/sets/sets.schemas';
import { http, request } from './http';
import type { Jsonified } from './jsonified';

/** The sets API's answers as JSON: the server's types with dates as strings. */
export type SetSummary = Jsonified<ServerSetSummary>;
export type SetDetail = Jsonified<ServerSetDetail>;

export type SetInput = CreateSetBody;
export type { MechanismChoice };

export function listSets(): Promise<SetSummary[]> {
  return http.get<SetSummary[]>('/api/sets');
}

export function getSet(id: number): Promise<SetDetail> {
  return http.get<SetDetail>(`/api/sets/${id}`);
}

export function createSet(input: SetInput): Promise<SetDetail> {
  return http.post<SetDetail>('/api/sets', input);
}

/** Replaces the title, audience and the whole ordered list of items. */
export function updateSet(id: number, input: SetInput): Promise<SetDetail> {
  return request<SetDetail>(`/api/sets/${id}`, { method: 'PATCH', body: input });
}

/** Mechanisms the instructor may put in a set whose title or address holds `text`. */
export function listMechanismChoices(text: string, signal?: AbortSignal): Promise<MechanismChoice[]> {
  return http.get<MechanismChoice[]>(`/api/sets/mechanism-choices?${new URLSearchParams({ q: text })}`, { signal });
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
