import type { Knex } from 'knex';
import passport from 'passport';
import { Strategy as GitHubStrategy, type Profile } from 'passport-github2';
import * as users from '../users/users.queries';
import { findOrCreateGithubUser } from './auth.service';

export interface GithubConfig {
  clientId: string;
  clientSecret: string;
  callbackUrl: string;
  authorizationUrl?: string;
  tokenUrl?: string;
  userProfileUrl?: string;
  userEmailUrl?: string;
}

/** One Passport per app (tests build several apps in one process). */
export function createPassport(db: Knex, github: GithubConfig): passport.PassportStatic {
  const instance = new passport.Passport() as passport.PassportStatic;
  instance.serializeUser((user, done) => done(null, user.id));
  instance.deserializeUser((id: number, done) => {
    users.findById(db, id).then((user) => done(null, user ?? false), done);
  });
  instance.use(
    new GitHubStrategy(
      {
        clientID: github.clientId,
        clientSecret: github.clientSecret,
        callbackURL: github.callbackUrl,
        scope: ['user:email'],
        // passport-github2 types state as string; true keeps the OAuth state in the session.
        state: true as unknown as string,
        ...(github.authorizationUrl && { authorizationURL: github.authorizationUrl }),
        ...(github.tokenUrl && { tokenURL: github.tokenUrl }),
        ...(github.userProfileUrl && { userProfileURL: github.userProfileUrl }),
        ...(github.userEmailUrl && { userEmailURL: github.userEmailUrl }),
      },
      (_access: string, _refresh: string, profile: Profile, done: (err: unknown, user?: Express.User) => void) => {
        const email = profile.emails?.[0]?.value ?? null;
        findOrCreateGithubUser(db, {
          id: String(profile.id),
          login: profile.username ?? `github-${profile.id}`,
          name: profile.displayName ?? profile.username ?? '',
          email,
        }).then((user) => done(null, user), done);
      },
    ),
  );
  return instance;
}
