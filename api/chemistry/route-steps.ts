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
const STOICHIOMETRY_ERRORS: ReadonlyMap<DiagnosticCode, string> = new Map<DiagnosticCode, string>([
  ['element-imbalance', 'atoms'],
  ['charge-imbalance', 'charge'],
  ['site-imbalance', 'surface sites'],
  ['photon-on-product-side', 'light'],
  ['third-body-unpaired', 'third bodies'],
]);

/** Why a route through the left-out steps could not be trusted, in the order the reasons were met. */
function reasons(found: ReadonlySet<string>, sharedLabel: boolean): string {
  const conserved = [...found];
  const parts: string[] = [];
  if (conserved.length > 0) {
    const list = conserved.length === 1 ? conserved[0] : `${conserved.slice(0, -1).join(', ')} or ${conserved[conserved.length - 1]}`;
    parts.push(`would not conserve ${list}`);
  }
  if (sharedLabel) parts.push('would name two steps by one label');
  return parts.join(', and ');
}

/**
 * The steps routes are built from: every step without a stoichiometry error (a step is one
 * line, so its errors are the ones on its line). The rest are named in one diagnostic.
 */
export function stepsForRoutes(steps: readonly StepModel[], diagnostics: Diagnostic[]): StepModel[] {
  const faultyLines = new Set<number>();
  const found = new Set<string>();
  let sharedLabel = false;
  for (const item of diagnostics) {
    const reason = STOICHIOMETRY_ERRORS.get(item.code as DiagnosticCode);
    if (reason) found.add(reason);
    else if (item.code === 'duplicate-label') sharedLabel = true;
    else continue;
    faultyLines.add(item.line);
  }
  if (faultyLines.size === 0) return steps.slice();
  const kept: StepModel[] = [];
  const left: StepModel[] = [];
  for (const step of steps) (faultyLines.has(step.line) ? left : kept).push(step);
  if (left.length > 0) {
    const names = left.map((step) => `${step.id} (line ${step.line})`).join(', ');
    const message = `${left.length === 1 ? 'step' : 'steps'} ${names} ${left.length === 1 ? 'is' : 'are'} left out of the routes until ${left.length === 1 ? 'its errors are' : 'their errors are'} fixed: a route through ${left.length === 1 ? 'it' : 'them'} ${reasons(found, sharedLabel)}`;
    diagnostics.push(finding('steps-left-out-of-routes', left[0], message));
  }
  return kept;
}
