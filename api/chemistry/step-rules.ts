import type { Diagnostic } from '@grammar/diagnostics';
import { finding } from './diagnostic-codes';
import { flatText } from './flat-text';
import { isAside } from './species-model';
import { termsOf, type StepModel, type StepTerm } from './step-model';

/** The step's class from the change in radical count (analysis.md, "Steps"). */
export type StepClass = 'initiation' | 'propagation' | 'branching' | 'termination' | 'non-radical';

function radicalCount(terms: readonly StepTerm[]): number {
  let count = 0;
  for (const term of terms) if (term.species.radical) count += term.coef;
  return count;
}

/** Class of a step and its radical counts before and after. */
export function classify(step: StepModel): { stepClass: StepClass; before: number; after: number } {
  const before = radicalCount(step.reactants);
  const after = radicalCount(step.products);
  let stepClass: StepClass;
  if (before === 0 && after === 0) stepClass = 'non-radical';
  else if (before === 0) stepClass = 'initiation';
  else if (after === before) stepClass = 'propagation';
  else stepClass = after > before ? 'branching' : 'termination';
  return { stepClass, before, after };
}

/** Reactant particles including M, excluding the photon. */
export function molecularity(step: StepModel): number {
  let count = 0;
  for (const term of step.reactants) if (term.species.kind !== 'photon') count += term.coef;
  return count;
}

/** Integer coefficients and molecularity ≤ 3. */
export function isElementary(step: StepModel): boolean {
  return step.wholeCoefficients && molecularity(step) <= 3;
}

function thirdBodyCount(terms: readonly StepTerm[]): number {
  const term = terms.find((t) => t.species.kind === 'third-body');
  return term ? term.coef : 0;
}

function sameTermOn(terms: readonly StepTerm[], wanted: StepTerm): boolean {
  for (const term of terms) if (term.key === wanted.key && term.coef === wanted.coef) return true;
  return false;
}

/** Every species (hν and M aside) has the same amount on both sides: running the step changes nothing. */
export function changesNothing(step: StepModel): boolean {
  let count = 0;
  for (const term of step.reactants) {
    if (isAside(term.species)) continue;
    if (!sameTermOn(step.products, term)) return false;
    count += 1;
  }
  let productCount = 0;
  for (const term of step.products) if (!isAside(term.species)) productCount += 1;
  return count === productCount;
}

/** The photon, third-body, molecularity and lumping rules of one step, and a step that changes nothing. */
export function checkStepRules(step: StepModel, diagnostics: Diagnostic[]): void {
  if (changesNothing(step)) {
    diagnostics.push(finding('step-changes-nothing', step, `step ${step.id} changes nothing: every species has the same amount on both sides`));
  }
  const photon = step.productPhoton;
  if (photon) diagnostics.push(finding('photon-on-product-side', photon, `hν may only be a reactant (step ${step.id}); light given off is not part of the balance`, { found: photon.text }));
  if (step.reversible && !photon) {
    const light = step.reactants.find((term) => term.species.kind === 'photon');
    if (light) diagnostics.push(finding('reversible-photolysis', step, `step ${step.id} absorbs hν but is reversible, so its reverse would give off light; write -> and the back reaction as a step of its own`, { found: '⇌', expected: ['->'] }));
  }
  const before = thirdBodyCount(step.reactants);
  const after = thirdBodyCount(step.products);
  if (before !== after || before > 1) {
    const message = `M must appear once on each side (step ${step.id} has ${before} on the left and ${after} on the right)`;
    diagnostics.push(finding('third-body-unpaired', step, message, { found: `${before} M → ${after} M`, expected: ['M on both sides, once each'] }));
  }
  const count = molecularity(step);
  if (count > 3) diagnostics.push(finding('molecularity-above-three', step, `step ${step.id} has ${count} reactant particles; an elementary step has at most 3`));
  if (step.wholeCoefficients) return;
  const lumped = termsOf(step).filter((term) => !term.fraction.isInteger());
  const listed = lumped.map((term) => `${term.coefText} ${term.species.key}`).join(', ');
  diagnostics.push(finding('not-elementary', step, `step ${step.id} has non-integer coefficients (${listed}): a lumped step, not elementary`));
}

// The note's text, one per class and radical counts: the note sits on its step's line, so the text
// needs no step id and is shared (a large mechanism has tens of thousands of these notes).
const classNotes = new Map<StepClass, Map<number, Map<number, string>>>();
const MAX_CLASS_NOTES = 1_000;
let classNoteCount = 0;

function classNote(stepClass: StepClass, before: number, after: number): string {
  if (classNoteCount >= MAX_CLASS_NOTES) {
    classNotes.clear(); // odd coefficients can make many counts; the texts are cheap to make again
    classNoteCount = 0;
  }
  let byBefore = classNotes.get(stepClass);
  if (!byBefore) classNotes.set(stepClass, (byBefore = new Map()));
  let byAfter = byBefore.get(before);
  if (!byAfter) byBefore.set(before, (byAfter = new Map()));
  let note = byAfter.get(after);
  if (note === undefined) {
    note = flatText(stepClass === 'initiation' ? 'an ' : 'a ', stepClass, ' step: radicals ', before, ' → ', after);
    byAfter.set(after, note);
    classNoteCount += 1;
  }
  return note;
}

/** Reports steps that start, branch or end radical chains. */
export function reportClass(step: StepModel, diagnostics: Diagnostic[]): StepClass {
  const { stepClass, before, after } = classify(step);
  if (stepClass === 'initiation' || stepClass === 'branching' || stepClass === 'termination') {
    diagnostics.push(finding('step-class', step, classNote(stepClass, before, after)));
  }
  return stepClass;
}
