import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { compareSteps } from '@api/comparison/compare-steps';
import { analyseSource } from '@api/revisions/analyse-source';
import { signedInAgent, type CsrfAgent } from '../helpers/agent';
import { BROMINE_R1, BROMINE_R2, startReviewApp, WHO, type ReviewApp } from './review-helpers';

const stepsOf = (source: string) => analyseSource(source).analysis.steps;

describe('compareSteps', () => {
  it('matches by label first: a changed equation under the same label is a stoichiometry change', () => {
    const before = stepsOf('A1: O3 + hν -> O2 + O(1D) @ 1e-5\n');
    const after = stepsOf('A1: O3 + hν -> O2 + O(3P) @ 1e-5\n');
    const result = compareSteps(before, after);
    expect(result.changed).toHaveLength(1);
    expect(result.changed[0]).toMatchObject({ matchedBy: 'label', stoichiometry: { from: before[0].equation, to: after[0].equation } });
    expect(result.changed[0].rate).toBeUndefined();
  });

  it('then by normalised equation: a renamed step is a label change, not a removal and an addition', () => {
    const result = compareSteps(stepsOf('X1: Cl• + O3 -> ClO• + O2 @ 2.3e-11\n'), stepsOf('C1: O3 + Cl. -> O2 + ClO• @ 2.3e-11 * exp(-200 / T)\n'));
    expect(result).toMatchObject({ added: [], removed: [], unchanged: 0 });
    expect(result.changed[0]).toMatchObject({
      matchedBy: 'equation', label: { from: 'X1', to: 'C1' }, rate: { from: '2.3e-11', to: '2.3e-11 * exp(-200 / T)' },
    });
    expect(result.changed[0].stoichiometry).toBeUndefined();
  });

  it('matches unlabelled steps by their equation only, whatever their position', () => {
    const result = compareSteps(stepsOf('NO + O3 -> NO2 + O2\nNO2 + hν -> NO + O(3P)\n'), stepsOf('NO2 + hν -> NO + O(3P)\nNO + O3 -> NO2 + O2\nO(3P) + O2 + M -> O3 + M\n'));
    expect(result.unchanged).toBe(2);
    expect(result.added.map((s) => s.equation)).toHaveLength(1);
    expect(result.removed).toEqual([]);
  });
});

describe('GET /api/mechanisms/:slug/compare', () => {
  let t: ReviewApp;
  let owner: CsrfAgent;
  beforeAll(async () => {
    t = await startReviewApp();
    owner = await signedInAgent(t.url, WHO.owner);
    await owner.post('/api/mechanisms', { title: 'Salt-lake bromine cycle', source: BROMINE_R1 });
    await owner.post('/api/mechanisms/salt-lake-bromine-cycle/revisions', { base: 1, source: BROMINE_R2 });
  });
  afterAll(async () => t.close());

  it('reports steps, species and the line diff between r1 and r2', async () => {
    const res = await owner.get('/api/mechanisms/salt-lake-bromine-cycle/compare?from=1&to=2');
    expect(res.status).toBe(200);
    const { steps, species, catalysts, lines } = res.body;
    expect(steps.removed.map((s: { label: string }) => s.label)).toEqual(['B5']);
    expect(steps.added).toEqual([]);
    expect(steps.changed).toEqual([
      expect.objectContaining({ matchedBy: 'label', from: expect.objectContaining({ label: 'B1', line: 4 }), to: expect.objectContaining({ label: 'B1', line: 5 }),
        rate: { from: '1.7e-11 * exp(-800 / T)', to: '1.6e-11 * exp(-780 / T)' } }),
    ]);
    expect(steps.unchanged).toBe(3);
    expect(species.removed).toEqual(['Br2']);
    expect(catalysts).toEqual({ added: [], removed: [] });
    const added = lines.filter((h: { kind: string }) => h.kind === 'added').flatMap((h: { lines: string[] }) => h.lines);
    const removed = lines.filter((h: { kind: string }) => h.kind === 'removed').flatMap((h: { lines: string[] }) => h.lines);
    expect(added).toEqual(['# B1 rate re-fitted to the field-station chamber runs', expect.stringContaining('1.6e-11')]);
    expect(removed).toEqual([expect.stringContaining('1.7e-11'), expect.stringContaining('B5: Br2')]);
  });

  it('lists the history with counts taken from each stored analysis', async () => {
    const history = (await owner.get('/api/mechanisms/salt-lake-bromine-cycle/revisions')).body;
    expect(history.map((r: { number: number; stepCount: number; errorCount: number }) => [r.number, r.stepCount, r.errorCount])).toEqual([[1, 5, 0], [2, 4, 0]]);
  });

  it('reports the routes that change when a step enters', async () => {
    const r3 = `${BROMINE_R2}B6: BrO• + O(3P) -> Br• + O2   @ 1.9e-11\n`;
    await owner.post('/api/mechanisms/salt-lake-bromine-cycle/revisions', { base: 2, source: r3 });
    const res = await owner.get('/api/mechanisms/salt-lake-bromine-cycle/compare?from=2&to=3');
    expect(res.body.steps.added.map((s: { label: string }) => s.label)).toEqual(['B6']);
    const newRoutes = res.body.routes.added.map((r: { steps: string[] }) => r.steps);
    expect(newRoutes.some((steps: string[]) => steps.includes('B6'))).toBe(true);
    // The direct route B1×2 + B2 (net 2 O3 → 3 O2) is untouched by the new step.
    expect(res.body.routes.removed.map((r: { steps: string[] }) => r.steps.join(','))).not.toContain('B1,B2');
  });
});
