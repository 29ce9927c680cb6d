import { z } from 'zod';

export const ROLES = ['author', 'reviewer', 'curator', 'instructor', 'admin'] as const;
export const Role = z.enum(ROLES);
export type Role = z.infer<typeof Role>;

export const User = z.object({
  id: z.number().int(),
  name: z.string(),
  email: z.string(),
  roles: z.array(Role),
  githubLogin: z.string().nullable(),
  createdAt: z.string(),
});
export type User = z.infer<typeof User>;

export const UserParams = z.object({ id: z.coerce.number().int().positive() });
export const SetRolesBody = z.object({ roles: z.array(Role).max(ROLES.length) });
export type SetRolesBody = z.infer<typeof SetRolesBody>;
