import type { IntegrationOptions, IntegrationResult, IntegrationStatus } from './integration-types';
import { clipNegatives, type ClipRecord } from './negativity';
import type { StiffProblem } from './problem';
import { allocateStepWork, prepareStep, rodas4Step, type StepWork } from './rodas4-step';
import { errorNorm, initialStepSize, nextStepSize } from './step-control';

interface RunState {
  problem: StiffProblem;
  options: IntegrationOptions;
  work: StepWork;
  frozen: Uint8Array;
  t: number;
  y: Float64Array;
  h: number;
  nextOutput: number;
  result: IntegrationResult;
  clips: ClipRecord;
  clock: () => number;
  startedAt: number;
  reportedFraction: number;
}

function emitDense(state: RunState, hStep: number): void {
  const { options, work, y, t, result } = state;
  const floor = state.problem.nonNegative ? 0 : -Infinity;
  while (state.nextOutput < options.outputTimes.length && options.outputTimes[state.nextOutput] <= t + hStep) {
    const time = options.outputTimes[state.nextOutput++];
    const theta = Math.min(1, (time - t) / hStep);
    const out = new Float64Array(y.length);
    for (let i = 0; i < y.length; i++) {
      const value = (1 - theta) * y[i] + theta * (work.yNew[i] + (1 - theta) * (work.q1[i] + theta * work.q2[i]));
      out[i] = Math.max(floor, value);
    }
    result.times.push(time);
    result.states.push(out);
  }
}

function emitInitial(state: RunState): void {
  const { options, result } = state;
  while (state.nextOutput < options.outputTimes.length && options.outputTimes[state.nextOutput] <= state.t) {
    result.times.push(options.outputTimes[state.nextOutput++]);
    result.states.push(Float64Array.from(state.y));
  }
}

function stopReason(state: RunState): [IntegrationStatus, string] | null {
  const { options, result } = state;
  if (options.shouldStop?.()) return ['cancelled', `cancelled at t = ${state.t}`];
  const steps = result.stats.accepted + result.stats.rejected;
  if (steps >= (options.maxSteps ?? 200_000)) return ['step-budget', `step budget of ${steps} steps used up at t = ${state.t}`];
  if (options.maxWallMs !== undefined && state.clock() - state.startedAt > options.maxWallMs) {
    return ['time-budget', `time budget of ${options.maxWallMs} ms used up at t = ${state.t}`];
  }
  return null;
}

function reportProgress(state: RunState): void {
  const { options } = state;
  if (!options.onProgress) return;
  const fraction = (state.t - options.t0) / (options.tEnd - options.t0);
  if (fraction - state.reportedFraction < 0.01 && fraction < 1) return;
  state.reportedFraction = fraction;
  options.onProgress(fraction);
}

function segmentEnd(state: RunState): number {
  const after = (state.problem.breakpoints ?? []).filter((time) => time > state.t && time < state.options.tEnd);
  return after.length > 0 ? Math.min(...after) : state.options.tEnd;
}

/** Tries one step; on success advances the state and returns true. */
function attemptStep(state: RunState, hStep: number, end: number, afterRejection: boolean): boolean {
  const { problem, work, options } = state;
  const solved = rodas4Step(problem, work, state.t, state.y, hStep);
  let error = solved ? errorNorm(work, state.y, options, state.frozen) : Infinity;
  if (error <= 1 && problem.nonNegative && !clipNegatives(state.y, work.yNew, options, state.clips)) error = Infinity;
  state.h = nextStepSize(hStep, error, afterRejection || error > 1);
  if (error > 1) return false;
  emitDense(state, hStep);
  state.t = hStep === end - state.t ? end : state.t + hStep;
  state.y.set(work.yNew);
  return true;
}

function tooSmall(state: RunState, hStep: number): boolean {
  if (hStep > 1e-14 * Math.max(Math.abs(state.t), 1e-300)) return false;
  state.result.status = 'failed';
  state.result.message = `step size ${hStep} too small at t = ${state.t}: the problem may be ill-posed`;
  return true;
}

/** Advances to the end, step by step, until done or stopped (f and J at t are already evaluated). */
function march(state: RunState): void {
  const { problem, work, options, result } = state;
  let prepared = true;
  let afterRejection = false;
  while (state.t < options.tEnd) {
    const stop = stopReason(state);
    if (stop) {
      [result.status, result.message] = stop;
      return;
    }
    const end = segmentEnd(state);
    const hStep = state.h >= (end - state.t) * (1 - 1e-12) ? end - state.t : state.h;
    if (tooSmall(state, hStep)) return;
    problem.enterSegment?.(state.t, end);
    if (!prepared) prepareStep(problem, work, state.t, state.y);
    const accepted = attemptStep(state, hStep, end, afterRejection);
    prepared = !accepted;
    afterRejection = !accepted;
    if (accepted) {
      result.stats.accepted++;
      reportProgress(state);
    } else {
      result.stats.rejected++;
    }
  }
}

/**
 * Integrates a stiff problem with RODAS4 (adaptive steps, embedded error estimate, relative and
 * absolute tolerances, step rejection), reporting states at the requested times through the
 * method's dense output. Never throws for numerical trouble: the status and message say why a run
 * ended early, and the states reached so far are returned.
 */
export function integrateStiff(problem: StiffProblem, y0: Float64Array, options: IntegrationOptions): IntegrationResult {
  const work = allocateStepWork(problem);
  const y = Float64Array.from(y0);
  const clips = { count: 0, largest: 0 };
  const stats = { accepted: 0, rejected: 0, clippedValues: 0, largestClipped: 0 };
  const result: IntegrationResult = { status: 'done', message: null, times: [], states: [], reachedTime: options.t0, stats };
  const frozen = problem.frozen ?? new Uint8Array(problem.size);
  const clock = options.clock ?? (() => performance.now());
  const state: RunState = { problem, options, work, frozen, t: options.t0, y, h: 0, nextOutput: 0, result, clips, clock, startedAt: clock(), reportedFraction: 0 };
  emitInitial(state);
  prepareStep(problem, work, state.t, y);
  state.h = options.initialStep ?? initialStepSize(y, work.f0, options, options.tEnd - options.t0);
  march(state);
  result.reachedTime = state.t;
  stats.clippedValues = clips.count;
  stats.largestClipped = clips.largest;
  return result;
}
