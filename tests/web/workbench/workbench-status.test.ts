import { describe, expect, it } from 'vitest';
import type { MechanismAnalysis } from '@api/analysis/analysis.schemas';
import { workbenchStatus } from '@web/components/workbench/workbenchStatus';
import saltLake from '../../../examples/salt-lake-bromine.json';
import hydrogenBromine from '../../../examples/hydrogen-bromine-chain.json';
import faulty from '../../../examples/faulty.json';

const asAnalysis = (json: unknown) => json as MechanismAnalysis;

describe('workbench status line', () => {
  it('counts the productive routes of the basis, not the overall route added after it', () => {
    // Salt-lake cycle: basis = one catalytic route (2 O3 → 3 O2) and one null cycle; the overall route combines them.
    const status = workbenchStatus(asAnalysis(saltLake));
    expect(status.text).toBe('5 steps · balanced · 1 productive route · 1 catalyst');
    expect(status.level).toBe('ok');
  });

  it('counts one productive route for the hydrogen–bromine chain (H2 + Br2 → 2 HBr) and its two null cycles', () => {
    expect(workbenchStatus(asAnalysis(hydrogenBromine)).text).toMatch(/· 1 productive route ·/);
  });

  it('never says "balanced" while a line could not be read, and counts that line', () => {
    // A4: Xq + O3 -> O2 among the cycle's steps: the engine gives no step for it, only an error at its line.
    const analysis = structuredClone(asAnalysis(saltLake));
    analysis.diagnostics.push({ severity: 'error', line: 11, column: 5, code: 'unknown-element', message: 'Xq is not an element symbol' } as never);
    const status = workbenchStatus(analysis);
    expect(status.text).toBe('5 steps read, 1 line not read · 1 productive route · 1 catalyst');
    expect(status.text).not.toContain('balanced');
    expect(status.level).toBe('error');
    expect(status.problem).toBe('1 error');
  });

  it('does not count an error on a line that was read as a step as a line not read', () => {
    const analysis = structuredClone(asAnalysis(saltLake));
    analysis.diagnostics.push({ severity: 'error', line: 7, column: 30, code: 'rate-negative', message: 'the rate is negative' } as never);
    expect(workbenchStatus(analysis).text).toBe('5 steps · balanced · 1 productive route · 1 catalyst');
  });

  it('names errors beside the icon for a faulty text', () => {
    const status = workbenchStatus(asAnalysis(faulty));
    expect(status.level).toBe('error');
    expect(status.problem).toMatch(/\d+ errors?/);
  });

  it('does not count a route that runs a one-way step backwards, and says there is one', () => {
    const analysis = structuredClone(asAnalysis(saltLake));
    analysis.routes = [{ ...analysis.routes[0], reversesOneWay: ['B1'] }];
    analysis.overall = null;
    const status = workbenchStatus(analysis);
    expect(status.text).toMatch(/· 0 productive routes \(\+ 1 that runs a one-way step backwards\) ·/);
    expect(status.problem).toContain('no productive route');
  });

  it('counts a productive overall route that is itself in the basis once', () => {
    const analysis = structuredClone(asAnalysis(saltLake));
    analysis.routes = [analysis.routes[0]];
    analysis.overall = 0;
    expect(workbenchStatus(analysis).text).toMatch(/· 1 productive route ·/);
  });
});
