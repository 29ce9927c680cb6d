/**
 * Shapes of the platform API as the web client sees them. Users and roles are the types the
 * server's zod schemas infer (types only: no server code reaches the bundle).
 */
import type { Role, User } from '@api/users/users.schemas';

export type { Role, User };

/** The roles in the server's order (`ROLES` of users.schemas.ts; a value import would pull zod into the bundle). */
export const ROLES = ['author', 'reviewer', 'curator', 'instructor', 'admin'] as const satisfies readonly Role[];

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
