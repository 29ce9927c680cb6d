import { z } from 'zod';
import { MechanismParams } from '../revisions/revisions.schemas';

// Messages are written to stand at the field in the set editor ("Mechanism 2: choose a mechanism").
export const SetItemInput = z.object({
  mechanism: z.string({ error: 'Choose a mechanism' }).trim().min(1, 'Choose a mechanism').pipe(MechanismParams.shape.slug),
  revision: z.number({ error: 'Choose a revision' }).int('Choose a revision').positive('Choose a revision'),
  note: z.string().trim().max(5_000, 'Keep the note under 5,000 characters').default(''),
});
export type SetItemInput = z.infer<typeof SetItemInput>;

const SetTitle = z.string({ error: 'Give the set a title' }).trim().min(1, 'Give the set a title').max(200, 'Keep the title under 200 characters');
const SetAudience = z.string().trim().max(500, 'Keep the audience under 500 characters');
const SetItems = z.array(SetItemInput).max(200, 'A set holds at most 200 mechanisms');

export const CreateSetBody = z.object({
  title: SetTitle,
  audience: SetAudience.default(''),
  items: SetItems.default([]),
});
export type CreateSetBody = z.infer<typeof CreateSetBody>;

// No defaults: what a change leaves out stays as it is; `items` replaces the whole ordered list.
export const UpdateSetBody = z
  .object({
    title: SetTitle,
    audience: SetAudience,
    items: SetItems,
  })
  .partial()
  .refine((body) => Object.keys(body).length > 0, { message: 'Change at least one of title, audience, items' });
export type UpdateSetBody = z.infer<typeof UpdateSetBody>;

export const SetParams = z.object({ id: z.coerce.number().int().positive() });

export const MechanismChoicesQuery = z.object({ q: z.string().trim().max(200).default('') });

/** `GET /api/sets/mechanism-choices`: a mechanism the instructor may put in a set, and its revisions. */
export interface MechanismChoice {
  slug: string;
  title: string;
  visibility: 'public' | 'private';
  ownerName: string;
  latestRevision: number;
  /** The adopted (reference) revision, if a curator adopted one. */
  referenceRevision: number | null;
}

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
  items: {
    position: number;
    // The latest and reference revisions let the editor offer the item's other revisions.
    mechanism: { slug: string; title: string; latestRevision: number; referenceRevision: number | null };
    revision: number;
    note: string;
  }[];
  createdAt: Date;
}
