import { randomBytes, timingSafeEqual } from 'node:crypto';
import type { Request, RequestHandler } from 'express';
import { AppError } from '../errors';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/** The session's synchroniser token, made on first use. */
export function csrfTokenFor(req: Request): string {
  if (!req.session.csrfToken) req.session.csrfToken = randomBytes(24).toString('base64url');
  return req.session.csrfToken;
}

function sameToken(expected: string, given: string): boolean {
  const a = Buffer.from(expected);
  const b = Buffer.from(given);
  return a.length === b.length && timingSafeEqual(a, b);
}

/**
 * Cookie-authenticated writes must echo the session's token in X-CSRF-Token; a cross-site form or
 * script cannot read it, so it cannot forge the write.
 */
export const requireCsrfToken: RequestHandler = (req, _res, next) => {
  if (SAFE_METHODS.has(req.method)) return next();
  const expected = req.session?.csrfToken;
  const given = req.get('x-csrf-token');
  if (!expected || !given || !sameToken(expected, given)) {
    return next(new AppError(403, 'CSRF_INVALID', 'Missing or stale CSRF token; reload the page and try again'));
  }
  next();
};
