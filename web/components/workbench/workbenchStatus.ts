import type { MechanismAnalysis } from '@api/analysis/analysis.schemas';

export type StatusLevel = 'ok' | 'warning' | 'error';

export interface WorkbenchStatus {
  level: StatusLevel;
  /** "12 steps · balanced · 1 productive route · 2 catalysts". */
  text: string;
  /** The problem in words, beside the icon, so colour is never the only signal. */
  problem: string | null;
}

const plural = (count: number, one: string, many = `${one}s`) => `${count} ${count === 1 ? one : many}`;

/** The workbench's one-line summary of an analysis, with its worst problem named. */
export function workbenchStatus(analysis: MechanismAnalysis): WorkbenchStatus {
  const errors = analysis.diagnostics.filter((d) => d.severity === 'error').length;
  const warnings = analysis.diagnostics.filter((d) => d.severity === 'warning').length;
  const unbalanced = analysis.steps.filter((step) => !step.balanced).length;
  // The overall route is added after the basis when it is a combination of basis routes: it is
  // not a route of its own, so it is not counted (it is counted when the basis has it, or it is direct).
  // A route that runs a one-way step backwards cannot occur as written: it is named, not counted.
  const counted = analysis.routes.filter((route) => route.kind === 'productive' && (route.basis || route.direct));
  const productive = counted.filter((route) => !route.reversesOneWay?.length).length;
  const backwards = counted.length - productive;
  const catalysts = analysis.species.filter((species) => species.role === 'catalyst').length;
  const parts = [
    plural(analysis.steps.length, 'step'),
    unbalanced === 0 ? 'balanced' : `${unbalanced} unbalanced`,
    plural(productive, 'productive route') + (backwards > 0 ? ` (+ ${backwards} that ${backwards === 1 ? 'runs' : 'run'} a one-way step backwards)` : ''),
    plural(catalysts, 'catalyst'),
  ];
  const level: StatusLevel = errors > 0 || unbalanced > 0 ? 'error' : warnings > 0 || productive === 0 ? 'warning' : 'ok';
  const problems = [errors && plural(errors, 'error'), warnings && plural(warnings, 'warning'), productive === 0 && analysis.steps.length > 0 && 'no productive route']
    .filter(Boolean)
    .join(', ');
  return { level, text: parts.join(' · '), problem: problems || null };
}
