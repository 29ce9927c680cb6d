import { z } from 'zod';

/** The largest mechanism text the API analyses in one request (about 50 000 typical steps). */
export const MAX_ANALYSE_CHARS = 4_000_000;

export const AnalyseBody = z.object({
  text: z.string().max(MAX_ANALYSE_CHARS, `The text is longer than ${MAX_ANALYSE_CHARS} characters; split the mechanism`),
});
export type AnalyseBody = z.infer<typeof AnalyseBody>;

// The web shows what the API returns: it takes the analysis type from here (types only, no engine code).
export type {
  MechanismAnalysis,
  StepJson,
  SpeciesJson,
  RouteJson,
  TermJson,
  SpeciesRole,
} from '../chemistry/analysis-types';
