import { stableLabel, type StepView } from '../revisions/analysis-view';

/** Where a remark sits: the step's label (if it has a lasting one), its normalised equation and line. */
export interface StepAnchor {
  label: string | null;
  normalised: string;
  line: number;
}

export const anchorOf = (step: StepView): StepAnchor => ({ label: stableLabel(step), normalised: step.normalised, line: step.line });

/** A step named by its label (`B2`) or by its 1-based position (`#3`). */
export function findStep(steps: readonly StepView[], reference: string): StepView | undefined {
  const position = /^#(\d+)$/.exec(reference);
  if (position) return steps[Number(position[1]) - 1];
  return steps.find((step) => step.label === reference);
}

/**
 * The same step in another revision: the one with the same label first, then the one with the
 * same normalised equation; null when the step no longer exists.
 */
export function followAnchor(anchor: StepAnchor, steps: readonly StepView[]): StepView | null {
  const byLabel = anchor.label ? steps.find((step) => stableLabel(step) === anchor.label) : undefined;
  return byLabel ?? steps.find((step) => step.normalised === anchor.normalised) ?? null;
}

/** The text of a source line, kept with a remark so it still reads sensibly once its step is gone. */
export const lineText = (source: string, line: number) => source.split(/\r?\n/)[line - 1]?.trim() ?? '';
