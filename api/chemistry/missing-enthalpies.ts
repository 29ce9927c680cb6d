import type { Diagnostic } from '@grammar/diagnostics';
import type { StepJson } from './analysis-types';
import { finding } from './diagnostic-codes';
import type { StepModel } from './step-model';

/**
 * Species without an enthalpy of formation, each with the first step that needed it, gathered step
 * by step. A species is marked on its listed record once noted (a flag read on a record already at
 * hand, where a table of names was one more lookup per missing term on every step of a large text).
 */
export class MissingEnthalpies {
  private readonly keys: string[] = [];
  private firstStep: StepJson | null = null;

  note(step: StepModel, json: StepJson): void {
    for (const key of json.missingEnthalpies) {
      const species = speciesWritten(step, key);
      if (!species || species.enthalpyMissingNoted) continue;
      species.enthalpyMissingNoted = true;
      this.keys.push(key);
      this.firstStep ??= json;
    }
  }

  /** One diagnostic naming them all (the first 20), at the first step that needed one. */
  report(diagnostics: Diagnostic[]): void {
    if (!this.firstStep) return;
    const names = this.keys;
    const shown = names.slice(0, 20).join(', ') + (names.length > 20 ? `, and ${names.length - 20} more` : '');
    diagnostics.push(finding('enthalpy-missing', this.firstStep, `no enthalpy of formation for ${shown}; ΔH of the steps with ${names.length === 1 ? 'it' : 'them'} is left empty`, { found: names[0] }));
  }
}

/** The listed species of a key among the step's terms (a step has a handful). */
function speciesWritten(step: StepModel, key: string) {
  for (const term of step.reactants) if (term.key === key) return term.species;
  for (const term of step.products) if (term.key === key) return term.species;
  return null;
}
