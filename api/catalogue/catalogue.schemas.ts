import { z } from 'zod';

const Text = (max: number) => z.string().trim().max(max);

/** The fields a curator writes; charge and state are read from the written formula. */
const Fields = {
  name: Text(200).min(1, 'Give the species a name'),
  formula: Text(120).min(1, 'Give the formula as written in steps (O3, Cl(aq)^-)'),
  smiles: Text(500).min(1).nullable(),
  dfH: z.number().finite().min(-1e5).max(1e5).nullable(),
  dfHUncertainty: z.number().finite().nonnegative().nullable(),
  dfHSource: Text(1000).min(1).nullable(),
  notes: Text(20_000),
};

const needsSource = (body: { dfH?: number | null; dfHSource?: string | null }) => body.dfH == null || Boolean(body.dfHSource);
const sourceIssue = { message: 'An enthalpy of formation needs its published source', path: ['dfHSource'] };

export const CreateCatalogueEntryBody = z.object({
  ...Fields,
  smiles: Fields.smiles.default(null),
  dfH: Fields.dfH.default(null),
  dfHUncertainty: Fields.dfHUncertainty.default(null),
  dfHSource: Fields.dfHSource.default(null),
  notes: Fields.notes.default(''),
}).refine(needsSource, sourceIssue);
export type CreateCatalogueEntryBody = z.infer<typeof CreateCatalogueEntryBody>;

// No defaults here: a field left out of a change stays as it is.
export const UpdateCatalogueEntryBody = z.object(Fields).partial()
  .refine((body) => Object.keys(body).length > 0, { message: 'Change at least one field' });
export type UpdateCatalogueEntryBody = z.infer<typeof UpdateCatalogueEntryBody>;

export const CatalogueEntryParams = z.object({ id: z.coerce.number().int().positive() });

export const CatalogueSearchQuery = z.object({
  q: Text(200).min(1).optional(),
  substructure: Text(500).min(1).optional(),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(50),
});
export type CatalogueSearchQuery = z.infer<typeof CatalogueSearchQuery>;

/** One stored entry (`catalogue.queries.ts` reads it; the web gets it through `Jsonified`). */
export interface CatalogueRow {
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
  updatedAt: Date;
}

/** What an entry's SMILES says: Hill formula, charge, formal charges per atom, unpaired electrons. */
export interface CatalogueStructure {
  formula: string;
  charge: number;
  formalCharges: { atom: number; symbol: string; charge: number }[];
  unpairedElectrons: number;
  oddElectrons: boolean;
}

/** `GET /api/catalogue/:id` and every entry the catalogue answers with. */
export interface CatalogueEntry extends CatalogueRow {
  structure: CatalogueStructure | null;
}

/** `GET /api/catalogue`. */
export interface CataloguePage {
  total: number;
  page: number;
  items: CatalogueEntry[];
}
