import type { Server } from 'node:http';
import { createApp } from './app';
import { configFromEnv, useFakeGithub } from './config';
import { createDb } from './db';
import { createFakeGithub } from './dev/fake-github';
import { loadEnv } from './env';
import { startJobQueue } from './jobs/job-queue';
import { createLogger } from './logger';
import { setUpMail } from './mail/mail-setup';
import { registerSimulationWorker } from './simulations/simulation.worker';

const env = loadEnv();
const logger = createLogger(env.LOG_LEVEL);
const db = createDb(env.DATABASE_URL);
const mail = await setUpMail(env, db, logger);
const jobs = await startJobQueue(env.DATABASE_URL, logger);
// One process serves and works the queue by default; `npm run worker` adds more workers elsewhere.
const stopWorker = env.RUN_WORKER === 'on' ? await registerSimulationWorker(db, jobs, logger) : async () => undefined;
const app = createApp({ db, config: configFromEnv(env), logger, jobs, mailTransport: mail.transport, devInbox: mail.devInbox,
  endorsementsNeeded: env.ENDORSEMENTS_NEEDED });
const servers: Server[] = [];

if (useFakeGithub(env)) {
  servers.push(createFakeGithub().listen(env.FAKE_GITHUB_PORT, '127.0.0.1'));
  logger.info(`Fake GitHub sign-in on http://127.0.0.1:${env.FAKE_GITHUB_PORT} (development only)`);
}

const server = app.listen(env.PORT, env.HOST, () => {
  logger.info(`Cyclewright listening on http://${env.HOST}:${env.PORT}`);
});
servers.push(server);

/** Stop taking requests, let the ones in flight finish, then release the pools. */
async function shutdown(signal: string): Promise<void> {
  logger.info(`${signal}: shutting down`);
  const forced = setTimeout(() => process.exit(1), 10_000);
  forced.unref();
  await Promise.all(servers.map((s) => new Promise((resolve) => s.close(resolve))));
  await jobs.stop();
  await stopWorker();
  await app.closeResources();
  await mail.stop();
  await db.destroy();
  process.exit(0);
}

process.on('SIGTERM', () => void shutdown('SIGTERM'));
process.on('SIGINT', () => void shutdown('SIGINT'));
