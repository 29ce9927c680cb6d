import { describe, expect, it } from 'vitest';
import type { SimulationResult } from '@api/simulations/simulations.schemas';
import { edgeWidth, stepFluxesOf, WIDTH } from '@web/components/workbench/network/networkFlux';
import { networkSvg, type SvgNode } from '@web/components/workbench/network/networkSvg';

function resultWith(times: number[], stepRates: number[][], steps: string[]): SimulationResult {
  return { times, stepRates, steps } as unknown as SimulationResult;
}

describe('stepFluxesOf', () => {
  it('averages |rate| over time by the trapezoid rule, so a log grid is weighed by time', () => {
    // r(t) = t on [0, 10] averages to 5 (the mean of a linear function, common practice), sampled unevenly.
    const times = [0, 0.1, 1, 10];
    const result = resultWith(times, times.map((t) => [t, -2]), ['A1', 'A2']);
    const fluxes = stepFluxesOf(result)!;
    expect(fluxes.byStep.get('A1')).toBeCloseTo(5, 12);
    expect(fluxes.byStep.get('A2')).toBe(2);
    expect(fluxes.max).toBeCloseTo(5, 12);
  });

  it('gives nothing for a missing or all-zero result', () => {
    expect(stepFluxesOf(null)).toBeNull();
    expect(stepFluxesOf(resultWith([0, 1], [[0], [0]], ['A1']))).toBeNull();
  });
});

describe('edgeWidth', () => {
  it('keeps route widths without fluxes and clamps fluxes to six decades', () => {
    expect(edgeWidth({ flux: null, maxFlux: null, inRoute: true, inCycle: true })).toBe(WIDTH.cycle);
    expect(edgeWidth({ flux: null, maxFlux: null, inRoute: true, inCycle: false })).toBe(WIDTH.route);
    expect(edgeWidth({ flux: 1e-20, maxFlux: 1, inRoute: false, inCycle: false })).toBe(WIDTH.fluxMin);
    expect(edgeWidth({ flux: 2, maxFlux: 1, inRoute: false, inCycle: false })).toBe(WIDTH.fluxMax);
  });
});

describe('networkSvg', () => {
  const node = (over: Partial<SvgNode>): SvgNode => ({
    x: 0, y: 0, width: 40, height: 20, label: 'A', fill: '#fff', stroke: '#000', strokeWidth: 1, dashed: false, rounded: true, opacity: 1, ...over,
  });

  it('writes a well-formed document with a box per node, an arrow per edge and escaped labels', () => {
    const svg = networkSvg(
      [node({ label: 'I^- & <cat>\ncatalyst' }), node({ x: 100, label: 'B1', rounded: false, width: 10, height: 10, dashed: true })],
      [{ from: { x: 0, y: 0 }, to: { x: 100, y: 0 }, targetHalf: { width: 5, height: 5 }, width: 3, color: '#123', label: '2', opacity: 1 }],
    );
    const doc = new DOMParser().parseFromString(svg, 'image/svg+xml');
    expect(doc.getElementsByTagName('parsererror')).toHaveLength(0);
    expect(doc.querySelectorAll('g > rect')).toHaveLength(2);
    const line = doc.querySelector('line')!;
    // The arrow stops at the left side of the 10-wide target box centred at x = 100.
    expect(Number(line.getAttribute('x2'))).toBe(95);
    expect(line.getAttribute('marker-end')).toBe('url(#arrow)');
    expect(doc.querySelectorAll('tspan')[0].textContent).toBe('I^- & <cat>');
    expect(doc.querySelectorAll('tspan')[1].textContent).toBe('catalyst');
    expect(doc.querySelector('rect[stroke-dasharray]')).not.toBeNull();
  });
});
