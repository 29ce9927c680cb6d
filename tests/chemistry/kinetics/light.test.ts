import { describe, expect, it } from 'vitest';
import { lightBreakpoints, lightLevel } from '@api/chemistry/kinetics/light';
import { simulate } from '@api/chemistry/kinetics/simulate';
import type { LightProfile } from '@api/chemistry/kinetics/light';
import { modelOf } from './model-builder';

const photolysis = modelOf(['J1: A + hv -> B @ 1e-4']);

function remainingA(light: LightProfile, tEnd: number): number {
  const result = simulate({
    model: photolysis, conditions: { T: 298, P: 1 }, initial: { A: 1e12 }, tEnd, output: { kind: 'linear', points: 2 },
    light, rtol: 1e-9,
  });
  expect(result.status).toBe('done');
  return result.concentrations[1][0] / 1e12;
}

describe('light profiles for photolysis steps', () => {
  it('puts the sun overhead at noon on the equator at equinox, and below the horizon at midnight', () => {
    const equator: LightProfile = { kind: 'diurnal', latitudeDeg: 0, declinationDeg: 0, noon: 43_200 };
    expect(lightLevel(equator, 43_200)).toBeCloseTo(1, 12);
    expect(lightLevel(equator, 0)).toBe(0);
    expect(lightLevel(equator, 43_200 + 10_800)).toBeCloseTo(Math.SQRT1_2, 12);
  });

  it('gives 13.35 h of daylight at 45° N with declination 10° (sunrise equation cos H0 = −tan φ tan δ)', () => {
    // cos H0 = −tan 45° · tan 10° = −0.176327; H0 = 100.156°; day length 2 × 100.156/15 h = 13.354 h.
    const profile: LightProfile = { kind: 'diurnal', latitudeDeg: 45, declinationDeg: 10, noon: 43_200 };
    const [sunrise, sunset] = lightBreakpoints(profile, 0, 86_400);
    expect((sunset - sunrise) / 3600).toBeCloseTo(13.354, 3);
    expect(lightLevel(profile, 43_200)).toBeCloseTo(Math.cos((35 * Math.PI) / 180), 12);
  });

  it('decays A by exp(−J × lit time) with light in on/off windows', () => {
    const windows: LightProfile = { kind: 'windows', on: [{ start: 1000, end: 3000 }, { start: 5000, end: 6000 }] };
    expect(lightBreakpoints(windows, 0, 10_000)).toEqual([1000, 3000, 5000, 6000]);
    expect(remainingA(windows, 10_000)).toBeCloseTo(Math.exp(-1e-4 * 3000), 8);
  });

  it('decays A by exp(−J·day/π) over a day of equatorial equinox sun (∫ max(0, cos ωt) dt = day/π)', () => {
    const equator: LightProfile = { kind: 'diurnal', latitudeDeg: 0, declinationDeg: 0, noon: 43_200 };
    expect(remainingA(equator, 86_400)).toBeCloseTo(Math.exp((-1e-4 * 86_400) / Math.PI), 8);
    expect(remainingA(equator, 21_600)).toBeCloseTo(1, 12);
  });
});
