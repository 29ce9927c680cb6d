import type { StoredUser } from '../users/users.queries';

declare global {
  // passport puts the deserialised account here.
  namespace Express {
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends StoredUser {}
  }
}

declare module 'express-session' {
  interface SessionData {
    csrfToken?: string;
  }
}

export {};
