import { z } from 'zod';
import { MechanismParams } from '../revisions/revisions.schemas';

export const SetItemInput = z.object({
  mechanism: MechanismParams.shape.slug,
  revision: z.number().int().positive({ message: 'Name the revision by its number' }),
  note: z.string().trim().max(5_000).default(''),
});
export type SetItemInput = z.infer<typeof SetItemInput>;

export const CreateSetBody = z.object({
  title: z.string().trim().min(1, 'Give the set a title').max(200),
  audience: z.string().trim().max(500).default(''),
  items: z.array(SetItemInput).max(200).default([]),
});
export type CreateSetBody = z.infer<typeof CreateSetBody>;

// No defaults: what a change leaves out stays as it is; `items` replaces the whole ordered list.
export const UpdateSetBody = z
  .object({
    title: z.string().trim().min(1).max(200),
    audience: z.string().trim().max(500),
    items: z.array(SetItemInput).max(200),
  })
  .partial()
  .refine((body) => Object.keys(body).length > 0, { message: 'Change at least one of title, audience, items' });
export type UpdateSetBody = z.infer<typeof UpdateSetBody>;

export const SetParams = z.object({ id: z.coerce.number().int().positive() });

/** A set as `GET /api/sets` lists it (the web receives it through `Jsonified`). */
export interface SetSummary {
  id: number;
  title: string;
  audience: string;
  owner: { id: number; name: string };
  itemCount: number;
  youOwn: boolean;
  updatedAt: Date;
}

/** `GET /api/sets/:id`, and what creating or changing a set answers: its items in order. */
export interface SetDetail extends Omit<SetSummary, 'itemCount'> {
  items: { position: number; mechanism: { slug: string; title: string }; revision: number; note: string }[];
  createdAt: Date;
}
