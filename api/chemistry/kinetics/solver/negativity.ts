import type { Tolerances } from './step-control';

/** Running record of negative values set to zero. */
export interface ClipRecord {
  count: number;
  largest: number;
}

/**
 * Negative concentrations after a step: a value below −(atol + rtol·|y0|) means the step went
 * wrong (returns false, the step is retried smaller); smaller negatives are round-off of an
 * almost-exhausted species and are set to zero and recorded.
 */
export function clipNegatives(yOld: Float64Array, yNew: Float64Array, tolerances: Tolerances, record: ClipRecord): boolean {
  for (let i = 0; i < yNew.length; i++) {
    if (yNew[i] >= 0) continue;
    if (-yNew[i] > tolerances.atol + tolerances.rtol * Math.abs(yOld[i])) return false;
  }
  for (let i = 0; i < yNew.length; i++) {
    if (yNew[i] >= 0) continue;
    record.count++;
    record.largest = Math.max(record.largest, -yNew[i]);
    yNew[i] = 0;
  }
  return true;
}
