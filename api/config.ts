import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { AppConfig } from './app';
import type { AppEnv } from './env';
import { fakeGithubUrls } from './dev/fake-github';

const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

/** Turns the parsed environment into the app's configuration; development points GitHub at the local fake. */
export function configFromEnv(env: AppEnv): AppConfig {
  const publicUrl = env.PUBLIC_URL ?? `http://127.0.0.1:${env.PORT}`;
  const useFake = env.NODE_ENV !== 'production' && !env.GITHUB_AUTHORIZE_URL;
  const fake = useFake ? fakeGithubUrls(`http://127.0.0.1:${env.FAKE_GITHUB_PORT}`) : {};
  return {
    databaseUrl: env.DATABASE_URL,
    sessionSecret: env.SESSION_SECRET,
    secureCookies: publicUrl.startsWith('https://'),
    github: {
      clientId: env.GITHUB_CLIENT_ID,
      clientSecret: env.GITHUB_CLIENT_SECRET,
      callbackUrl: `${publicUrl}/auth/github/callback`,
      authorizationUrl: env.GITHUB_AUTHORIZE_URL,
      tokenUrl: env.GITHUB_TOKEN_URL,
      userProfileUrl: env.GITHUB_USER_URL,
      userEmailUrl: env.GITHUB_EMAILS_URL,
      ...fake,
    },
    authRateLimit: { windowMs: 10 * 60 * 1000, limit: 30 },
    webDir: env.SERVE_WEB === 'on' ? path.resolve(repoRoot, env.WEB_DIR ?? path.join('dist', 'web')) : null,
  };
}

export const useFakeGithub = (env: AppEnv) => env.NODE_ENV !== 'production' && !env.GITHUB_AUTHORIZE_URL;
