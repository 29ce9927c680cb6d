import { z } from 'zod';

/** The most characters (UTF-16 units, as JavaScript counts them) a revision's text may hold; the editor warns above it. */
export const SOURCE_MAX_CHARACTERS = 500_000;

/** A mechanism's source text; the grammar caps a line, this caps the whole text stored per revision. */
export const Source = z.string().max(SOURCE_MAX_CHARACTERS, 'A revision holds at most 500,000 characters');
export const ChangeNote = z.string().trim().max(2_000).default('');

export const MechanismParams = z.object({ slug: z.string().min(1).max(120) });
export const RevisionParams = MechanismParams.extend({ number: z.coerce.number().int().positive() });

export const CreateRevisionBody = z.object({
  base: z.number().int().positive({ message: 'Name the revision this one is based on (its number)' }),
  source: Source,
  changeNote: ChangeNote,
});
export type CreateRevisionBody = z.infer<typeof CreateRevisionBody>;
