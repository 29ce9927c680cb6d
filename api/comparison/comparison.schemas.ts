// The web shows what the API returns: it takes the comparison's shape from here (types only, no server code).
import type { compareRevisions } from './compare';

export type { StepRef as ComparedStep, Change, StepChange, StepComparison } from './compare-steps';
export type { RouteRef as ComparedRoute, RouteComparison, SetChange } from './compare-routes';
export type { LineHunk } from './compare';

/** `GET /api/mechanisms/:slug/compare?from&to`. */
export type Comparison = ReturnType<typeof compareRevisions>;
