import { http } from './http';
import type { RoundState } from './mechanisms';

/**
 * Review rounds, remarks, verdicts and the two queues (DEVELOPERS.md, "repository and review").
 * The server has no response schemas for these, so their shapes are written here.
 */
export type { RoundState };
export type Verdict = 'endorse' | 'revise' | 'decline';

export interface RoundVerdict {
  reviewerId: number;
  reviewerName: string;
  revision: number;
  verdict: Verdict;
  comment: string;
  createdAt: string;
}

/** One audit-log entry about the round: `round.opened`, `round.state-changed`, `verdict.given`… */
export interface RoundEvent {
  id: number;
  actorId: number | null;
  action: string;
  details: Record<string, unknown>;
  createdAt: string;
}

/** `GET /api/rounds/:id`. */
export interface RoundDetail {
  id: number;
  state: RoundState;
  mechanism: { slug: string; title: string };
  revision: number;
  endorsementsNeeded: number;
  endorsements: number;
  reviewers: Array<{ id: number; name: string }>;
  verdicts: RoundVerdict[];
  timeline: RoundEvent[];
  createdAt: string;
  closedAt: string | null;
}

/** A row of `GET /api/mechanisms/:slug/rounds`, newest first. */
export interface RoundListItem {
  id: number;
  state: RoundState;
  revision: number;
  createdAt: string;
  closedAt: string | null;
}

export interface RemarkReply {
  id: number;
  remarkId: number;
  body: string;
  bodyHtml: string;
  authorId: number;
  authorName: string;
  createdAt: string;
}

/** A remark with its thread; `matching: false` once its step is gone (the original context stays). */
export interface Remark {
  id: number;
  state: 'open' | 'settled';
  matching: boolean;
  body: string;
  bodyHtml: string;
  authorId: number;
  authorName: string;
  revision: number;
  stepLabel: string | null;
  stepNormalised: string;
  stepLine: number;
  originalRevision: number;
  originalLabel: string | null;
  originalNormalised: string;
  originalLine: number;
  originalContext: string;
  createdAt: string;
  replies: RemarkReply[];
}

/** A row of either queue. */
export interface QueuedRound {
  id: number;
  state: RoundState;
  slug: string;
  title: string;
  revision: number;
  updatedAt: string;
}

const roundPath = (id: number) => `/api/rounds/${id}`;

export const listRounds = (slug: string) => http.get<RoundListItem[]>(`/api/mechanisms/${encodeURIComponent(slug)}/rounds`);
export const openRound = (slug: string, revision?: number) =>
  http.post<RoundDetail>(`/api/mechanisms/${encodeURIComponent(slug)}/rounds`, revision ? { revision } : {});
export const getRound = (id: number) => http.get<RoundDetail>(roundPath(id));
export const assignReviewer = (id: number, userId: number) => http.post<RoundDetail>(`${roundPath(id)}/reviewers`, { userId });
export const giveVerdict = (id: number, verdict: Verdict, comment: string) =>
  http.post<RoundDetail>(`${roundPath(id)}/verdicts`, { verdict, comment });
export const withdrawRound = (id: number) => http.post<RoundDetail>(`${roundPath(id)}/withdraw`);
export const adoptRound = (id: number) => http.post<RoundDetail>(`${roundPath(id)}/adopt`);

export const listRemarks = (roundId: number) => http.get<Remark[]>(`${roundPath(roundId)}/remarks`);
/** `step` is the step's label (`B2`) or its position (`#3`). */
export const addRemark = (roundId: number, step: string, body: string) =>
  http.post<Omit<Remark, 'replies'>>(`${roundPath(roundId)}/remarks`, { step, body });
export const replyToRemark = (remarkId: number, body: string) => http.post<RemarkReply>(`/api/remarks/${remarkId}/replies`, { body });
export const settleRemark = (remarkId: number) => http.post<void>(`/api/remarks/${remarkId}/settle`);

export const listMyReviews = () => http.get<QueuedRound[]>('/api/queues/my-reviews');
export const listToAdopt = () => http.get<QueuedRound[]>('/api/queues/to-adopt');

export interface Person {
  id: number;
  name: string;
  roles: string[];
}

/** People holding a role whose name contains `text` (at most 20; names and roles, never e-mail). */
export const findPeople = (role: 'reviewer' | 'curator', text = '') =>
  http.get<Person[]>(`/api/people?${new URLSearchParams({ q: text, role })}`);
