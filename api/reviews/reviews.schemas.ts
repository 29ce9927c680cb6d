import { z } from 'zod';

export const RoundParams = z.object({ id: z.coerce.number().int().positive() });
export const RemarkParams = z.object({ id: z.coerce.number().int().positive() });

export const OpenRoundBody = z.object({
  revision: z.number().int().positive().optional(),
});

export const AssignReviewerBody = z.object({ userId: z.number().int().positive() });

const Body = z.string().trim().min(1, 'Write something').max(20_000);

export const VerdictBody = z
  .object({
    verdict: z.enum(['endorse', 'revise', 'decline']),
    comment: z.string().trim().max(20_000).default(''),
  })
  .refine((body) => body.verdict === 'endorse' || body.comment.length > 0, {
    message: 'Say why: a comment is required with revise and decline',
    path: ['comment'],
  });
export type VerdictBody = z.infer<typeof VerdictBody>;

export const RemarkBody = z.object({
  step: z.string().trim().min(1, 'Name the step: its label (B2) or position (#3)').max(100),
  body: Body,
});
export type RemarkBody = z.infer<typeof RemarkBody>;

export const ReplyBody = z.object({ body: Body });

export type RoundState = 'open' | 'revise-requested' | 'endorsed' | 'adopted' | 'declined' | 'withdrawn';
export type Verdict = 'endorse' | 'revise' | 'decline';

// The answers of the review routes (the web receives them through `Jsonified`: dates as strings).

export interface RoundVerdict {
  reviewerId: number;
  reviewerName: string;
  revision: number;
  verdict: Verdict;
  comment: string;
  createdAt: Date;
}

/** One audit-log entry about the round: `round.opened`, `round.state-changed`, `verdict.given`… */
export interface RoundEvent {
  id: number;
  actorId: number | null;
  action: string;
  details: Record<string, unknown>;
  createdAt: Date;
}

/** `GET /api/rounds/:id`, and what every act on a round answers. */
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
  createdAt: Date;
  closedAt: Date | null;
}

/** A row of `GET /api/mechanisms/:slug/rounds`, newest first. */
export interface RoundListItem {
  id: number;
  state: RoundState;
  revision: number;
  createdAt: Date;
  closedAt: Date | null;
}

export interface RemarkReply {
  id: number;
  remarkId: number;
  body: string;
  bodyHtml: string;
  authorId: number;
  authorName: string;
  createdAt: Date;
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
  createdAt: Date;
  replies: RemarkReply[];
}

/** A row of either queue (`GET /api/queues/my-reviews`, `/to-adopt`). */
export interface QueuedRound {
  id: number;
  state: RoundState;
  slug: string;
  title: string;
  revision: number;
  updatedAt: Date;
}
