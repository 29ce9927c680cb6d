import { createIterationSolver, type IterationSolver } from './iteration-solver';
import type { StiffProblem } from './problem';
import { RODAS4 } from './rodas4-tableau';

/** Scratch arrays of one integration, allocated once. */
export interface StepWork {
  stages: Float64Array[];
  f0: Float64Array;
  fStage: Float64Array;
  fTime: Float64Array;
  yStage: Float64Array;
  yNew: Float64Array;
  q1: Float64Array;
  q2: Float64Array;
  jacobian: Float64Array;
  solver: IterationSolver;
}

/** Allocates the scratch arrays and the stage solver for a problem (once per integration). */
export function allocateStepWork(problem: StiffProblem): StepWork {
  const n = problem.size;
  const vector = () => new Float64Array(n);
  return {
    stages: Array.from({ length: 6 }, vector),
    f0: vector(),
    fStage: vector(),
    fTime: vector(),
    yStage: vector(),
    yNew: vector(),
    q1: vector(),
    q2: vector(),
    jacobian: new Float64Array(problem.pattern.columns.length),
    solver: createIterationSolver(problem.pattern),
  };
}

/** Evaluates f, ∂f/∂y and ∂f/∂t at the start of a step (kept when a step is retried). */
export function prepareStep(problem: StiffProblem, work: StepWork, t: number, y: Float64Array): void {
  problem.derivative(t, y, work.f0);
  problem.jacobian(t, y, work.jacobian);
  if (problem.timeDerivative) problem.timeDerivative(t, y, work.fTime);
}

function stageInput(work: StepWork, y: Float64Array, stage: number): void {
  // The sixth stage starts from the fifth stage's input (a_6j = a_5j) plus u_5.
  const weights = RODAS4.a[Math.min(stage, 4)];
  const { yStage, stages } = work;
  yStage.set(y);
  for (let j = 0; j < weights.length; j++) {
    const weight = weights[j];
    const u = stages[j];
    for (let i = 0; i < yStage.length; i++) yStage[i] += weight * u[i];
  }
}

function stageRightSide(work: StepWork, stage: number, h: number, f: Float64Array, timeDependent: boolean): Float64Array {
  const rhs = work.stages[stage];
  rhs.set(f);
  const couplings = RODAS4.cMatrix[stage];
  for (let j = 0; j < couplings.length; j++) {
    const weight = couplings[j] / h;
    const u = work.stages[j];
    for (let i = 0; i < rhs.length; i++) rhs[i] += weight * u[i];
  }
  const timeWeight = h * RODAS4.d[stage];
  if (timeDependent && timeWeight !== 0) for (let i = 0; i < rhs.length; i++) rhs[i] += timeWeight * work.fTime[i];
  return rhs;
}

function denseCoefficients(work: StepWork): void {
  const [first, second] = RODAS4.dense;
  work.q1.fill(0);
  work.q2.fill(0);
  for (let j = 0; j < 5; j++) {
    const u = work.stages[j];
    for (let i = 0; i < u.length; i++) {
      work.q1[i] += first[j] * u[i];
      work.q2[i] += second[j] * u[i];
    }
  }
}

/**
 * One RODAS4 step of size h from (t, y), after prepareStep(t, y). Leaves the new solution in
 * work.yNew, the embedded error estimate in work.stages[5] and the dense-output coefficients in
 * work.q1 / work.q2. Returns false when the iteration matrix is singular.
 */
export function rodas4Step(problem: StiffProblem, work: StepWork, t: number, y: Float64Array, h: number): boolean {
  if (!work.solver.factor(1 / (h * RODAS4.gamma), work.jacobian)) return false;
  const n = problem.size;
  const timeDependent = problem.timeDerivative !== undefined;
  for (let stage = 0; stage < 6; stage++) {
    let f = work.f0;
    if (stage > 0) {
      stageInput(work, y, stage);
      if (stage === 5) for (let i = 0; i < n; i++) work.yStage[i] += work.stages[4][i];
      problem.derivative(t + RODAS4.c[stage] * h, work.yStage, work.fStage);
      f = work.fStage;
    }
    work.solver.solve(stageRightSide(work, stage, h, f, timeDependent));
  }
  for (let i = 0; i < n; i++) work.yNew[i] = work.yStage[i] + work.stages[5][i];
  denseCoefficients(work);
  return true;
}
