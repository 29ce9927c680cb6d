import { Router, type Request } from 'express';
import type { Knex } from 'knex';
import type passport from 'passport';
import { csrfTokenFor } from '../middleware/csrf';
import { requireUser } from '../middleware/require-auth';
import { publicUser, type StoredUser } from '../users/users.queries';
import { SignInBody, SignUpBody, UpdateAccountBody } from './auth.schemas';
import * as auth from './auth.service';

/** Signs the account in on a fresh session id (fixation defence) and hands out a new CSRF token. */
function logIn(req: Request, user: StoredUser): Promise<{ user: ReturnType<typeof publicUser>; csrfToken: string }> {
  return new Promise((resolve, reject) => {
    req.login(user, (error) => {
      if (error) return reject(error);
      resolve({ user: publicUser(user), csrfToken: csrfTokenFor(req) });
    });
  });
}

export function authRoutes(db: Knex, rateLimiter: import('express').RequestHandler): Router {
  const router = Router();

  router.get('/session', (req, res) => {
    res.json({ user: req.user ? publicUser(req.user) : null, csrfToken: csrfTokenFor(req) });
  });

  router.post('/auth/sign-up', rateLimiter, async (req, res) => {
    const body = SignUpBody.parse(req.body);
    const user = await auth.signUp(db, body);
    res.status(201).json(await logIn(req, user));
  });

  router.post('/auth/sign-in', rateLimiter, async (req, res) => {
    const body = SignInBody.parse(req.body);
    const user = await auth.verifyCredentials(db, body);
    res.json(await logIn(req, user));
  });

  router.post('/auth/sign-out', (req, res, next) => {
    req.logout((error) => {
      if (error) return next(error);
      req.session.destroy(() => res.clearCookie('cyclewright.sid').status(204).end());
    });
  });

  router.get('/me', requireUser, (req, res) => {
    res.json({ ...publicUser(req.user!), mailPreferences: req.user!.mailPreferences });
  });

  router.patch('/me', requireUser, async (req, res) => {
    const body = UpdateAccountBody.parse(req.body);
    const user = await auth.updateAccount(db, req.user!.id, body);
    res.json({ ...publicUser(user), mailPreferences: user.mailPreferences });
  });

  return router;
}

/** The browser side of the GitHub round trip (outside /api: these are page navigations). */
export function githubRoutes(instance: passport.PassportStatic): Router {
  const router = Router();
  router.get('/github', instance.authenticate('github'));
  router.get(
    '/github/callback',
    instance.authenticate('github', { failureRedirect: '/sign-in?error=github' }),
    (req, res) => {
      csrfTokenFor(req);
      res.redirect('/');
    },
  );
  return router;
}
