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

/** Lines with an error that gave no step: a step line that failed to parse, or a broken directive. */
function linesNotRead(analysis: MechanismAnalysis): number {
  const stepLines = new Set(analysis.steps.map((step) => step.line));
  const unread = new Set<number>();
  for (const diagnostic of analysis.diagnostics) {
    if (diagnostic.severity === 'error' && !stepLines.has(diagnostic.line)) unread.add(diagnostic.line);
  }
  return unread.size;
}

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
  const unread = linesNotRead(analysis);
  // A line that could not be read is no step at all, so the counts and "balanced" would leave it
  // out silently: the status names it instead and claims no balance for the whole text.
  const parts = [
    unread === 0 ? plural(analysis.steps.length, 'step') : `${plural(analysis.steps.length, 'step')} read, ${plural(unread, 'line')} not read`,
    unbalanced > 0 ? `${unbalanced} unbalanced` : unread === 0 ? 'balanced' : null,
    plural(productive, 'productive route') + (backwards > 0 ? ` (+ ${backwards} that ${backwards === 1 ? 'runs' : 'run'} a one-way step backwards)` : ''),
    plural(catalysts, 'catalyst'),
  ];
  const level: StatusLevel = errors > 0 || unbalanced > 0 ? 'error' : warnings > 0 || productive === 0 ? 'warning' : 'ok';
  const problems = [errors && plural(errors, 'error'), warnings && plural(warnings, 'warning'), productive === 0 && analysis.steps.length > 0 && 'no productive route']
    .filter(Boolean)
    .join(', ');
  return { level, text: parts.filter(Boolean).join(' · '), problem: problems || null };
}
