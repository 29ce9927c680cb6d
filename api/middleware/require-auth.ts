import type { RequestHandler } from 'express';
import { ForbiddenError, UnauthorizedError } from '../errors';
import type { Role } from '../users/users.schemas';

export const requireUser: RequestHandler = (req, _res, next) => {
  next(req.user ? undefined : new UnauthorizedError());
};

/** Signed in and holding at least one of the roles. */
export function requireRole(...roles: Role[]): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) return next(new UnauthorizedError());
    if (!roles.some((role) => req.user!.roles.includes(role))) {
      return next(new ForbiddenError(`This needs the ${roles.join(' or ')} role`));
    }
    next();
  };
}
