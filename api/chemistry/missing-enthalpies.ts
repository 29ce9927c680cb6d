import type { Diagnostic } from '@grammar/diagnostics';
import type { StepJson } from './analysis-types';
import { finding } from './diagnostic-codes';

/** Species without an enthalpy of formation, each with the first step that needed it, gathered step by step. */
export class MissingEnthalpies {
  private readonly firstStep = new Map<string, StepJson>();

  note(step: StepJson): void {
    for (const key of step.missingEnthalpies) if (!this.firstStep.has(key)) this.firstStep.set(key, step);
  }

  /** One diagnostic naming them all (the first 20), at the first step that needed one. */
  report(diagnostics: Diagnostic[]): void {
    if (this.firstStep.size === 0) return;
    const [firstKey, firstStep] = [...this.firstStep][0];
    const names = [...this.firstStep.keys()];
    const shown = names.slice(0, 20).join(', ') + (names.length > 20 ? `, and ${names.length - 20} more` : '');
    diagnostics.push(finding('enthalpy-missing', firstStep, `no enthalpy of formation for ${shown}; ΔH of the steps with them is left empty`, { found: firstKey }));
  }
}
