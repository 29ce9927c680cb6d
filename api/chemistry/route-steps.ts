import type { Diagnostic } from '@grammar/diagnostics';
import { finding, type DiagnosticCode } from './diagnostic-codes';
import type { StepModel } from './step-model';

/**
 * Errors that make a step's stoichiometry untrustworthy: a route through a step that does not
 * conserve its atoms would have a net reaction that does not either, and a misplaced hν or M
 * would show up as light given off or a third body used up. Such steps are left out of the
 * routes (every other check still reads them). A rate that cannot be evaluated changes nothing
 * in the stoichiometry, so it does not count here.
 */
const STOICHIOMETRY_ERRORS: ReadonlySet<DiagnosticCode> = new Set<DiagnosticCode>([
  'element-imbalance',
  'charge-imbalance',
  'site-imbalance',
  'photon-on-product-side',
  'third-body-unpaired',
  'duplicate-label',
]);

/**
 * The steps routes are built from: every step without a stoichiometry error (a step is one
 * line, so its errors are the ones on its line). The rest are named in one diagnostic.
 */
export function stepsForRoutes(steps: readonly StepModel[], diagnostics: Diagnostic[]): StepModel[] {
  const faultyLines = new Set<number>();
  for (const item of diagnostics) if (STOICHIOMETRY_ERRORS.has(item.code as DiagnosticCode)) faultyLines.add(item.line);
  if (faultyLines.size === 0) return steps.slice();
  const kept: StepModel[] = [];
  const left: StepModel[] = [];
  for (const step of steps) (faultyLines.has(step.line) ? left : kept).push(step);
  if (left.length > 0) {
    const names = left.map((step) => `${step.id} (line ${step.line})`).join(', ');
    const message = `${left.length === 1 ? 'step' : 'steps'} ${names} ${left.length === 1 ? 'is' : 'are'} left out of the routes until ${left.length === 1 ? 'its errors are' : 'their errors are'} fixed: a route through ${left.length === 1 ? 'it' : 'them'} would not conserve atoms, charge, sites, light or third bodies`;
    diagnostics.push(finding('steps-left-out-of-routes', left[0], message));
  }
  return kept;
}
