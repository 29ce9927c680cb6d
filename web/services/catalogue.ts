import type { CreateCatalogueEntryBody, UpdateCatalogueEntryBody } from '@api/catalogue/catalogue.schemas';
import { http, request } from './http';

/** One catalogue entry as `GET /api/catalogue/:id` returns it (DEVELOPERS.md, "catalogue, sets, exports"). */
export interface CatalogueEntry {
  id: number;
  name: string;
  formula: string;
  lookupKey: string;
  charge: number;
  state: string | null;
  smiles: string | null;
  dfH: number | null;
  dfHUncertainty: number | null;
  dfHSource: string | null;
  notes: string;
  updatedAt: string;
  structure: {
    formula: string;
    charge: number;
    formalCharges: { atom: number; symbol: string; charge: number }[];
    unpairedElectrons: number;
    oddElectrons: boolean;
  } | null;
}

export interface CataloguePage {
  total: number;
  page: number;
  items: CatalogueEntry[];
}

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
