import { readFileSync } from 'node:fs';
import { analyseMechanism } from '@api/chemistry/analyse';
import type { MechanismAnalysis } from '@api/analysis/analysis.schemas';
import type { MechanismSummary } from '@web/services/mechanisms';
import type { Remark, RoundDetail } from '@web/services/reviews';

/** The reviewed example mechanism's text. */
export const NOX_SOURCE = readFileSync('examples/stratospheric-nox.steps', 'utf8');

/** The engine's analysis of a text as the API sends it: through JSON, big integers as numbers. */
export function analysedAsJson(text: string): MechanismAnalysis {
  return JSON.parse(JSON.stringify(analyseMechanism(text), (_k, v) => (typeof v === 'bigint' ? Number(v) : v))) as MechanismAnalysis;
}

/** Demo-scenario review data (invented people on example.test). */
export function demoMechanism(overrides: Partial<MechanismSummary> = {}): MechanismSummary {
  return {
    id: 3, slug: 'stratospheric-nox', title: 'Ozone production and catalytic loss by nitrogen oxides', summary: '', tags: [],
    visibility: 'public', latestRevisionNumber: 2, createdAt: '2026-11-20T10:00:00.000Z', updatedAt: '2026-11-21T10:00:00.000Z',
    owner: { id: 1, name: 'Rosalind Samphire' }, collaborators: [], referenceRevision: 1, activeRound: { id: 11, state: 'open' },
    youCanEdit: false, ...overrides,
  };
}

export function demoRound(overrides: Partial<RoundDetail> = {}): RoundDetail {
  return {
    id: 11, state: 'open', mechanism: { slug: 'stratospheric-nox', title: 'Ozone production' }, revision: 2,
    endorsementsNeeded: 2, endorsements: 0, reviewers: [{ id: 2, name: 'Kofi Glasswort' }], verdicts: [],
    timeline: [
      { id: 1, actorId: 1, action: 'round.opened', details: { revision: 1 }, createdAt: '2026-11-20T10:05:00.000Z' },
      { id: 2, actorId: 4, action: 'round.reviewer-assigned', details: { reviewerId: 2 }, createdAt: '2026-11-20T10:06:00.000Z' },
    ],
    createdAt: '2026-11-20T10:05:00.000Z', closedAt: null, ...overrides,
  };
}

export function demoRemark(overrides: Partial<Remark> = {}): Remark {
  return {
    id: 21, state: 'open', matching: true, body: 'Check the **rate**', bodyHtml: '<p>Check the <strong>rate</strong></p>\n',
    authorId: 2, authorName: 'Kofi Glasswort', revision: 2, stepLabel: 'N1', stepNormalised: 'NO• + O3 -> NO2• + O2', stepLine: 10,
    originalRevision: 1, originalLabel: 'N1', originalNormalised: 'NO• + O3 -> NO2• + O2', originalLine: 10,
    originalContext: 'N1: NO• + O3 -> NO2• + O2 @ 3.0e-12 * exp(-1500 / T)', createdAt: '2026-11-20T11:00:00.000Z', replies: [],
    ...overrides,
  };
}
