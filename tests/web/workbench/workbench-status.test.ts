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
