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
