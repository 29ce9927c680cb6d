import { InvalidStateError } from '../errors';

import type { RoundState, Verdict } from './reviews.schemas';

export type { RoundState, Verdict };

/** A round in progress; the others are closed for good. */
export const ACTIVE_STATES: readonly RoundState[] = ['open', 'revise-requested', 'endorsed'];
export const isActive = (state: RoundState) => ACTIVE_STATES.includes(state);

/**
 * The state a round takes from the verdicts on its current revision: one decline closes it, one
 * request to revise waits for the author, enough endorsements make it ready to adopt.
 */
export function stateFromVerdicts(verdicts: readonly Verdict[], endorsementsNeeded: number): RoundState {
  if (verdicts.includes('decline')) return 'declined';
  if (verdicts.includes('revise')) return 'revise-requested';
  const endorsements = verdicts.filter((verdict) => verdict === 'endorse').length;
  return endorsements >= endorsementsNeeded ? 'endorsed' : 'open';
}

export function assertActive(state: RoundState, doing: string): void {
  if (!isActive(state)) throw new InvalidStateError(`This review round is ${state}; you cannot ${doing}`, { state });
}

export function assertState(state: RoundState, wanted: RoundState, doing: string): void {
  if (state !== wanted) {
    throw new InvalidStateError(`Only a round that is ${wanted} can be ${doing}; this one is ${state}`, { state, wanted });
  }
}
