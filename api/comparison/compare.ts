import { diffLines } from 'diff';
import type { AnalysisView } from '../revisions/analysis-view';
import { compareRoles, compareRoutes } from './compare-routes';
import { compareSteps } from './compare-steps';

export interface ComparedRevision {
  number: number;
  source: string;
  analysis: AnalysisView;
}

export interface LineHunk {
  kind: 'same' | 'added' | 'removed';
  fromLine: number | null;
  toLine: number | null;
  lines: string[];
}

/** The source text line by line (the `diff` package), numbered on both sides. */
export function lineDiff(before: string, after: string): LineHunk[] {
  let fromLine = 1;
  let toLine = 1;
  return diffLines(before, after).map((part) => {
    const lines = part.value.replace(/\n$/, '').split('\n');
    const kind = part.added ? 'added' : part.removed ? 'removed' : 'same';
    const hunk: LineHunk = { kind, fromLine: kind === 'added' ? null : fromLine, toLine: kind === 'removed' ? null : toLine, lines };
    if (kind !== 'added') fromLine += part.count;
    if (kind !== 'removed') toLine += part.count;
    return hunk;
  });
}

/**
 * What changed between two revisions, in the mechanism's own terms: steps (matched by label, then
 * by normalised equation), routes and their net reactions, catalysts and intermediates, enthalpies,
 * and the plain line diff of the source.
 */
export function compareRevisions(from: ComparedRevision, to: ComparedRevision) {
  return {
    from: from.number,
    to: to.number,
    steps: compareSteps(from.analysis.steps, to.analysis.steps),
    routes: compareRoutes(from.analysis.routes, to.analysis.routes),
    ...compareRoles(from.analysis, to.analysis),
    lines: lineDiff(from.source, to.source),
  };
}
