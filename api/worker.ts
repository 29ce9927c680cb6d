import { createDb } from './db';
import { loadEnv } from './env';
import { startJobQueue } from './jobs/job-queue';
import { createLogger } from './logger';
import { registerSimulationWorker } from './simulations/simulation.worker';

/** `npm run worker`: a process that only works the job queue; start as many as the machines allow. */
const env = loadEnv();
const logger = createLogger(env.LOG_LEVEL);
const db = createDb(env.DATABASE_URL);
const jobs = await startJobQueue(env.DATABASE_URL, logger);
const stopThread = await registerSimulationWorker(db, jobs, logger);
logger.info('Simulation worker ready');

async function shutdown(): Promise<void> {
  await jobs.stop();
  await stopThread();
  await db.destroy();
  process.exit(0);
}
process.on('SIGTERM', () => void shutdown());
process.on('SIGINT', () => void shutdown());
