import { forceCollide, forceLink, forceManyBody, forceSimulation, forceX, forceY, type SimulationNodeDatum } from 'd3-force';

/** What the layout needs of a graph: node ids, species box widths and the arrows. */
export interface LayoutGraph {
  nodes: { id: string; kind: 'species' | 'step'; boxWidth?: number }[];
  edges: { source: string; target: string }[];
}

export type Positions = Record<string, { x: number; y: number }>;

interface SpeciesPoint extends SimulationNodeDatum {
  id: string;
  radius: number;
}

/** Forces tuned on generated alkyl-peroxy mechanisms of 500–3,000 nodes; the tick count bounds the time. */
const SPECIES_GAP = 90;
const TICKS = 100;
const STEP_SPACING = 16;

/** Each step's drawn species, in the order of its arrows. */
function speciesOfSteps(graph: LayoutGraph, isStep: (id: string) => boolean): Map<string, string[]> {
  const bySteps = new Map<string, string[]>();
  for (const edge of graph.edges) {
    const [step, species] = isStep(edge.source) ? [edge.source, edge.target] : [edge.target, edge.source];
    const list = bySteps.get(step) ?? [];
    if (!list.includes(species)) list.push(species);
    bySteps.set(step, list);
  }
  return bySteps;
}

/** Species that meet in a step are linked once, whatever the number of steps they share. */
function speciesLinks(bySteps: Map<string, string[]>): { source: string; target: string }[] {
  const links = new Map<string, { source: string; target: string }>();
  for (const species of bySteps.values()) {
    for (let i = 0; i < species.length; i += 1) {
      for (let j = i + 1; j < species.length; j += 1) {
        const [a, b] = species[i] < species[j] ? [species[i], species[j]] : [species[j], species[i]];
        links.set(`${a}\u0000${b}`, { source: a, target: b });
      }
    }
  }
  return [...links.values()];
}

/**
 * Species positions from a force simulation of the species alone, each pair meeting in a step
 * linked. d3-force starts from its fixed phyllotaxis spiral and a seeded jiggle, so the same graph
 * gets the same picture every time; link strength falls with degree, so hubs such as O2 do not pull
 * everything into one knot.
 */
function placeSpecies(species: LayoutGraph['nodes'], links: { source: string; target: string }[]): Positions {
  const points: SpeciesPoint[] = species.map((node) => ({ id: node.id, radius: (node.boxWidth ?? 40) / 2 + 4 }));
  forceSimulation(points)
    .force('charge', forceManyBody<SpeciesPoint>().strength(-160).theta(1.2))
    .force('link', forceLink<SpeciesPoint, { source: string; target: string }>(links).id((p) => p.id).distance(SPECIES_GAP))
    .force('collide', forceCollide<SpeciesPoint>((p) => p.radius))
    .force('x', forceX<SpeciesPoint>().strength(0.04))
    .force('y', forceY<SpeciesPoint>().strength(0.04))
    .alphaDecay(1 - 0.001 ** (1 / TICKS))
    .stop()
    .tick(TICKS);
  return Object.fromEntries(points.map((p) => [p.id, { x: p.x ?? 0, y: p.y ?? 0 }]));
}

/**
 * Steps sit at the centre of their species; steps that would share a spot (the same species, or a
 * step with one drawn species sitting on it) are spread along a golden-angle spiral around it.
 */
function placeSteps(steps: string[], bySteps: Map<string, string[]>, species: Positions): Positions {
  const positions: Positions = {};
  const taken = new Map<string, number>();
  for (const step of steps) {
    const around = (bySteps.get(step) ?? []).map((id) => species[id]).filter(Boolean);
    const x = around.reduce((sum, p) => sum + p.x, 0) / (around.length || 1);
    const y = around.reduce((sum, p) => sum + p.y, 0) / (around.length || 1);
    const spot = `${Math.round(x / STEP_SPACING)},${Math.round(y / STEP_SPACING)}`;
    const index = (taken.get(spot) ?? 0) + (around.length === 1 ? 2 : 0);
    taken.set(spot, (taken.get(spot) ?? 0) + 1);
    const radius = STEP_SPACING * Math.sqrt(index);
    const angle = index * 2.399963;
    positions[step] = { x: x + radius * Math.cos(angle), y: y + radius * Math.sin(angle) };
  }
  return positions;
}

/**
 * A quick, deterministic layout for graphs too large for fCoSE in the time allowed: species by
 * force simulation, steps placed between them. Linear in the steps, and the simulation only
 * sees the species (about a fifth of the nodes in a large mechanism).
 */
export function largeGraphLayout(graph: LayoutGraph): Positions {
  const stepIds = new Set(graph.nodes.filter((node) => node.kind === 'step').map((node) => node.id));
  const bySteps = speciesOfSteps(graph, (id) => stepIds.has(id));
  const species = placeSpecies(graph.nodes.filter((node) => node.kind === 'species'), speciesLinks(bySteps));
  return { ...species, ...placeSteps([...stepIds], bySteps, species) };
}
