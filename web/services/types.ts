/**
 * Shapes of the platform API as the web client sees them.
 * Kept in one file so that switching to the types inferred from the server's
 * zod schemas later touches only this module.
 */

export const ROLES = ['author', 'reviewer', 'curator', 'instructor', 'admin'] as const;

export type Role = (typeof ROLES)[number];

export interface User {
  id: number;
  name: string;
  email: string;
  roles: Role[];
  githubLogin: string | null;
  createdAt: string;
}

export interface SessionInfo {
  user: User | null;
  csrfToken: string;
}

export interface SignedInSession {
  user: User;
  csrfToken: string;
}

export interface SignInBody {
  email: string;
  password: string;
}

export interface SignUpBody {
  name: string;
  email: string;
  password: string;
}

export interface UpdateRolesBody {
  roles: Role[];
}

/** One zod issue as the server reports it under `details` of a 400 VALIDATION_FAILED. */
export interface ValidationIssue {
  path: (string | number)[];
  message: string;
}

export interface ApiErrorBody {
  error: {
    code: string;
    message: string;
    details?: unknown;
  };
}

/** `GET /api/queues`: how much waits in each queue; `toAdopt` is null for non-curators. */
export interface QueueCounts {
  myReviews: number;
  toAdopt: number | null;
}
