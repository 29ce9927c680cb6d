import type { Diagnostic } from '@grammar/diagnostics';
import { finding } from './diagnostic-codes';
import { normalisedText } from './equation-format';
import type { StepModel } from './step-model';

/** The canonical equation of a step (see equation-format.ts). */
export function normalisedStep(step: StepModel): string {
  return normalisedText(step.reactants, step.products, step.reversible);
}

/** Reports a label used twice and a step written twice (a reversible step also matches its reverse). */
export function reportDuplicates(steps: readonly StepModel[], normalised: readonly string[], diagnostics: Diagnostic[]): void {
  const labels = new Map<string, StepModel>();
  const equations = new Map<string, StepModel>();
  steps.forEach((step, index) => {
    if (step.label && step.source.label) {
      const first = labels.get(step.label);
      if (first) diagnostics.push(finding('duplicate-label', step.source.label, `label ${step.label} is already used on line ${first.source.line}`, { found: step.label }));
      else labels.set(step.label, step);
    }
    const reverse = step.reversible ? normalisedText(step.products, step.reactants, true) : null;
    const first = equations.get(normalised[index]) ?? (reverse ? equations.get(reverse) : undefined);
    if (first) {
      const message = `step ${step.id} repeats step ${first.id} (line ${first.source.line})`;
      diagnostics.push(finding('duplicate-step', step.source, message, { found: normalised[index] }));
    } else equations.set(normalised[index], step);
  });
}
