import { describe, expect, it } from 'vitest';
import { outputTimes } from '@api/chemistry/kinetics/output-grid';

describe('output grids', () => {
  it('spaces a linear grid evenly and ends exactly at tEnd', () => {
    expect(outputTimes({ kind: 'linear', points: 5 }, 0, 1)).toEqual([0, 0.25, 0.5, 0.75, 1]);
  });

  it('starts a log grid at t0, then spaces log(t − t0) evenly from first to the end', () => {
    const times = outputTimes({ kind: 'log', points: 6, first: 1e-2 }, 0, 1e2);
    expect(times[0]).toBe(0);
    expect(times.slice(1).map((t) => Math.log10(t))).toEqual([-2, -1, 0, 1, 2].map((v) => expect.closeTo(v, 12)));
    expect(times.at(-1)).toBe(1e2);
  });

  it('keeps listed times as given', () => {
    expect(outputTimes({ kind: 'times', times: [1, 2, 40] }, 0, 40)).toEqual([1, 2, 40]);
  });
});
