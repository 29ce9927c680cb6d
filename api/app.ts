import express, { type Express } from 'express';
import type { Knex } from 'knex';
import { pinoHttp } from 'pino-http';
import { adminRoutes } from './admin/admin.routes';
import { authRoutes, githubRoutes } from './auth/auth.routes';
import { createPassport, type GithubConfig } from './auth/passport';
import { createSessionMiddleware } from './auth/session';
import { healthRoutes } from './health/health.routes';
import type { Logger } from './logger';
import { requireCsrfToken } from './middleware/csrf';
import { errorHandler } from './middleware/error-handler';
import { notFound } from './middleware/not-found';
import { authRateLimiter, type RateLimitConfig } from './middleware/rate-limit';
import { securityHeaders } from './middleware/security-headers';
import { serveWebClient } from './middleware/serve-web';
import { apiRouters, type FeatureDeps } from './routers';

export interface AppConfig {
  databaseUrl: string;
  sessionSecret: string;
  secureCookies: boolean;
  github: GithubConfig;
  authRateLimit: RateLimitConfig;
  /** The built web client to serve with history fallback; null in development and API tests. */
  webDir: string | null;
}

export interface AppDeps extends Omit<FeatureDeps, 'db'> {
  db: Knex;
  config: AppConfig;
  logger?: Logger;
}

/** Builds the whole app; never listens (api/index.ts does). `close` releases the session pool. */
export function createApp(deps: AppDeps): Express & { closeResources: () => Promise<void> } {
  const { db, config } = deps;
  const app = express() as Express & { closeResources: () => Promise<void> };
  const sessions = createSessionMiddleware({
    databaseUrl: config.databaseUrl,
    secret: config.sessionSecret,
    secureCookies: config.secureCookies,
  });
  const passport = createPassport(db, config.github);

  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  if (deps.logger) app.use(pinoHttp({ logger: deps.logger, autoLogging: { ignore: (req) => req.url === '/api/health' } }));
  app.use(securityHeaders(config.github.authorizationUrl));
  app.use('/api/health', healthRoutes(db));
  app.use(express.json({ limit: '8mb' }));
  app.use(sessions.middleware);
  app.use(passport.session());
  app.use('/auth', githubRoutes(passport));
  app.use('/api', requireCsrfToken);
  app.use('/api', authRoutes(db, authRateLimiter(config.authRateLimit)));
  app.use('/api/admin', adminRoutes(db));
  for (const [path, router] of apiRouters({ ...deps, db })) app.use(path, router);
  app.use('/api', notFound);
  if (config.webDir) app.use(serveWebClient(config.webDir));
  app.use(notFound);
  app.use(errorHandler);
  app.closeResources = sessions.close;
  return app;
}
