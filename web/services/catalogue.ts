import type {
  CatalogueEntry as ServerCatalogueEntry, CataloguePage as ServerCataloguePage, CreateCatalogueEntryBody, UpdateCatalogueEntryBody,
} from '@api/catalogue/catalogue.schemas';
import { http, request } from './http';
import type { Jsonified } from './jsonified';

/** The catalogue's answers as JSON (DEVELOPERS.md, "catalogue, sets, exports"): the server's types with dates as strings. */
export type CatalogueEntry = Jsonified<ServerCatalogueEntry>;
export type CataloguePage = Jsonified<ServerCataloguePage>;

export type CatalogueEntryInput = CreateCatalogueEntryBody;

export function searchCatalogue(filters: { q?: string; substructure?: string }): Promise<CataloguePage> {
  const params = new URLSearchParams({ pageSize: '200' });
  if (filters.q) params.set('q', filters.q);
  if (filters.substructure) params.set('substructure', filters.substructure);
  return http.get<CataloguePage>(`/api/catalogue?${params}`);
}

export function createCatalogueEntry(input: CatalogueEntryInput): Promise<CatalogueEntry> {
  return http.post<CatalogueEntry>('/api/catalogue', input);
}

export function updateCatalogueEntry(id: number, patch: UpdateCatalogueEntryBody): Promise<CatalogueEntry> {
  return request<CatalogueEntry>(`/api/catalogue/${id}`, { method: 'PATCH', body: patch });
}

/** The openchemlib depiction, served as SVG (used as an image source). */
export const depictionUrl = (id: number) => `/api/catalogue/${id}/depiction.svg`;
