import { describe, expect, it } from 'vitest';
import { analyseMechanism } from '@api/chemistry/analyse';
import { generateMechanism } from '../../examples/generate-large';

describe('examples/generate-large.ts', () => {
  it.each([1, 50, 300, 2_000])('makes exactly %i balanced, error-free steps', (count) => {
    const analysis = analyseMechanism(generateMechanism(count));
    expect(analysis.steps).toHaveLength(count);
    expect(analysis.steps.every((step) => step.balanced)).toBe(true);
    expect(analysis.diagnostics.filter((item) => item.severity === 'error')).toEqual([]);
  });

  it('gives the route-analysis case of the bench: 300 steps, about 200 species, exact routes', () => {
    const analysis = analyseMechanism(generateMechanism(300, 40));
    expect(analysis.species.length).toBeGreaterThanOrEqual(200);
    expect(analysis.routes.length).toBeGreaterThan(0);
    expect(analysis.diagnostics.map((item) => item.code)).toContain('direct-routes-skipped');
    // Direct routes were not listed, so no route is said to be direct or not.
    expect(new Set(analysis.routes.map((route) => route.direct))).toEqual(new Set([null]));
  });
});
