import type { NetworkModel, SpeciesNodeData, StepNodeData } from './networkModel';

/**
 * The graph in words, under the picture: what the chosen route runs through and which species are
 * catalysts and intermediates. Screen readers get the same facts the colours and shapes show.
 */
export function networkSummary(model: NetworkModel): string[] {
  const species = model.nodes.filter((n): n is SpeciesNodeData => n.kind === 'species');
  const routeSteps = model.nodes.filter((n): n is StepNodeData => n.kind === 'step' && n.sigma !== null);
  const keys = (list: SpeciesNodeData[]) => list.map((n) => n.key).join(', ');
  const catalysts = species.filter((n) => n.role === 'catalyst');
  const intermediates = species.filter((n) => n.role === 'intermediate');
  const lines: string[] = [];
  if (routeSteps.length > 0) {
    lines.push(`Route steps: ${routeSteps.map((n) => `${n.step} ×${String(n.sigma).replace('-', '−')}`).join(', ')}.`);
    const cycle = species.filter((n) => n.inCycle);
    if (cycle.length > 0) lines.push(`Cycle through: ${keys(cycle)}.`);
  }
  lines.push(catalysts.length > 0 ? `Catalysts (↻): ${keys(catalysts)}.` : 'No catalyst.');
  if (intermediates.length > 0) lines.push(`Intermediates (◌): ${keys(intermediates)}.`);
  return lines;
}
