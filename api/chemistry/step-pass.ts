import type { StepNode } from '@grammar/ast';
import type { Diagnostic } from '@grammar/diagnostics';
import type { StepJson } from './analysis-types';
import { DuplicateSteps } from './duplicates';
import { MissingEnthalpies } from './missing-enthalpies';
import type { SpeciesRegistry } from './species-registry';
import { buildStep, type StepModel } from './step-model';
import { reportStep } from './step-report';
import type { EnthalpyLookup } from './thermo';

/**
 * The steps of a text: each is built as soon as its line is read (`add`); once all are read,
 * `finish` checks and reports them, looks for duplicates and notes missing enthalpies in one pass.
 * Reports wait for the last line because a fix for an unbalanced step may use any species of the
 * text. (Reporting each step as it is read was measured: the collector then took longer.)
 */
export class StepPass {
  readonly steps: StepModel[] = [];
  readonly json: StepJson[] = [];
  readonly missingEnthalpies = new MissingEnthalpies();
  private readonly duplicates: DuplicateSteps;
  /** Counts every well-formed step line, built or not (the id of a step without a label). */
  private position = 0;

  constructor(
    private readonly registry: SpeciesRegistry,
    private readonly lookup: EnthalpyLookup,
    private readonly diagnostics: Diagnostic[],
  ) {
    this.duplicates = new DuplicateSteps(diagnostics);
  }

  readonly add = (node: StepNode): void => {
    this.position += 1;
    const step = buildStep(node, this.position, this.registry, this.diagnostics);
    if (!step) return;
    step.index = this.steps.length;
    this.steps.push(step);
  };

  /** Checks and reports every step, once every species is known. */
  finish(): void {
    const candidates = this.registry.all();
    for (const step of this.steps) {
      const json = reportStep(step, this.lookup, candidates, this.diagnostics);
      this.json.push(json);
      this.duplicates.add(step, json.normalised);
      this.missingEnthalpies.note(step, json);
    }
  }
}
