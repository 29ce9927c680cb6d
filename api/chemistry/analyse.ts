import { parseMechanism } from '@grammar/parse';
import type { Diagnostic } from '@grammar/diagnostics';
import type { MechanismAnalysis, SpeciesJson, SpeciesRole, StepJson } from './analysis-types';
import { finding } from './diagnostic-codes';
import { cachedLookup, declaredNamesLookup, enthalpyOf } from './enthalpy';
import { formedAndConsumedKeys } from './formed-and-consumed';
import { readDirectives, type MechanismSettings } from './directives';
import { reportRadicalMarks } from './radical-marks';
import { reportTwoSpellings } from './species-spellings';
import { chainCarriers } from './chain-carriers';
import { reportRates } from './rate-check';
import { reportLateDeclarations } from './declarations';
import { analyseRoutes, type RouteAnalysis } from './route-report';
import { assignRoles } from './roles';
import { SpeciesRegistry, type RegisteredSpecies } from './species-registry';
import type { StepModel } from './step-model';
import { StepPass } from './step-pass';
import { buildStoichiometry } from './stoichiometry';
import { stepsForRoutes } from './route-steps';
import { builtinEnthalpy, type EnthalpyLookup } from './thermo';
import { resolveDirectiveSpecies } from './directive-species';
import { sortDiagnostics } from './diagnostic-order';

export type { MechanismAnalysis } from './analysis-types';

/**
 * Above this many steps routes are not computed (a diagnostic says so): the basis then has
 * hundreds of routes, too many to read, and its exact computation grows with steps² × species.
 */
export const MAX_ROUTE_ANALYSIS_STEPS = 600;
/** Direct routes are listed for mechanisms of at most this many steps, unless told otherwise. */
export const DEFAULT_MAX_ROUTE_STEPS = 40;

// Any mention of this (even in a comment) sends the text down the path that reads declarations first.
const DECLARATION_MARK = '%species';

export interface AnalyseOptions {
  enthalpy?: EnthalpyLookup;
  maxRouteSteps?: number;
}

/** Parses, builds and reports the steps; the parse tree is not kept (the steps keep what they need of it). */
function readMechanism(text: string, lookup: EnthalpyLookup) {
  if (typeof text === 'string' && !text.includes(DECLARATION_MARK)) return readUndeclared(text, lookup);
  const parsed = parseMechanism(text);
  const diagnostics = [...parsed.diagnostics];
  const settings: MechanismSettings = readDirectives(parsed.directives, diagnostics);
  const registry = new SpeciesRegistry(settings.declarations, diagnostics);
  const namedLookup = declaredNamesLookup(lookup, settings.declarations);
  const pass = new StepPass(registry, namedLookup, diagnostics);
  parsed.steps.forEach(pass.add);
  pass.finish();
  return { diagnostics, settings, registry, pass, lookup: namedLookup };
}

/**
 * Without %species declarations every species resolves on its own, so each step is built as soon
 * as its line is parsed: the trees of a large text then die young instead of all being held (and
 * copied by the collector) until the last line. The diagnostics keep the order of `readMechanism`:
 * parser, directives, then steps.
 */
function readUndeclared(text: string, lookup: EnthalpyLookup) {
  const stepDiagnostics: Diagnostic[] = [];
  const registry = new SpeciesRegistry(new Map(), stepDiagnostics);
  const pass = new StepPass(registry, lookup, stepDiagnostics);
  const parsed = parseMechanism(text, pass.add);
  pass.finish();
  const diagnostics = [...parsed.diagnostics];
  const settings: MechanismSettings = readDirectives(parsed.directives, diagnostics);
  for (const item of stepDiagnostics) diagnostics.push(item);
  return { diagnostics, settings, registry, pass, lookup };
}

function speciesJson(item: RegisteredSpecies, role: SpeciesRole, lookup: EnthalpyLookup): SpeciesJson {
  const entry = item.kind === 'species' ? enthalpyOf(item, lookup) : null;
  const { key, formula, name, kind, elements, charge, sites, electrons, radical, reactive, declared, opaque, firstLine } = item;
  return { key, formula, name, kind, elements, charge, sites, electrons, radical, reactive, declared, opaque, role, dfH: entry?.dfH ?? null, dfHSource: entry?.source ?? null, firstLine };
}

