import { describe, expect, it } from 'vitest';
import { freestDirection, labelOffsetToward } from '@web/components/workbench/network/stepLabelPlacement';
import { networkSvg, type SvgNode } from '@web/components/workbench/network/networkSvg';

const centre = { x: 100, y: 100 };
const degrees = (radians: number) => Math.round((radians * 180) / Math.PI);

/** Does the segment from the centre to `to` pass through the box centred at `at`? (sampled along it) */
function crosses(to: { x: number; y: number }, at: { x: number; y: number }, box: { width: number; height: number }): boolean {
  for (let t = 0; t <= 1; t += 0.01) {
    const x = centre.x + (to.x - centre.x) * t;
    const y = centre.y + (to.y - centre.y) * t;
    if (Math.abs(x - at.x) < box.width / 2 && Math.abs(y - at.y) < box.height / 2) return true;
  }
  return false;
}

describe('freestDirection', () => {
  it('puts a lone step label above its node', () => {
    expect(degrees(freestDirection(centre, []))).toBe(-90);
  });

  it('turns away from a single arrow', () => {
    expect(degrees(freestDirection(centre, [{ x: 100, y: 200 }]))).toBe(-90);
    expect(degrees(freestDirection(centre, [{ x: 200, y: 100 }]))).toBe(180);
  });

  it('takes the middle of the widest opening between the arrows', () => {
    // Arrows down-left, down-right and right: the widest opening is up-left, between right and down-left round the top.
    const direction = freestDirection(centre, [{ x: 50, y: 150 }, { x: 150, y: 150 }, { x: 200, y: 100 }]);
    expect((direction * 180) / Math.PI).toBeCloseTo(-112.5, 6);
  });

  it('of openings as wide as each other, takes the one nearest above', () => {
    // Arrows left and right: the openings above and below are equal.
    expect(degrees(freestDirection(centre, [{ x: 0, y: 100 }, { x: 200, y: 100 }]))).toBe(-90);
  });
});

describe('labelOffsetToward', () => {
  const label = { width: 40, height: 12 };

  it('sets the label just clear of the square, never over it', () => {
    expect(labelOffsetToward(-Math.PI / 2, 8, label)).toEqual({ dx: 0, dy: -17 });
    expect(labelOffsetToward(0, 8, label)).toEqual({ dx: 31, dy: 0 });
  });

  it('keeps a label placed in the freest direction off every arrow of the step', () => {
    // A step with arrows straight down, down-left and up-right: the old place, under it, was on an arrow.
    const neighbours = [{ x: 100, y: 200 }, { x: 20, y: 180 }, { x: 180, y: 20 }];
    const offset = labelOffsetToward(freestDirection(centre, neighbours), 8, label);
    const at = { x: centre.x + offset.dx, y: centre.y + offset.dy };
    expect(neighbours.some((to) => crosses(to, at, label))).toBe(false);
    expect(crosses(neighbours[0], { x: 100, y: 100 + 8 + 3 + 6 }, label)).toBe(true);
  });
});

describe('the SVG picture of a step label', () => {
  const step = (over: Partial<SvgNode>): SvgNode => ({
    x: 0, y: 0, width: 10, height: 10, label: 'B1 ×3', fill: '#000', stroke: '#000', strokeWidth: 0, dashed: false, rounded: false, opacity: 1, ...over,
  });
  const textOf = (svg: string) => new DOMParser().parseFromString(svg, 'image/svg+xml').querySelector('text')!;

  it('writes the label where the graph drew it, and widens the picture to hold it', () => {
    const svg = networkSvg([step({ labelCentre: { x: 0, y: -40 } })], []);
    expect(textOf(svg).getAttribute('y')).toBe('-37.0');
    const [, top] = /viewBox="(\S+) (\S+)/.exec(svg)!.slice(1).map(Number);
    expect(top).toBeLessThan(-47);
  });

  it('writes it under the square when the graph gave no place', () => {
    expect(textOf(networkSvg([step({})], [])).getAttribute('y')).toBe('16.0');
  });
});
