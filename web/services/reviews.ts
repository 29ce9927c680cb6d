import type * as server from '@api/reviews/reviews.schemas';
import type { RoundState, Verdict } from '@api/reviews/reviews.schemas';
import { http } from './http';
import type { Jsonified } from './jsonified';

/**
 * Review rounds, remarks, verdicts and the two queues (DEVELOPERS.md, "repository and review"):
 * the server's answer types, dates as strings.
 */
export type { RoundState, Verdict };
export type RoundVerdict = Jsonified<server.RoundVerdict>;
export type RoundEvent = Jsonified<server.RoundEvent>;
export type RoundDetail = Jsonified<server.RoundDetail>;
export type RoundListItem = Jsonified<server.RoundListItem>;
export type RemarkReply = Jsonified<server.RemarkReply>;
export type Remark = Jsonified<server.Remark>;
export type QueuedRound = Jsonified<server.QueuedRound>;

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
  http.post<Remark>(`${roundPath(roundId)}/remarks`, { step, body });
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
