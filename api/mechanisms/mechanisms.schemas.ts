import { z } from 'zod';
import { ChangeNote, Source } from '../revisions/revisions.schemas';

export const Visibility = z.enum(['public', 'private']);
const Slug = z.string().regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, 'Use lowercase letters, digits and single hyphens').max(80);
const Tag = z.string().trim().toLowerCase().min(1).max(40).regex(/^[a-z0-9][a-z0-9 ._-]*$/, 'Tags use letters, digits, space, . _ -');

export const CreateMechanismBody = z.object({
  slug: Slug.optional(),
  title: z.string().trim().min(1, 'Give a title').max(200),
  summary: z.string().max(20_000).default(''),
  tags: z.array(Tag).max(20).default([]),
  visibility: Visibility.default('public'),
  source: Source,
  changeNote: ChangeNote,
});
export type CreateMechanismBody = z.infer<typeof CreateMechanismBody>;

export const UpdateMechanismBody = z
  .object({
    title: z.string().trim().min(1).max(200),
    summary: z.string().max(20_000),
    tags: z.array(Tag).max(20),
    visibility: Visibility,
  })
  .partial()
  .refine((body) => Object.keys(body).length > 0, { message: 'Change at least one of title, summary, tags, visibility' });
export type UpdateMechanismBody = z.infer<typeof UpdateMechanismBody>;

export const SetCollaboratorsBody = z.object({ userIds: z.array(z.number().int().positive()).max(50) });

export const ROUND_STATES = ['open', 'revise-requested', 'endorsed', 'adopted', 'declined', 'withdrawn'] as const;

export const ListMechanismsQuery = z.object({
  q: z.string().trim().min(1).max(200).optional(),
  species: z.string().trim().min(1).max(100).optional(),
  tag: z.string().trim().toLowerCase().max(40).optional(),
  author: z.coerce.number().int().positive().optional(),
  visibility: Visibility.optional(),
  state: z.enum([...ROUND_STATES, 'none']).optional(),
  sort: z.enum(['updated', 'created', 'title', 'relevance']).default('updated'),
  order: z.enum(['asc', 'desc']).optional(),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(20),
});
export type ListMechanismsQuery = z.infer<typeof ListMechanismsQuery>;
