import type { ExportFormat } from '@api/exports/exports.schemas';
import type { CreateSetBody } from '@api/sets/sets.schemas';
import { http } from './http';

export interface SetSummary {
  id: number;
  title: string;
  audience: string;
  owner: { id: number; name: string };
  itemCount: number;
  youOwn: boolean;
  updatedAt: string;
}

export interface SetDetail extends Omit<SetSummary, 'itemCount'> {
  items: { position: number; mechanism: { slug: string; title: string }; revision: number; note: string }[];
}

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
