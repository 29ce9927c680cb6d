/** Options of one integration. */
export interface IntegrationOptions {
  t0: number;
  tEnd: number;
  /** Times to report, ascending, within [t0, tEnd]. */
  outputTimes: number[];
  rtol: number;
  atol: number;
  /** Most steps (accepted + rejected) before giving up; default 200 000. */
  maxSteps?: number;
  /** Most wall-clock milliseconds before giving up; default unlimited. */
  maxWallMs?: number;
  /** Millisecond clock for the wall-time budget; default performance.now. */
  clock?: () => number;
  /** Checked between steps: returning true stops the run with status "cancelled". */
  shouldStop?: () => boolean;
  /** Called with the fraction of [t0, tEnd] done, whenever it has grown by at least 1 %. */
  onProgress?: (fraction: number) => void;
  initialStep?: number;
}

export type IntegrationStatus = 'done' | 'cancelled' | 'step-budget' | 'time-budget' | 'failed';

export interface IntegrationStats {
  accepted: number;
  rejected: number;
  /** Negative values set to zero, and the largest magnitude set to zero. */
  clippedValues: number;
  largestClipped: number;
}

/** States at the output times reached (all of them when status is "done"). */
export interface IntegrationResult {
  status: IntegrationStatus;
  message: string | null;
  times: number[];
  states: Float64Array[];
  reachedTime: number;
  stats: IntegrationStats;
}
