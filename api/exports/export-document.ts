import type { MechanismAnalysis } from '../chemistry/analysis-types';
import type { EnthalpyEntry } from '../chemistry/thermo';
import { EXPORT_SCHEMA_PATH, HANDOUT_CAUTIONS, type AnswerKey, type ExportDocument, type MechanismExport } from './exports.schemas';

/** One revision to export, with its stored analysis and the set's note for it. */
export interface ExportItem {
  title: string;
  slug: string;
  revision: number;
  note: string;
  source: string;
  analysis: MechanismAnalysis;
}

const withRole = (analysis: MechanismAnalysis, role: string) =>
  analysis.species.filter((species) => species.role === role).map((species) => species.key);

function usedEnthalpies(analysis: MechanismAnalysis): EnthalpyEntry[] {
  const byKey = new Map<string, EnthalpyEntry>();
  for (const step of analysis.steps) for (const entry of step.usedEnthalpies) byKey.set(entry.key, entry);
  return [...byKey.values()].sort((a, b) => a.key.localeCompare(b.key));
}

/** The answer key of one analysis: classes, balance, ΔH, thresholds, routes and roles. */
export function answerKey(analysis: MechanismAnalysis): AnswerKey {
  return {
    steps: analysis.steps.map((step) => ({
      id: step.id, class: step.class, balanced: step.balanced, photolysis: step.photolysis, dH: step.dH, thresholdNm: step.thresholdNm,
    })),
    routes: analysis.routes.map((route) => ({
      multipliers: Object.fromEntries(Object.entries(route.multipliers).map(([id, sigma]) => [id, Number(sigma)])),
      net: route.net,
      netSpecies: Object.fromEntries(Object.entries(route.netSpecies).map(([key, coef]) => [key, Number(coef)])),
      kind: route.kind, dH: route.dH,
    })),
    overall: analysis.overall,
    reactants: withRole(analysis, 'reactant'),
    products: withRole(analysis, 'product'),
    catalysts: withRole(analysis, 'catalyst'),
    intermediates: withRole(analysis, 'intermediate'),
    usedEnthalpies: usedEnthalpies(analysis).map(({ key, dfH, uncertainty, source }) => ({ key, dfH, uncertainty, source })),
  };
}

export function mechanismExport(item: ExportItem, withAnswers: boolean): MechanismExport {
  const steps = item.analysis.steps.map((step) => ({
    id: step.id, label: step.label, equation: step.equation, reversible: step.reversible,
    reactants: step.reactants.map(({ key, coef, coefText }) => ({ key, coef, coefText })),
    products: step.products.map(({ key, coef, coefText }) => ({ key, coef, coefText })),
    rate: step.rate ? { forward: step.rate.forward, reverse: step.rate.reverse } : null,
  }));
  const { title, slug, revision, note, source } = item;
  return { title, slug, revision, note, source, steps, ...(withAnswers ? { answers: answerKey(item.analysis) } : {}) };
}

/** The document every format is rendered from (and the JSON export itself). */
export function exportDocument(
  items: ExportItem[],
  options: { answers: boolean; set: { title: string; audience: string } | null; now?: Date },
): ExportDocument {
  return {
    format: 'cyclewright-export',
    version: 1,
    schema: EXPORT_SCHEMA_PATH,
    exportedAt: (options.now ?? new Date()).toISOString(),
    answerKey: options.answers,
    cautions: [...HANDOUT_CAUTIONS],
    set: options.set,
    mechanisms: items.map((item) => mechanismExport(item, options.answers)),
  };
}
