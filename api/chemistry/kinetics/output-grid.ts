import { KineticsInputError } from './errors';

/** Where results are reported: evenly spaced, evenly spaced in log(t − t0), or listed times. */
export type OutputGrid =
  | { kind: 'linear'; points: number }
  | { kind: 'log'; points: number; first?: number }
  | { kind: 'times'; times: number[] };

const MAX_POINTS = 100_000;

function checkPoints(points: number): void {
  if (!Number.isInteger(points) || points < 2 || points > MAX_POINTS) {
    throw new KineticsInputError('output.points', `must be a whole number from 2 to ${MAX_POINTS}, got ${points}`);
  }
}

function linearTimes(points: number, t0: number, tEnd: number): number[] {
  checkPoints(points);
  return Array.from({ length: points }, (_, k) => (k === points - 1 ? tEnd : t0 + ((tEnd - t0) * k) / (points - 1)));
}

/** t0, then `points − 1` times from t0 + first to tEnd spaced evenly in log(t − t0). */
function logTimes(points: number, first: number, t0: number, tEnd: number): number[] {
  checkPoints(points);
  const span = tEnd - t0;
  if (!(first > 0 && first < span)) throw new KineticsInputError('output.first', `must lie between 0 and the span ${span}, got ${first}`);
  const ratio = Math.log(span / first) / Math.max(points - 2, 1);
  const later = Array.from({ length: points - 1 }, (_, k) => (k === points - 2 ? tEnd : t0 + first * Math.exp(ratio * k)));
  return [t0, ...later];
}

function listedTimes(times: number[], t0: number, tEnd: number): number[] {
  if (times.length === 0 || times.length > MAX_POINTS) throw new KineticsInputError('output.times', `give 1 to ${MAX_POINTS} times`);
  const bad = times.findIndex((time, k) => !(time >= t0 && time <= tEnd) || (k > 0 && time <= times[k - 1]));
  if (bad >= 0) throw new KineticsInputError(`output.times[${bad}]`, `times must rise strictly within [${t0}, ${tEnd}]`);
  return [...times];
}

/** The output times of a grid over [t0, tEnd] (log grids start at t0 + first, default span·1e-6). */
export function outputTimes(grid: OutputGrid, t0: number, tEnd: number): number[] {
  if (!(tEnd > t0)) throw new KineticsInputError('span', `the end time ${tEnd} must be after the start ${t0}`);
  if (grid.kind === 'linear') return linearTimes(grid.points, t0, tEnd);
  if (grid.kind === 'log') return logTimes(grid.points, grid.first ?? (tEnd - t0) * 1e-6, t0, tEnd);
  return listedTimes(grid.times, t0, tEnd);
}
