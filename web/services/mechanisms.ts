import type { MechanismAnalysis } from '@api/analysis/analysis.schemas';
import type { RoundState } from '@api/reviews/reviews.schemas';
import { http, request } from './http';

/**
 * The repository API as the workbench and the library see it (DEVELOPERS.md, "repository and
 * review"). The server has no response schemas for these yet, so their shapes are written here.
 */
export type Visibility = 'public' | 'private';
export type { RoundState };

export interface PersonRef {
  id: number;
  name: string | null;
}

/** `GET /api/mechanisms/:slug`. */
export interface MechanismSummary {
  id: number;
  slug: string;
  title: string;
  summary: string;
  tags: string[];
  visibility: Visibility;
  latestRevisionNumber: number;
  createdAt: string;
  updatedAt: string;
  owner: PersonRef;
  collaborators: PersonRef[];
  referenceRevision: number | null;
  activeRound: { id: number; state: RoundState } | null;
  youCanEdit: boolean;
}

/** One revision without its text: what every panel needs to know about "which revision". */
export interface RevisionSummary {
  id: number;
  number: number;
  parentId: number | null;
  changeNote: string;
  author: PersonRef;
  createdAt: string;
}

/** `GET /api/mechanisms/:slug/revisions/:n`: the saved text and its stored analysis. */
export interface RevisionDetail extends RevisionSummary {
  source: string;
  analysis: MechanismAnalysis;
}

/** A row of `GET /api/mechanisms/:slug/revisions`. */
export interface RevisionListItem {
  id: number;
  number: number;
  changeNote: string;
  createdAt: string;
  authorId: number;
  authorName: string;
  stepCount: number;
  errorCount: number | string;
}

/** `details` of the 409 a save gets when its base is no longer the latest revision. */
export interface RevisionConflict {
  latest: { number: number; source: string; changeNote: string; authorId: number };
  yours: { rejectedSubmissionId: number; base: number; source: string; changeNote: string };
}

export interface NewMechanism {
  title: string;
  source: string;
  visibility: Visibility;
  summary?: string;
  tags?: string[];
  changeNote?: string;
}

const mechanismPath = (slug: string) => `/api/mechanisms/${encodeURIComponent(slug)}`;

export function getMechanism(slug: string): Promise<MechanismSummary> {
  return http.get<MechanismSummary>(mechanismPath(slug));
}

export function createMechanism(body: NewMechanism): Promise<MechanismSummary> {
  return http.post<MechanismSummary>('/api/mechanisms', body);
}

export function updateMechanism(slug: string, patch: Partial<Pick<MechanismSummary, 'title' | 'summary' | 'tags' | 'visibility'>>) {
  return request<MechanismSummary>(mechanismPath(slug), { method: 'PATCH', body: patch });
}

export function listRevisions(slug: string): Promise<RevisionListItem[]> {
  return http.get<RevisionListItem[]>(`${mechanismPath(slug)}/revisions`);
}

export function getRevision(slug: string, number: number): Promise<RevisionDetail> {
  return http.get<RevisionDetail>(`${mechanismPath(slug)}/revisions/${number}`);
}

/** Saves revision base+1; a stale base answers 409 `CONFLICT` with a {@link RevisionConflict}. */
export function saveRevision(slug: string, body: { base: number; source: string; changeNote: string }) {
  return http.post<RevisionDetail>(`${mechanismPath(slug)}/revisions`, body);
}

export const EXPORT_FORMATS = [
  { format: 'md', label: 'Markdown' },
  { format: 'tex', label: 'LaTeX (mhchem)' },
  { format: 'csv', label: 'CSV' },
  { format: 'json', label: 'JSON' },
  { format: 'pdf', label: 'PDF worksheet' },
] as const;

/** The download address of one revision in one export format. */
export function exportUrl(slug: string, revision: number, format: string, answers = false): string {
  const query = new URLSearchParams({ format, answers: String(answers) });
  return `/api/exports/mechanisms/${encodeURIComponent(slug)}/revisions/${revision}?${query}`;
}

/** A row of the library (`GET /api/mechanisms`). */
export interface MechanismListItem {
  id: number;
  slug: string;
  title: string;
  tags: string[];
  visibility: Visibility;
  latestRevisionNumber: number;
  updatedAt: string;
  ownerId: number;
  ownerName: string;
  referenceRevision: number | null;
  roundState: RoundState | null;
  stepCount: number | null;
  speciesCount: number | null;
}

export interface MechanismPage {
  items: MechanismListItem[];
  total: number;
  page: number;
  pageSize: number;
}

export type LibrarySort = 'updated' | 'created' | 'title' | 'relevance';

/** The library's query (`ListMechanismsQuery` on the server); unset filters are left out. */
export interface LibraryQuery {
  q?: string;
  species?: string;
  tag?: string;
  author?: number;
  visibility?: Visibility;
  state?: RoundState | 'none';
  sort?: LibrarySort;
  order?: 'asc' | 'desc';
  page?: number;
  pageSize?: number;
}

export function listMechanisms(query: LibraryQuery, signal?: AbortSignal): Promise<MechanismPage> {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value !== undefined && value !== '') params.set(key, String(value));
  }
  return http.get<MechanismPage>(`/api/mechanisms?${params}`, { signal });
}
