import type { Diagnostic } from '@grammar/diagnostics';
import type { EnthalpyEntry } from './thermo';
import type { StepClass } from './step-rules';

/** A species and its coefficient; `coefText` keeps the exact value (`1/2`). */
export interface TermJson {
  key: string;
  coef: number;
  coefText: string;
}

export interface StepJson {
  label: string | null;
  /** The label, or `#n` for the n-th step. */
  id: string;
  line: number;
  column: number;
  equation: string;
  normalised: string;
  reversible: boolean;
  reactants: TermJson[];
  products: TermJson[];
  balanced: boolean;
  elementsChecked: boolean;
  imbalance: Record<string, number>;
  chargeDelta: number;
  siteDelta: number;
  class: StepClass;
  photolysis: boolean;
  molecularity: number;
  elementary: boolean;
  dH: number | null;
  thresholdNm: number | null;
  missingEnthalpies: string[];
  usedEnthalpies: EnthalpyEntry[];
  rate: { forward: string | null; reverse: string | null; line: number; column: number } | null;
}

export type SpeciesRole = 'reactant' | 'product' | 'catalyst' | 'intermediate' | 'third-body' | 'photon' | 'site' | 'unused';

export interface SpeciesJson {
  key: string;
  formula: string;
  name: string | null;
  kind: string;
  elements: Record<string, number>;
  charge: number;
  sites: number;
  electrons: number | null;
  radical: boolean;
  reactive: boolean;
  declared: boolean;
  opaque: boolean;
  role: SpeciesRole;
  dfH: number | null;
  dfHSource: string | null;
  firstLine: number;
}

export interface RouteJson {
  /** Stoichiometric number per step id (steps with σ = 0 left out). */
  multipliers: Record<string, number>;
  net: string;
  netSpecies: Record<string, number>;
  /** Photons and third bodies, kept aside from the net reaction. */
  aside: Record<string, number>;
  kind: 'productive' | 'null-cycle';
  dH: number | null;
  /** Σ σ ΔH of the steps and ΔH of the net reaction: Hess's law says they agree when both are known. */
  dHFromSteps: number | null;
  dHFromNet: number | null;
  /** Whether no smaller route's steps are a subset of this one's; null when direct routes were not listed (over ~40 steps). */
  direct: boolean | null;
  basis: boolean;
  /** Ids of the one-way steps this route runs backwards (σ < 0): empty for a route that can occur as written. */
  reversesOneWay: string[];
}

/** The machine-readable result of `check --json` and `POST /api/analyse` (analysis.md). */
export interface MechanismAnalysis {
  title: string | null;
  units: { conc: string; time: string };
  conditions: { T: number | null; P: number | null; M: number | null };
  steps: StepJson[];
  species: SpeciesJson[];
  intermediates: string[];
  intermediatesExplanation: string;
  /** Radicals that chain-carrying steps (propagation, branching) both consume and form again. */
  chainCarriers: string[];
  terminalSpecies: string[];
  routes: RouteJson[];
  overall: number | null;
  diagnostics: Diagnostic[];
}
