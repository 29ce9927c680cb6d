import type { ConcentrationUnit } from './units';

/** A species of a step with its stoichiometric coefficient (index into KineticModel.species). */
export interface SpeciesTerm {
  index: number;
  coef: number;
}

/** Where a rate expression starts in the mechanism text, so errors can point into the step. */
export interface TextPosition {
  line: number;
  column: number;
}

/** One elementary (or lumped) step as the kinetics engine sees it. */
export interface KineticStep {
  label: string;
  reactants: SpeciesTerm[];
  products: SpeciesTerm[];
  /** M appears on both sides: the rate carries [M] unless the expression already does. */
  thirdBody: boolean;
  /** The forward value is a photolysis frequency J (s⁻¹), scaled by the light profile. */
  photolysis: boolean;
  /** Rate expression text (mathjs syntax, see step-notation.md). */
  forward: string;
  /** Reverse rate expression for a reversible step, else null. */
  reverse: string | null;
  /** Position of the forward and reverse expression texts, when known. */
  forwardAt?: TextPosition;
  reverseAt?: TextPosition;
  /** Step class from the mechanism analysis (initiation, propagation, …), when known. */
  stepClass?: string;
}

/** A mechanism ready for kinetics: species keys, steps and the concentration unit. */
export interface KineticModel {
  species: string[];
  steps: KineticStep[];
  unit: ConcentrationUnit;
}

/** Conditions rate expressions are evaluated at: T (K), P (atm) and optionally [M]. */
export interface Conditions {
  T: number;
  P: number;
  /** Third-body concentration in the model's unit; computed from P and T when absent. */
  M?: number | null;
}

/** A problem found while building the numeric system, pointing at a step and, when known, a column. */
export interface KineticsDiagnostic {
  severity: 'error' | 'warning' | 'info';
  code: string;
  message: string;
  step: number | null;
  label: string | null;
  line?: number;
  column?: number;
}
