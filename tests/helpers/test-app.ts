import type { AddressInfo } from 'node:net';
import { createServer, type Server } from 'node:http';
import type { Knex } from 'knex';
import { createApp, type AppConfig, type AppDeps } from '@api/app';
import { createFakeGithub, fakeGithubUrls } from '@api/dev/fake-github';
import { createTestDatabase } from './test-db';

type ExtraDeps = Partial<Omit<AppDeps, 'db' | 'config'>>;

export interface TestApp {
  app: ReturnType<typeof createApp>;
  db: Knex;
  url: string;
  config: AppConfig;
  fakeGithubUrl: string;
  close: () => Promise<void>;
}

function listen(handler: Parameters<typeof createServer>[1]): Promise<{ server: Server; url: string }> {
  return new Promise((resolve) => {
    const server = createServer(handler).listen(0, '127.0.0.1');
    server.on('listening', () => {
      const { port } = server.address() as AddressInfo;
      resolve({ server, url: `http://127.0.0.1:${port}` });
    });
  });
}

/**
 * A whole app on its own cloned database, listening on a free loopback port, with the fake GitHub
 * beside it. Overrides adjust the config (e.g. a tight rate limit) or add feature deps.
 */
export async function startTestApp(
  overrides: Partial<AppConfig> = {},
  extraDeps: ExtraDeps | ((database: { db: Knex; url: string }) => Promise<ExtraDeps>) = {},
): Promise<TestApp> {
  const database = await createTestDatabase();
  const extra = typeof extraDeps === 'function' ? await extraDeps(database) : extraDeps;
  const fake = await listen(createFakeGithub());
  const placeholder = 'http://127.0.0.1:1';
  const config: AppConfig = {
    databaseUrl: database.url,
    sessionSecret: 'test-session-secret-0123456789',
    secureCookies: false,
    github: { clientId: 'test-client', clientSecret: 'test-secret', callbackUrl: `${placeholder}/auth/github/callback`, ...fakeGithubUrls(fake.url) },
    authRateLimit: { windowMs: 60_000, limit: 1000 },
    webDir: null,
    ...overrides,
  };
  // The callback URL must name the app's own port, known only after listening: bind first, then build.
  const holder: { app?: ReturnType<typeof createApp> } = {};
  const server = await listen((req, res) => holder.app!(req, res));
  config.github.callbackUrl = `${server.url}/auth/github/callback`;
  holder.app = createApp({ db: database.db, config, ...extra });
  return {
    app: holder.app,
    db: database.db,
    url: server.url,
    config,
    fakeGithubUrl: fake.url,
    close: async () => {
      await new Promise((resolve) => server.server.close(resolve));
      await new Promise((resolve) => fake.server.close(resolve));
      await holder.app!.closeResources();
      await database.drop();
    },
  };
}
