import type { MechanismAnalysis, SpeciesRole, StepJson } from '@api/analysis/analysis.schemas';
import { routeHighlight, type RouteHighlight } from './networkRoutes';
import { edgeWidth, type StepFluxes } from './networkFlux';

/** Species the graph leaves out: the photon and the third body would join nearly every step. */
const NOT_DRAWN = new Set(['photon', 'third-body']);

export interface SpeciesNodeData {
  id: string;
  kind: 'species';
  key: string;
  label: string;
  role: SpeciesRole;
  inRoute: boolean;
  inCycle: boolean;
  /** A route is selected and this is not part of it. */
  dimmed: boolean;
  /** Box size in px, from the label's lines (a sized box keeps the layout from overlapping labels). */
  boxWidth: number;
  boxHeight: number;
}

export interface StepNodeData {
  id: string;
  kind: 'step';
  step: string;
  /** The step id, its stoichiometric number in the selected route, and `hν` / `M` markers. */
  label: string;
  sigma: number | null;
  inRoute: boolean;
  dimmed: boolean;
  selected: boolean;
}

export interface EdgeData {
  id: string;
  source: string;
  target: string;
  step: string;
  species: string;
  /** The coefficient when it is not 1, else empty. */
  label: string;
  inRoute: boolean;
  inCycle: boolean;
  dimmed: boolean;
  width: number;
  /** Coefficient × time-averaged step rate, when a simulation result is there. */
  flux: number | null;
}

export interface NetworkModel {
  nodes: (SpeciesNodeData | StepNodeData)[];
  edges: EdgeData[];
}

export interface NetworkOptions {
  /** Index into analysis.routes, or null for no route highlighted. */
  route: number | null;
  selectedStep: string | null;
  fluxes?: StepFluxes | null;
}

export const speciesNodeId = (key: string) => `s:${key}`;
export const stepNodeId = (step: string) => `r:${step}`;

/** Noto Sans at 12 px averages about 7 px a character (common practice: measure once, then estimate). */
function boxOf(label: string): { boxWidth: number; boxHeight: number } {
  const lines = label.split('\n');
  return { boxWidth: Math.max(...lines.map((line) => line.length)) * 7 + 16, boxHeight: lines.length * 15 + 10 };
}

/** Catalysts carry a ring arrow and the word, intermediates a hollow ring: never colour alone. */
export function speciesLabel(key: string, role: SpeciesRole): string {
  if (role === 'catalyst') return `↻ ${key}\ncatalyst`;
  return role === 'intermediate' ? `◌ ${key}` : key;
}

/** The sigma as written on a step node: "B1 ×2", "B4 ×−1". */
function stepLabel(step: StepJson, sigma: number | null, drawnOut: Set<string>): string {
  const markers = [...step.reactants, ...step.products].filter((t) => drawnOut.has(t.key)).map((t) => t.key);
  const parts = [step.id, ...new Set(markers)];
  if (sigma !== null) parts.push(`×${String(sigma).replace('-', '−')}`);
  return parts.join(' ');
}

function speciesNodes(analysis: MechanismAnalysis, highlight: RouteHighlight): SpeciesNodeData[] {
  return analysis.species
    .filter((s) => !NOT_DRAWN.has(s.kind) && s.role !== 'photon' && s.role !== 'third-body')
    .map((s) => ({
      id: speciesNodeId(s.key),
      kind: 'species' as const,
      key: s.key,
      label: speciesLabel(s.key, s.role),
      ...boxOf(speciesLabel(s.key, s.role)),
      role: s.role,
      inRoute: highlight.species.has(s.key),
      inCycle: highlight.cycleSpecies.has(s.key),
      dimmed: highlight.active && !highlight.species.has(s.key),
    }));
}

function stepEdges(step: StepJson, drawn: Set<string>, highlight: RouteHighlight, fluxes: StepFluxes | null): EdgeData[] {
  const inRoute = highlight.sigma.has(step.id);
  const sides = [
    ...step.reactants.map((term) => ({ term, source: speciesNodeId(term.key), target: stepNodeId(step.id), side: 'in' })),
    ...step.products.map((term) => ({ term, source: stepNodeId(step.id), target: speciesNodeId(term.key), side: 'out' })),
  ];
  return sides
    .filter(({ term }) => drawn.has(term.key))
    .map(({ term, source, target, side }) => {
      const stepFlux = fluxes?.byStep.get(step.id);
      const flux = stepFlux === undefined ? null : stepFlux * term.coef;
      const inCycle = inRoute && highlight.cycleSpecies.has(term.key);
      return {
        id: `e:${step.id}:${side}:${term.key}`, source, target, step: step.id, species: term.key,
        label: term.coef === 1 ? '' : term.coefText, inRoute, inCycle, dimmed: highlight.active && !inRoute, flux,
        width: edgeWidth({ flux, maxFlux: fluxes?.max ?? null, inRoute, inCycle }),
      };
    });
}

/**
 * The graph of a mechanism: species as nodes, steps as nodes, arrows reactant → step → product;
 * the chosen route's steps carry their stoichiometric numbers, its cycle species (formed and
 * consumed again, like a catalyst) are marked, and edge widths follow simulated fluxes when given.
 */
export function buildNetworkModel(analysis: MechanismAnalysis, options: NetworkOptions): NetworkModel {
  const route = options.route === null ? null : (analysis.routes[options.route] ?? null);
  const highlight = routeHighlight(analysis.steps, route);
  const species = speciesNodes(analysis, highlight);
  const drawn = new Set(species.map((node) => node.key));
  const drawnOut = new Set(analysis.species.filter((s) => !drawn.has(s.key)).map((s) => s.key));
  const steps: StepNodeData[] = analysis.steps.map((step) => {
    const sigma = highlight.sigma.get(step.id) ?? null;
    return {
      id: stepNodeId(step.id), kind: 'step', step: step.id, label: stepLabel(step, sigma, drawnOut),
      sigma, inRoute: sigma !== null, dimmed: highlight.active && sigma === null, selected: step.id === options.selectedStep,
    };
  });
  const edges = analysis.steps.flatMap((step) => stepEdges(step, drawn, highlight, options.fluxes ?? null));
  return { nodes: [...species, ...steps], edges };
}
