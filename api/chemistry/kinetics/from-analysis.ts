import type { MechanismAnalysis } from '../analysis-types';
import type { Composition } from './analysis/element-drift';
import type { Conditions, KineticModel, KineticsDiagnostic, KineticStep, SpeciesTerm } from './model';
import type { RouteInput } from './simulation-types';
import { DEFAULT_PRESSURE_ATM, DEFAULT_TEMPERATURE_K, type ConcentrationUnit } from './units';
import { ratePositions } from '../rate-positions';

/** Everything a simulation needs from a mechanism analysis, besides the user's run settings. */
export interface KineticsSetup {
  /** Null when a step has no rate or the units are not supported (see diagnostics). */
  model: KineticModel | null;
  /** %conditions, with T = 298.15 K and P = 1 atm where the mechanism gives none. */
  conditions: Conditions;
  composition: Composition[];
  /** The basis routes only: route rates are a least-squares fit, which needs independent routes. */
  routes: RouteInput[];
  intermediates: string[];
  catalysts: string[];
  diagnostics: KineticsDiagnostic[];
}

const UNITS: ConcentrationUnit[] = ['molecule cm^-3', 'mol L^-1', 'mol m^-2'];
/** Particles that are not integrated: the photon and the third body (M enters through [M]). */
const NOT_INTEGRATED = new Set(['photon', 'third-body']);

type StepJson = MechanismAnalysis['steps'][number];

function termsOf(terms: StepJson['reactants'], index: Map<string, number>): SpeciesTerm[] {
  return terms.flatMap((term) => (index.has(term.key) ? [{ index: index.get(term.key)!, coef: term.coef }] : []));
}

function stepOf(step: StepJson, index: Map<string, number>, thirdBodies: Set<string>, lines: string[] | null): KineticStep | null {
  const rate = step.rate;
  if (!rate || !rate.forward || (step.reversible && !rate.reverse)) return null;
  return {
    label: step.id,
    reactants: termsOf(step.reactants, index),
    products: termsOf(step.products, index),
    thirdBody: step.reactants.some((term) => thirdBodies.has(term.key)),
    photolysis: step.photolysis,
    forward: rate.forward,
    reverse: step.reversible ? rate.reverse : null,
    stepClass: step.class,
    ...ratePositions({ ...rate, forward: rate.forward }, lines),
  };
}

function missingRate(step: StepJson, position: number): KineticsDiagnostic {
  const what = step.reversible && step.rate?.forward ? 'a reverse rate (`@ FORWARD | REVERSE`)' : 'a rate expression after `@`';
  return { severity: 'error', code: 'rate-missing', message: `step ${step.id} needs ${what} to be simulated`, step: position, label: step.id, line: step.line, column: step.column };
}

function unitOf(analysis: MechanismAnalysis, diagnostics: KineticsDiagnostic[]): ConcentrationUnit | null {
  const unit = UNITS.find((known) => known === analysis.units.conc);
  if (!unit) diagnostics.push({ severity: 'error', code: 'units-unsupported', message: `concentration unit "${analysis.units.conc}" is not one of ${UNITS.join(', ')}`, step: null, label: null });
  return unit ?? null;
}

/**
 * Turns a mechanism analysis into a kinetic model: species except the photon and M, steps with
 * their rate texts and positions (step ids as labels, so route multipliers apply), the units and
 * conditions of the mechanism, element counts (null for opaque names), routes, intermediates and
 * catalysts. Steps without a rate make the model null, each with an error diagnostic at its line.
 */
export function kineticsFromAnalysis(analysis: MechanismAnalysis, sourceText?: string): KineticsSetup {
  const diagnostics: KineticsDiagnostic[] = [];
  const kept = analysis.species.filter((species) => !NOT_INTEGRATED.has(species.kind));
  const index = new Map(kept.map((species, i) => [species.key, i]));
  const thirdBodies = new Set(analysis.species.filter((species) => species.kind === 'third-body').map((species) => species.key));
  const lines = sourceText === undefined ? null : sourceText.split(/\r?\n/);
  const steps = analysis.steps.map((step, position) => {
    const built = stepOf(step, index, thirdBodies, lines);
    if (!built) diagnostics.push(missingRate(step, position));
    return built;
  });
  const unit = unitOf(analysis, diagnostics);
  const complete = unit !== null && steps.every((step) => step !== null);
  const { T, P, M } = analysis.conditions;
  return {
    model: complete ? { species: kept.map((species) => species.key), steps: steps as KineticStep[], unit } : null,
    conditions: { T: T ?? DEFAULT_TEMPERATURE_K, P: P ?? DEFAULT_PRESSURE_ATM, M },
    composition: kept.map((species) => (species.opaque ? null : species.elements)),
    routes: analysis.routes.flatMap((route, r) => (route.basis ? [{ name: `route ${r + 1}: ${route.net}`, multipliers: route.multipliers }] : [])),
    intermediates: analysis.intermediates,
    catalysts: analysis.species.filter((species) => species.role === 'catalyst').map((species) => species.key),
    diagnostics,
  };
}
