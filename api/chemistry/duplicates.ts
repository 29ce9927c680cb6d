import type { Diagnostic } from '@grammar/diagnostics';
import { finding } from './diagnostic-codes';
import { normalisedText } from './equation-format';
import type { StepModel } from './step-model';

/** The canonical equation of a step (see equation-format.ts). */
export function normalisedStep(step: StepModel): string {
  return normalisedText(step.reactants, step.products, step.reversible);
}

/** Finds a label used twice and a step written twice (a reversible step also matches its reverse), step by step as they are read. */
export class DuplicateSteps {
  private readonly labels = new Map<string, StepModel>();
  private readonly equations = new Map<string, StepModel>();

  constructor(private readonly diagnostics: Diagnostic[]) {}

  add(step: StepModel, normalised: string): void {
    if (step.label) {
      // A labelled step starts at its label, so the step's place is the label's.
      const first = this.labels.get(step.label);
      if (first) this.diagnostics.push(finding('duplicate-label', step, `label ${step.label} is already used on line ${first.line}`, { found: step.label }));
      else this.labels.set(step.label, step);
    }
    const reverse = step.reversible ? normalisedText(step.products, step.reactants, true) : null;
    const first = this.equations.get(normalised) ?? (reverse ? this.equations.get(reverse) : undefined);
    if (first) {
      const message = `step ${step.id} repeats step ${first.id} (line ${first.line})`;
      this.diagnostics.push(finding('duplicate-step', step, message, { found: normalised }));
    } else this.equations.set(normalised, step);
  }
}
