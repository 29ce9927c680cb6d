import { stableLabel, type StepTerm, type StepView } from '../revisions/analysis-view';

export interface StepRef {
  label: string | null;
  line: number;
  equation: string;
}

export interface Change<T> {
  from: T;
  to: T;
}

export interface StepChange {
  from: StepRef;
  to: StepRef;
  matchedBy: 'label' | 'equation';
  stoichiometry?: Change<string>;
  rate?: Change<string | null>;
  label?: Change<string | null>;
  dH?: Change<number | null>;
}

export interface StepComparison {
  added: StepRef[];
  removed: StepRef[];
  changed: StepChange[];
  unchanged: number;
}

/** Enthalpies are sums of floats: equal within a millijoule per mole is the same. */
export const sameEnthalpy = (a: number | null, b: number | null) =>
  a === null || b === null ? a === b : Math.abs(a - b) < 1e-6;

const ref = (step: StepView): StepRef => ({ label: step.label, line: step.line, equation: step.equation });
const side = (terms: StepTerm[]) => terms.map((t) => `${t.coefText ?? t.coef} ${t.key}`).sort().join(' + ');
const stoichiometry = (step: StepView) => `${side(step.reactants)} → ${side(step.products)}`;
const rateText = (step: StepView) => (step.rate ? [step.rate.forward, step.rate.reverse].filter(Boolean).join(' | ') : null);

/** Pairs steps: the same lasting label first, then, among the rest, the same normalised equation. */
export function pairSteps(before: readonly StepView[], after: readonly StepView[]) {
  const pairs: Array<{ a: StepView; b: StepView; matchedBy: 'label' | 'equation' }> = [];
  const freeB = new Set(after);
  const unpairedA: StepView[] = [];
  for (const a of before) {
    const label = stableLabel(a);
    const b = label ? [...freeB].find((step) => stableLabel(step) === label) : undefined;
    if (b) {
      pairs.push({ a, b, matchedBy: 'label' });
      freeB.delete(b);
    } else unpairedA.push(a);
  }
  const removed: StepView[] = [];
  for (const a of unpairedA) {
    const b = [...freeB].find((step) => step.normalised === a.normalised);
    if (b) {
      pairs.push({ a, b, matchedBy: 'equation' });
      freeB.delete(b);
    } else removed.push(a);
  }
  return { pairs, removed, added: after.filter((step) => freeB.has(step)) };
}

function describeChange(a: StepView, b: StepView, matchedBy: 'label' | 'equation'): StepChange | null {
  const change: StepChange = { from: ref(a), to: ref(b), matchedBy };
  if (stoichiometry(a) !== stoichiometry(b)) change.stoichiometry = { from: a.equation, to: b.equation };
  if (rateText(a) !== rateText(b)) change.rate = { from: rateText(a), to: rateText(b) };
  if (a.label !== b.label) change.label = { from: a.label, to: b.label };
  if (!sameEnthalpy(a.dH, b.dH)) change.dH = { from: a.dH, to: b.dH };
  return Object.keys(change).length > 3 ? change : null;
}

/** Steps added, removed and changed (stoichiometry, rate expression, label, ΔH) between two revisions. */
export function compareSteps(before: readonly StepView[], after: readonly StepView[]): StepComparison {
  const { pairs, removed, added } = pairSteps(before, after);
  const changed = pairs.map((p) => describeChange(p.a, p.b, p.matchedBy)).filter((c): c is StepChange => c !== null);
  return { added: added.map(ref), removed: removed.map(ref), changed, unchanged: pairs.length - changed.length };
}