function routesOrNote(steps: StepModel[], stepJson: StepJson[], species: RegisteredSpecies[], settings: { intermediates: string[] | null; terminal: Set<string> }, lookup: EnthalpyLookup, maxRouteSteps: number, diagnostics: Diagnostic[]): RouteAnalysis {
  if (steps.length <= MAX_ROUTE_ANALYSIS_STEPS) {
    const used = stepsForRoutes(steps, diagnostics);
    if (used.length === 0) return noRouteSteps(species, steps);
    const context = { steps: used, stoichiometry: buildStoichiometry(used), stepDH: used.map((step) => stepJson[step.index].dH), lookup, diagnostics };
    return analyseRoutes(context, species, settings, maxRouteSteps);
  }
  const intermediates = formedAndConsumedKeys(species, settings.terminal);
  const message = `routes are computed for up to ${MAX_ROUTE_ANALYSIS_STEPS} steps; this mechanism has ${steps.length}`;
  diagnostics.push(finding('routes-too-large', steps[0], message));
  const explanation = `Species both formed and consumed: ${intermediates.length}. Routes were not computed (${message}), so this choice was not checked for productive routes.`;
  return { intermediates, explanation, routes: [], overall: null, roles: assignRoles(species, steps, null, new Map()) };
}

function noRouteSteps(species: RegisteredSpecies[], steps: StepModel[]): RouteAnalysis {
  const explanation = 'Every step has an error that keeps it out of the routes, so there are no intermediates and no routes.';
  return { intermediates: [], explanation, routes: [], overall: null, roles: assignRoles(species, steps, null, new Map()) };
}

function emptyRoutes(diagnostics: Diagnostic[]): RouteAnalysis {
  diagnostics.push(finding('no-steps', { line: 1, column: 1 }, 'the text has no well-formed steps to analyse'));
  return { intermediates: [], explanation: 'There are no steps, so there are no intermediates.', routes: [], overall: null, roles: new Map() };
}

/**
 * Checks and analyses a mechanism written in the step notation: parse, species, balance,
 * radical bookkeeping, step rules, duplicates, intermediates, routes, roles and enthalpies.
 * Pure: no I/O. Never throws on any text; every problem becomes a diagnostic.
 */
export function analyseMechanism(text: string, options: AnalyseOptions = {}): MechanismAnalysis {
  // The lookup comes back from reading: declared names take their declared species' enthalpy.
  const { diagnostics, settings, registry, pass, lookup } = readMechanism(text, cachedLookup(options.enthalpy ?? builtinEnthalpy));
  const { steps, json: stepJson } = pass;
  const species = registry.all();
  reportRadicalMarks(species, diagnostics);
  reportLateDeclarations(species, settings.declarations, diagnostics);
  reportTwoSpellings(species, lookup, diagnostics);
  pass.missingEnthalpies.report(diagnostics);
  reportRates(steps, text, settings, diagnostics);
  const declared = resolveDirectiveSpecies(settings, registry, diagnostics);
  const routes = steps.length > 0
    ? routesOrNote(steps, stepJson, species, declared, lookup, options.maxRouteSteps ?? DEFAULT_MAX_ROUTE_STEPS, diagnostics)
    : emptyRoutes(diagnostics);
  return {
    title: settings.title,
    units: settings.units,
    conditions: settings.conditions,
    steps: stepJson,
    species: species.map((item) => speciesJson(item, routes.roles.get(item.key) ?? 'unused', lookup)),
    intermediates: routes.intermediates,
    intermediatesExplanation: routes.explanation,
    chainCarriers: chainCarriers(steps, stepJson, species),
    terminalSpecies: [...declared.terminal],
    routes: routes.routes,
    overall: routes.overall,
    diagnostics: sortDiagnostics(diagnostics),
  };
}
