/** Element counts of one species, or null when its composition is unknown (an opaque name). */
export type Composition = Record<string, number> | null;

export interface ElementDrift {
  element: string;
  initialTotal: number;
  maxRelativeDrift: number;
}

export interface ConservationCheck {
  elements: ElementDrift[];
  /** Largest relative drift over all checked elements (0 when none could be checked). */
  maxRelativeDrift: number;
  /** Elements left out, with why: held by a fixed species, or an unknown composition. */
  skipped: { element: string | null; reason: string }[];
}

function elementsOf(composition: Composition[]): string[] {
  return [...new Set(composition.flatMap((counts) => Object.keys(counts ?? {})))].sort();
}

function total(element: string, composition: Composition[], c: ArrayLike<number>): number {
  let sum = 0;
  composition.forEach((counts, i) => {
    sum += (counts?.[element] ?? 0) * c[i];
  });
  return sum;
}

function driftOf(element: string, composition: Composition[], states: ArrayLike<number>[]): ElementDrift {
  const initialTotal = total(element, composition, states[0]);
  let largest = 0;
  for (const state of states) largest = Math.max(largest, Math.abs(total(element, composition, state) - initialTotal));
  return { element, initialTotal, maxRelativeDrift: initialTotal === 0 ? largest : largest / initialTotal };
}

/**
 * Element totals Σ_i n_ie c_i(t) over a run, reported as the largest relative change from the
 * start. Balanced steps conserve every element, so the drift measures the solver's error (and
 * clipping). Elements carried by a fixed species are open (the clamp adds or removes them) and are
 * skipped; nothing is checked when a species' composition is unknown.
 */
export function checkElementConservation(composition: Composition[], fixed: Uint8Array, states: ArrayLike<number>[]): ConservationCheck {
  const unknown = composition.flatMap((counts, i) => (counts === null ? [i] : []));
  if (unknown.length > 0 || states.length === 0) {
    const reason = states.length === 0 ? 'no states' : `composition unknown for species #${unknown.join(', #')}`;
    return { elements: [], maxRelativeDrift: 0, skipped: [{ element: null, reason }] };
  }
  const open = new Set(composition.flatMap((counts, i) => (fixed[i] ? Object.keys(counts ?? {}) : [])));
  const checked = elementsOf(composition).filter((element) => !open.has(element));
  const elements = checked.map((element) => driftOf(element, composition, states));
  return {
    elements,
    maxRelativeDrift: elements.reduce((largest, drift) => Math.max(largest, drift.maxRelativeDrift), 0),
    skipped: [...open].sort().map((element) => ({ element, reason: 'carried by a fixed species' })),
  };
}
