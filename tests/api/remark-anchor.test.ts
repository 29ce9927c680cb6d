import { describe, expect, it } from 'vitest';
import { analyseSource } from '@api/revisions/analyse-source';
import { anchorOf, findStep, followAnchor } from '@api/reviews/remark-anchor';
import { stateFromVerdicts, type Verdict } from '@api/reviews/round-state';

const stepsOf = (source: string) => analyseSource(source).analysis.steps;

describe('followAnchor', () => {
  const before = stepsOf('C1: Cl• + O3 -> ClO• + O2\nClO• + O(3P) -> Cl• + O2\n');

  it('follows a labelled step by its label, even when its equation changed', () => {
    const after = stepsOf('# moved down\nC1: Cl• + O3 -> ClO• + O2(a1Δg)\n');
    expect(followAnchor(anchorOf(before[0]), after)).toMatchObject({ label: 'C1', line: 2 });
  });

  it('follows a step whose label went away by its normalised equation', () => {
    const after = stepsOf('C7: O3 + Cl. -> O2 + ClO•\n');
    expect(followAnchor(anchorOf(before[0]), after)).toMatchObject({ label: 'C7', line: 1 });
  });

  it('follows an unlabelled step by its equation only, and finds nothing when the step is gone', () => {
    const unlabelled = findStep(before, '#2')!;
    expect(anchorOf(unlabelled).label).toBeNull();
    expect(followAnchor(anchorOf(unlabelled), stepsOf('X: Cl• + O3 -> ClO• + O2\nO(3P) + ClO• -> O2 + Cl•\n'))).toMatchObject({ line: 2 });
    expect(followAnchor(anchorOf(unlabelled), stepsOf('C1: Cl• + O3 -> ClO• + O2\n'))).toBeNull();
  });
});

describe('stateFromVerdicts (two endorsements needed)', () => {
  it.each<[Verdict[], string]>([
    [[], 'open'],
    [['endorse'], 'open'],
    [['endorse', 'endorse'], 'endorsed'],
    [['endorse', 'revise'], 'revise-requested'],
    [['endorse', 'endorse', 'revise'], 'revise-requested'],
    [['revise', 'decline'], 'declined'],
  ])('%j → %s', (verdicts, state) => {
    expect(stateFromVerdicts(verdicts, 2)).toBe(state);
  });
});
