import type { Knex } from 'knex';
import { SIMULATE_QUEUE, type JobQueue } from '../jobs/job-queue';
import type { Logger } from '../logger';
import { SimulationThread, type ThreadOutcome } from './simulation-thread-pool';
import * as simulations from './simulations.queries';
import { SIMULATION_LIMITS } from './simulations.schemas';

const PROGRESS_WRITE_MS = 250;
const CANCEL_POLL_MS = 300;

type Outcome = Parameters<typeof simulations.finish>[2];

function toOutcome(result: ThreadOutcome): Outcome {
  if (result.type === 'error') return { status: 'failed', error: { code: 'SIMULATION_FAILED', message: result.message } };
  return result.result.status === 'cancelled' ? { status: 'cancelled', result: result.result } : { status: 'succeeded', result: result.result };
}

/** Runs one claimed row on the thread, relaying progress to the row and the row's cancel flag to the thread. */
async function runOnThread(db: Knex, thread: SimulationThread, row: simulations.SimulationRow): Promise<Outcome> {
  const cancel = new SharedArrayBuffer(4);
  let lastWrite = 0;
  const poll = setInterval(async () => {
    const status = await simulations.findStatus(db, row.id).catch(() => undefined);
    if (status?.cancelRequested) Atomics.store(new Int32Array(cancel), 0, 1);
  }, CANCEL_POLL_MS);
  const limitMessage = `Stopped after the ${SIMULATION_LIMITS.maxRunSeconds} s limit`;
  const deadline = setTimeout(() => void thread.kill(limitMessage), SIMULATION_LIMITS.maxRunSeconds * 1000);
  try {
    const result = await thread.run({
      text: row.sourceText,
      inputs: row.inputs,
      cancel,
      onProgress: (fraction) => {
        if (Date.now() - lastWrite < PROGRESS_WRITE_MS) return;
        lastWrite = Date.now();
        void simulations.setProgress(db, row.id, fraction).catch(() => undefined);
      },
    });
    return toOutcome(result);
  } finally {
    clearInterval(poll);
    clearTimeout(deadline);
  }
}

/** Takes one queued run: claim it, run it, store the outcome. */
export async function processSimulation(db: Knex, thread: SimulationThread, simulationId: string, logger?: Logger): Promise<void> {
  if (!(await simulations.claim(db, simulationId))) return;
  const row = (await simulations.findById(db, simulationId))!;
  const outcome = await runOnThread(db, thread, row);
  await simulations.finish(db, simulationId, outcome);
  logger?.info({ simulationId, status: outcome.status }, 'simulation finished');
}

/** Registers this process as a worker of the simulation queue; returns a function that ends its thread. */
export async function registerSimulationWorker(db: Knex, jobs: JobQueue, logger?: Logger): Promise<() => Promise<void>> {
  const thread = new SimulationThread();
  thread.warmUp();
  await jobs.work<{ simulationId: string }>(SIMULATE_QUEUE, ({ simulationId }) => processSimulation(db, thread, simulationId, logger));
  return () => thread.kill('shutting down');
}
