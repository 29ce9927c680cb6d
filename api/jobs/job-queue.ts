import PgBoss from 'pg-boss';
import type { Logger } from '../logger';

export const SIMULATE_QUEUE = 'simulate';

export interface JobQueue {
  send(queue: string, data: object): Promise<string | null>;
  work<T extends object>(queue: string, handler: (data: T) => Promise<void>): Promise<void>;
  stop(): Promise<void>;
}

/**
 * The PostgreSQL-backed job queue (pg-boss, its own schema in the app database): any number of
 * processes can work the same queue, so heavy work scales out with no other service.
 */
export async function startJobQueue(databaseUrl: string, logger?: Logger): Promise<JobQueue> {
  const boss = new PgBoss({ connectionString: databaseUrl, max: 4 });
  boss.on('error', (error) => logger?.warn({ err: error }, 'job queue error'));
  await boss.start();
  await boss.createQueue(SIMULATE_QUEUE);
  return {
    send: (queue, data) => boss.send(queue, data, { retryLimit: 0, expireInSeconds: 15 * 60 }),
    work: async <T extends object>(queue: string, handler: (data: T) => Promise<void>) => {
      await boss.work<T>(queue, { batchSize: 1, pollingIntervalSeconds: 0.5 }, async ([job]) => handler(job.data));
    },
    stop: () => boss.stop({ graceful: true, timeout: 10_000 }),
  };
}
