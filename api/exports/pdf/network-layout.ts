import type { StepExport } from '../exports.schemas';

export interface NodePlace {
  id: string;
  label: string;
  x: number;
  y: number;
}

export interface NetworkLayout {
  species: NodePlace[];
  steps: NodePlace[];
  /** From a species to a step (consumed) or a step to a species (formed). */
  edges: Array<{ from: NodePlace; to: NodePlace }>;
}

// Photons and third bodies take part in every step they are written in; drawn, they only clutter.
const HIDDEN = new Set(['hν', 'hv', 'M']);

function ring(count: number, cx: number, cy: number, radius: number, offset: number) {
  return Array.from({ length: count }, (_, index) => {
    const angle = offset + (2 * Math.PI * index) / Math.max(count, 1) - Math.PI / 2;
    return { x: cx + radius * Math.cos(angle), y: cy + radius * Math.sin(angle) };
  });
}

/**
 * A species–step diagram laid out on two rings: species outside, steps inside, so every edge
 * crosses the gap between them. Deterministic: the same steps give the same picture.
 */
export function networkLayout(steps: StepExport[], box: { x: number; y: number; width: number; height: number }): NetworkLayout {
  const keys = [...new Set(steps.flatMap((step) => [...step.reactants, ...step.products].map((term) => term.key)))]
    .filter((key) => !HIDDEN.has(key));
  const cx = box.x + box.width / 2;
  const cy = box.y + box.height / 2;
  const outer = Math.min(box.width, box.height) / 2 - 18;
  const speciesAt = ring(keys.length, cx, cy, outer, 0);
  const stepAt = ring(steps.length, cx, cy, outer * 0.45, Math.PI / Math.max(steps.length, 1));
  const species = keys.map((key, index) => ({ id: key, label: key, ...speciesAt[index] }));
  const stepNodes = steps.map((step, index) => ({ id: step.id, label: step.id, ...stepAt[index] }));
  const byKey = new Map(species.map((node) => [node.id, node]));
  const edges = steps.flatMap((step, index) => [
    ...step.reactants.filter((term) => byKey.has(term.key)).map((term) => ({ from: byKey.get(term.key)!, to: stepNodes[index] })),
    ...step.products.filter((term) => byKey.has(term.key)).map((term) => ({ from: stepNodes[index], to: byKey.get(term.key)! })),
  ]);
  return { species, steps: stepNodes, edges };
}
