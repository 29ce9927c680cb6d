import { checkElementConservation } from './analysis/element-drift';
import { stepRatesOverTime } from './analysis/fluxes';
import { buildRateSystem } from './build-system';
import { lightLevel, type LightProfile } from './light';
import { massActionProblem } from './mass-action-problem';
import type { KineticsDiagnostic } from './model';
import { outputTimes } from './output-grid';
import { checkScalars, fixedMask, initialVector, routeMatrix } from './simulation-input';
import { analyseRun } from './simulation-report';
import type { RateSystem } from './rate-system';
import type { SimulationHooks, SimulationInput, SimulationResult, SteadyStateReport } from './simulation-types';
import type { IntegrationResult } from './solver/integration-types';
import { integrateStiff } from './solver/integrate';
import { steadyStateNear } from './steady-state-report';

const FULL_LIGHT: LightProfile = { kind: 'constant', level: 1 };
const DEFAULT_RTOL = 1e-6;
function dependentRoutes(names: string[]): KineticsDiagnostic {
  const message = `no rate for ${names.join('; ')}: each is a combination of routes listed before it, so its rate is not defined`;
  return { severity: 'info', code: 'routes-dependent', step: null, label: null, message };
}

function emptyResult(input: SimulationInput, diagnostics: KineticsDiagnostic[]): SimulationResult {
  return {
    status: 'invalid', message: 'the mechanism has rate errors', diagnostics, species: input.model.species,
    steps: input.model.steps.map((step) => step.label), thirdBody: null, times: [], concentrations: [], stepRates: [],
    production: [], loss: [], byStep: [], routes: [], routeResidual: null, routesLeftOut: [], steadyState: null, conservation: null,
    stats: { accepted: 0, rejected: 0, clippedValues: 0, largestClipped: 0 },
  };
}

function heldForSteadyState(input: SimulationInput, fixed: Uint8Array): Uint8Array {
  // No intermediates named (or none at all, as when no species is both formed and consumed):
  // the whole system is solved for, which for a closed one is its equilibrium. Holding every
  // species instead would report the end of the run as a steady state without solving anything.
  if (!input.intermediates || input.intermediates.length === 0) return fixed;
  const solved = new Set(input.intermediates);
  return fixed.map((isFixed, i) => (isFixed || !solved.has(input.model.species[i]) ? 1 : 0));
}

function defaultAbsoluteTolerance(y0: Float64Array): number {
  return Math.max(1e-30, 1e-16 * Math.max(...y0));
}

interface Prepared {
  system: RateSystem;
  y0: Float64Array;
  fixed: Uint8Array;
  light: LightProfile;
  rtol: number;
  atol: number;
}

function steadyStateOf(input: SimulationInput, prepared: Prepared, run: IntegrationResult, hooks: SimulationHooks): SteadyStateReport | null {
  if (!input.steadyState || run.status !== 'done') return null;
  const { system, fixed, light, rtol, atol } = prepared;
  const span = input.tEnd - (input.t0 ?? 0);
  return steadyStateNear({
    system, species: input.model.species, start: run.states.at(-1) ?? prepared.y0, held: heldForSteadyState(input, fixed),
    light: lightLevel(light, input.tEnd), rtol, atol, relaxTime: 1e6 * span, shouldStop: hooks.shouldStop, maxWallMs: input.maxWallMs,
  });
}

function integrate(input: SimulationInput, prepared: Prepared, times: number[], hooks: SimulationHooks): IntegrationResult {
  const { system, y0, fixed, light, rtol, atol } = prepared;
  const t0 = input.t0 ?? 0;
  const problem = massActionProblem(system, { fixed, light, t0, tEnd: input.tEnd });
  return integrateStiff(problem, y0, { t0, tEnd: input.tEnd, outputTimes: times, rtol, atol, maxSteps: input.maxSteps, maxWallMs: input.maxWallMs, ...hooks });
}

/**
 * Runs a kinetics simulation: compiles the rates at the conditions, integrates the mass-action
 * equations with RODAS4 from the initial concentrations (fixed species clamped, photolysis scaled by
 * the light profile) and reports the concentrations, step rates, species budgets by step, route
 * rates, chain lengths, turnover frequencies, element conservation and, on request, the steady
 * state. Bad inputs throw KineticsInputError; rate-expression errors give status "invalid" with
 * diagnostics at the steps. Pure: no I/O; `hooks` carry cancellation and progress.
 */
export function simulate(input: SimulationInput, hooks: SimulationHooks = {}): SimulationResult {
  checkScalars(input);
  const { model } = input;
  const times = outputTimes(input.output, input.t0 ?? 0, input.tEnd);
  const y0 = initialVector(model, input.initial);
  const fixed = fixedMask(model, input.fixed);
  const sigma = routeMatrix(model, input.routes);
  const { system, diagnostics } = buildRateSystem(model, input.conditions);
  if (!system) return emptyResult(input, diagnostics);
  const prepared = { system, y0, fixed, light: input.light ?? FULL_LIGHT, rtol: input.rtol ?? DEFAULT_RTOL, atol: input.atol ?? defaultAbsoluteTolerance(y0) };
  const run = integrate(input, prepared, times, hooks);
  const stepRates = stepRatesOverTime(system, run.states, run.times.map((t) => lightLevel(prepared.light, t)));
  const analysis = analyseRun(input, { system, sigma, states: run.states, stepRates });
  if (analysis.routesLeftOut.length > 0) diagnostics.push(dependentRoutes(analysis.routesLeftOut));
  return {
    status: run.status, message: run.message, diagnostics, species: model.species, steps: model.steps.map((step) => step.label),
    thirdBody: system.thirdBody, times: run.times, concentrations: run.states.map((state) => Array.from(state)), stepRates,
    ...analysis, steadyState: steadyStateOf(input, prepared, run, hooks),
    conservation: input.composition ? checkElementConservation(input.composition, fixed, run.states) : null,
    stats: run.stats,
  };
}
