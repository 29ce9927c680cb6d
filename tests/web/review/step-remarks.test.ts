import { describe, expect, it } from 'vitest';
import { describeTimeline, namesIn } from '@web/components/review/roundTimeline';
import { placeRemarks } from '@web/composables/useStepRemarks';
import { analysedAsJson as analyse, demoRemark, demoRound, NOX_SOURCE as source } from './review-fixtures';


describe('placeRemarks', () => {
  it('puts a labelled remark on its step and that step\'s line in the text on screen', () => {
    const edited = `# a new first line\n${source}`;
    const analysis = analyse(edited);
    const placed = placeRemarks([demoRemark()], analysis);
    const n1 = analysis.steps.find((step) => step.id === 'N1')!;
    expect(placed.byStep.get('N1')).toHaveLength(1);
    expect(placed.byLine.get(n1.line)).toHaveLength(1);
    expect(n1.line).toBe(11);
  });

  it('finds an unlabelled step by its normalised equation and files it under #n', () => {
    const unlabelled = 'O3 + hν -> O2 + O(3P)\nNO• + O3 -> NO2• + O2\n';
    const analysis = analyse(unlabelled);
    const step = analysis.steps[1];
    const placed = placeRemarks([demoRemark({ stepLabel: null, stepNormalised: step.normalised })], analysis);
    expect([...placed.byStep.keys()]).toEqual(['#2']);
    expect([...placed.byLine.keys()]).toEqual([2]);
  });

  it('leaves out remarks that no longer match and remarks whose step left the text', () => {
    const analysis = analyse(source.replace(/^N1:.*\n/m, ''));
    const placed = placeRemarks([demoRemark(), demoRemark({ id: 30, matching: false, stepLabel: 'C1' })], analysis);
    expect(placed.byStep.size).toBe(0);
    expect(placed.byLine.size).toBe(0);
  });

  it('uses the saved anchor while there is no analysis yet', () => {
    const placed = placeRemarks([demoRemark()], null);
    expect([...placed.byStep.keys()]).toEqual(['N1']);
    expect([...placed.byLine.keys()]).toEqual([10]);
  });
});

describe('describeTimeline', () => {
  it('says who did what, naming people from the round', () => {
    const round = demoRound();
    const names = new Map([...namesIn(round), [1, 'Rosalind Samphire'], [4, 'Anouk Spartina']]);
    const lines = describeTimeline(
      [...round.timeline, { id: 3, actorId: 2, action: 'round.state-changed', details: { from: 'open', to: 'revise-requested', reason: 'verdict revise' }, createdAt: '2026-11-21T09:00:00.000Z' }],
      names,
    );
    expect(lines.map((line) => line.text)).toEqual([
      'Rosalind Samphire opened the round on r1',
      'Anouk Spartina assigned Kofi Glasswort as reviewer',
      'Kofi Glasswort moved the round from open to revise requested (verdict revise)',
    ]);
  });

  it('names the curator who adopted, not only the states', () => {
    const adopted = { id: 9, actorId: 4, action: 'round.state-changed', details: { from: 'endorsed', to: 'adopted', revision: 2 }, createdAt: '2026-11-22T09:00:00.000Z' };
    const [line] = describeTimeline([adopted], new Map([[4, 'Anouk Spartina']]));
    expect(line.text).toBe('Anouk Spartina moved the round from endorsed to adopted');
  });
});
