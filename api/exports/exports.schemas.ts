import { z } from 'zod';

/** The address where the JSON Schema of exports is published (never changes for version 1). */
export const EXPORT_SCHEMA_PATH = '/api/schemas/mechanism-export.json';

const Term = z.object({ key: z.string(), coef: z.number(), coefText: z.string() });

export const StepExport = z.object({
  id: z.string().describe('The label, or #n for the n-th unlabelled step'),
  label: z.string().nullable(),
  equation: z.string(),
  reversible: z.boolean(),
  reactants: z.array(Term),
  products: z.array(Term),
  rate: z.object({ forward: z.string().nullable(), reverse: z.string().nullable() }).nullable(),
});
export type StepExport = z.infer<typeof StepExport>;

export const StepAnswer = z.object({
  id: z.string(),
  class: z.string(),
  balanced: z.boolean(),
  photolysis: z.boolean(),
  dH: z.number().nullable().describe('kJ/mol, Hess’s law from the enthalpies used'),
  thresholdNm: z.number().nullable(),
});

export const RouteAnswer = z.object({
  multipliers: z.record(z.string(), z.number().int()).describe('Stoichiometric number per step id'),
  net: z.string(),
  netSpecies: z.record(z.string(), z.number()).describe('Net coefficient per species: products +, reactants −'),
  kind: z.enum(['productive', 'null-cycle']),
  dH: z.number().nullable(),
});

export const UsedEnthalpy = z.object({ key: z.string(), dfH: z.number(), uncertainty: z.number().nullable(), source: z.string() });

export const AnswerKey = z.object({
  steps: z.array(StepAnswer),
  routes: z.array(RouteAnswer),
  overall: z.number().int().nullable().describe('Index of the overall route, or null'),
  reactants: z.array(z.string()),
  products: z.array(z.string()),
  catalysts: z.array(z.string()),
  intermediates: z.array(z.string()),
  usedEnthalpies: z.array(UsedEnthalpy),
});
export type AnswerKey = z.infer<typeof AnswerKey>;

export const MechanismExport = z.object({
  title: z.string(),
  slug: z.string(),
  revision: z.number().int().positive(),
  note: z.string(),
  source: z.string().describe('The mechanism in the step notation, exactly as saved'),
  steps: z.array(StepExport),
  answers: AnswerKey.optional(),
});
export type MechanismExport = z.infer<typeof MechanismExport>;

/**
 * The product's standing cautions (product.md). Every export is a handout that may travel without
 * the application around it, so each format carries them itself.
 */
export const HANDOUT_CAUTIONS = [
  'Results are computational checks, not a substitute for validated models or measurements.',
  'Rate and thermochemical data carry the uncertainty of their sources.',
  'Ozone, nitrogen oxides, halogens and UV sources are hazardous: handle them under local regulations and licensed laboratory practice.',
] as const;

export const ExportDocument = z.object({
  format: z.literal('cyclewright-export'),
  version: z.literal(1),
  schema: z.string(),
  exportedAt: z.string(),
  answerKey: z.boolean(),
  // Optional when read so that exports written before the field existed still import.
  cautions: z.array(z.string()).optional().describe('The cautions every handout carries: computational checks, data uncertainty, hazards'),
  set: z.object({ title: z.string(), audience: z.string() }).nullable(),
  mechanisms: z.array(MechanismExport).min(1),
});
export type ExportDocument = z.infer<typeof ExportDocument>;

export const EXPORT_FORMATS = ['md', 'tex', 'csv', 'json', 'pdf'] as const;
export type ExportFormat = (typeof EXPORT_FORMATS)[number];

export const ExportQuery = z.object({
  format: z.enum(EXPORT_FORMATS),
  answers: z.enum(['true', 'false']).default('false').transform((value) => value === 'true'),
});
