/**
 * How photolysis frequencies vary in time. The J written at a photolysis step is its value in full
 * light; the profile multiplies it by a level between 0 and 1.
 * - constant: a fixed level (1 = always in full light);
 * - windows: full light inside the listed [start, end) intervals (seconds), dark outside;
 * - diurnal: level = max(0, cos χ(t)) with the solar zenith angle from
 *   cos χ = sin φ sin δ + cos φ cos δ cos(2π (t − noon) / day), φ the latitude, δ the solar
 *   declination, noon the time of local solar noon (s) — so J(t) = J · max(0, cos χ), J being the
 *   value for an overhead sun (common practice for box models; no curvature or refraction term).
 */
export type LightProfile =
  | { kind: 'constant'; level: number }
  | { kind: 'windows'; on: { start: number; end: number }[] }
  | { kind: 'diurnal'; latitudeDeg: number; declinationDeg: number; noon: number; dayLength?: number };

const SECONDS_PER_DAY = 86_400;
const RADIANS = Math.PI / 180;

interface SolarTerms {
  offset: number;
  amplitude: number;
  omega: number;
}

function solarTerms(profile: Extract<LightProfile, { kind: 'diurnal' }>): SolarTerms {
  const phi = profile.latitudeDeg * RADIANS;
  const delta = profile.declinationDeg * RADIANS;
  return {
    offset: Math.sin(phi) * Math.sin(delta),
    amplitude: Math.cos(phi) * Math.cos(delta),
    omega: (2 * Math.PI) / (profile.dayLength ?? SECONDS_PER_DAY),
  };
}

/** The light level at time t; windows are judged at `probe`, a time inside the current segment. */
export function lightLevel(profile: LightProfile, t: number, probe = t): number {
  if (profile.kind === 'constant') return profile.level;
  if (profile.kind === 'windows') return profile.on.some((w) => probe >= w.start && probe < w.end) ? 1 : 0;
  const { offset, amplitude, omega } = solarTerms(profile);
  return Math.max(0, offset + amplitude * Math.cos(omega * (t - profile.noon)));
}

/** d(level)/dt: zero for constant light and inside windows; the slope of cos χ while the sun is up. */
export function lightSlope(profile: LightProfile, t: number): number {
  if (profile.kind !== 'diurnal') return 0;
  const { offset, amplitude, omega } = solarTerms(profile);
  const angle = omega * (t - profile.noon);
  if (offset + amplitude * Math.cos(angle) <= 0) return 0;
  return -amplitude * omega * Math.sin(angle);
}

function sunriseAndSunset(profile: Extract<LightProfile, { kind: 'diurnal' }>, t0: number, tEnd: number): number[] {
  const { offset, amplitude, omega } = solarTerms(profile);
  if (amplitude === 0 || Math.abs(offset / amplitude) >= 1) return [];
  const halfDay = Math.acos(-offset / amplitude) / omega;
  const day = (2 * Math.PI) / omega;
  const times: number[] = [];
  for (let k = Math.floor((t0 - profile.noon) / day) - 1; profile.noon + k * day - halfDay <= tEnd; k++) {
    times.push(profile.noon + k * day - halfDay, profile.noon + k * day + halfDay);
  }
  return times.filter((time) => time > t0 && time < tEnd).sort((a, b) => a - b);
}

/** Times in (t0, tEnd) where the level is not smooth: window edges, sunrise and sunset. */
export function lightBreakpoints(profile: LightProfile, t0: number, tEnd: number): number[] {
  if (profile.kind === 'constant') return [];
  if (profile.kind === 'diurnal') return sunriseAndSunset(profile, t0, tEnd);
  const edges = profile.on.flatMap((w) => [w.start, w.end]);
  return [...new Set(edges)].filter((time) => time > t0 && time < tEnd).sort((a, b) => a - b);
}
