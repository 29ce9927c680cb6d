import type { ConservationCheck, Composition } from './analysis/element-drift';
import type { SteadyState } from './analysis/steady-state';
import type { LightProfile } from './light';
import type { Conditions, KineticModel, KineticsDiagnostic } from './model';
import type { OutputGrid } from './output-grid';
import type { IntegrationStats, IntegrationStatus } from './solver/integration-types';

/** A route as stoichiometric numbers by step label (routes[].multipliers of the analysis). */
export interface RouteInput {
  name: string;
  multipliers: Record<string, number>;
}

export interface SimulationInput {
  model: KineticModel;
  conditions: Conditions;
  /** Initial concentrations by species key, in the model's unit; species left out start at 0. */
  initial: Record<string, number>;
  /** Species held at their initial concentration. */
  fixed?: string[];
  t0?: number;
  tEnd: number;
  output: OutputGrid;
  /** Default: constant full light. */
  light?: LightProfile;
  /** Default 1e-6. */
  rtol?: number;
  /** Default 1e-16 × the largest initial concentration. */
  atol?: number;
  maxSteps?: number;
  maxWallMs?: number;
  routes?: RouteInput[];
  /** Element counts per species (same order as model.species), for the conservation check and catalyst forms. */
  composition?: Composition[];
  /** Catalysts whose turnover frequency is wanted, with their forms (default: see catalystFamily). */
  catalysts?: { species: string; family?: string[] }[];
  /** The intermediates (routes' cancelled species, catalysts included): candidates for catalyst forms, and the species the steady state is solved for. */
  intermediates?: string[];
  steadyState?: boolean;
}

export interface SimulationHooks {
  shouldStop?: () => boolean;
  onProgress?: (fraction: number) => void;
  clock?: () => number;
}

export interface RouteReport {
  name: string;
  rates: number[];
  /** Route rate / initiation rate, per time (null without initiation). */
  chainLength: (number | null)[];
  turnover: { catalyst: string; family: string[]; values: (number | null)[] }[];
}

export interface SteadyStateReport extends Omit<SteadyState, 'concentrations'> {
  concentrations: Record<string, number>;
  /** The species solved for; all others are held at their values at the end of the run. */
  solvedFor: string[];
  /** Newton from the end of the run, or a long integration first when that did not converge. */
  method: 'newton' | 'integrate-then-newton';
}

export interface SimulationResult {
  status: IntegrationStatus | 'invalid';
  message: string | null;
  diagnostics: KineticsDiagnostic[];
  species: string[];
  steps: string[];
  /** [M] used, in the model's unit. */
  thirdBody: number | null;
  times: number[];
  /** concentrations[time][species] */
  concentrations: number[][];
  /** stepRates[time][step]: net rate, concentration per second. */
  stepRates: number[][];
  production: number[][];
  loss: number[][];
  byStep: { species: string; step: string; rates: number[] }[];
  routes: RouteReport[];
  /** Relative misfit of the route fit per time. */
  routeResidual: number[] | null;
  /** Names of routes left out of the fit because they are combinations of earlier routes. */
  routesLeftOut: string[];
  steadyState: SteadyStateReport | null;
  conservation: ConservationCheck | null;
  stats: IntegrationStats;
}
