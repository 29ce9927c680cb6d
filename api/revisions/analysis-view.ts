/**
 * The parts of the engine's analysis (api/chemistry/analyse.ts, shape in analysis.md) that the
 * repository reads: step identity for remarks and comparison, routes, roles and enthalpies.
 * Stored as JSON with each revision, so it is read back without re-running the engine.
 */
export interface StepTerm {
  key: string;
  coef: number;
  /** The exact value as written (`1/2`). */
  coefText?: string;
}

export interface StepView {
  label: string | null;
  line: number;
  equation: string;
  normalised: string;
  reactants: StepTerm[];
  products: StepTerm[];
  rate: { forward: string | null; reverse: string | null } | null;
  dH: number | null;
}

export interface RouteView {
  multipliers: Record<string, number>;
  net: string;
  kind: string;
  dH: number | null;
}

export interface SpeciesView {
  key: string;
  role: string;
}

export interface DiagnosticView {
  severity: string;
  line: number;
  column?: number;
  code: string;
  message: string;
}

export interface AnalysisView {
  steps: StepView[];
  routes: RouteView[];
  species: SpeciesView[];
  diagnostics: DiagnosticView[];
}

/** Unlabelled steps carry no label or a positional one (`#3`), which does not survive edits. */
export const stableLabel = (step: StepView): string | null =>
  step.label && !step.label.startsWith('#') ? step.label : null;
