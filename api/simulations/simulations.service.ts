import { createHash } from 'node:crypto';
import type { Knex } from 'knex';
import { analyseMechanism } from '../chemistry/analyse';
import { AppError, NotFoundError, ParseFailedError } from '../errors';
import { SIMULATE_QUEUE, type JobQueue } from '../jobs/job-queue';
import type { StoredUser } from '../users/users.queries';
import { buildSimulationInput } from './simulation-input';
import * as simulations from './simulations.queries';
import { SIMULATION_LIMITS, type SimulationInputs } from './simulations.schemas';

export class QueueUnavailableError extends AppError {
  constructor() {
    super(503, 'QUEUE_UNAVAILABLE', 'The simulation queue is not running on this server; try again shortly');
  }
}

/** Same text and same inputs give the same result: key the cache on both. */
export function cacheKeyOf(text: string, inputs: SimulationInputs): string {
  return createHash('sha256').update(text).update('\u0000').update(JSON.stringify(inputs)).digest('hex');
}

/** Refuses text with errors or beyond the limits before anything is queued. */
function checkSimulable(text: string, inputs: SimulationInputs): void {
  const analysis = analyseMechanism(text);
  const errors = analysis.diagnostics.filter((d) => d.severity === 'error');
  if (errors.length > 0) throw new ParseFailedError(`The mechanism has ${errors.length} error(s); fix them before simulating`, { diagnostics: errors });
  if (analysis.steps.length === 0) throw new ParseFailedError('The mechanism has no steps to simulate');
  if (analysis.steps.length > SIMULATION_LIMITS.maxSteps) throw new AppError(413, 'TOO_MANY_STEPS', `At most ${SIMULATION_LIMITS.maxSteps} steps can be simulated; this mechanism has ${analysis.steps.length}`);
  if (analysis.species.length > SIMULATION_LIMITS.maxSpecies) throw new AppError(413, 'TOO_MANY_SPECIES', `At most ${SIMULATION_LIMITS.maxSpecies} species can be simulated; this mechanism has ${analysis.species.length}`);
  buildSimulationInput(analysis, inputs, text);
  const known = new Set(analysis.species.map((s) => s.key));
  const unknown = [...Object.keys(inputs.initial), ...inputs.fixed].filter((key) => !known.has(key));
  if (unknown.length > 0) {
    throw new AppError(400, 'UNKNOWN_SPECIES', `Not species of this mechanism: ${unknown.join(', ')}`, { field: 'inputs.initial', unknown });
  }
}

export interface StartInput {
  text: string;
  revisionId: number | null;
  inputs: SimulationInputs;
}

/** Queues a run, or answers at once from the cache when the same text and inputs already succeeded. */
export async function startSimulation(db: Knex, jobs: JobQueue | undefined, user: StoredUser, input: StartInput) {
  checkSimulable(input.text, input.inputs);
  const cacheKey = cacheKeyOf(input.text, input.inputs);
  const cached = await simulations.findSucceededByCacheKey(db, cacheKey);
  if (cached) return { id: cached.id, status: cached.status, cached: true };
  if (!jobs) throw new QueueUnavailableError();
  const id = await simulations.insert(db, { createdBy: user.id, revisionId: input.revisionId, sourceText: input.text, inputs: input.inputs, cacheKey });
  await jobs.send(SIMULATE_QUEUE, { simulationId: id });
  return { id, status: 'queued' as const, cached: false };
}

/** A run is seen by whoever started it, and by admins. */
export async function getSimulation(db: Knex, user: StoredUser, id: string) {
  const row = await simulations.findById(db, id);
  if (!row || (row.createdBy !== user.id && !user.roles.includes('admin'))) throw new NotFoundError('simulation', id);
  return row;
}

export async function cancelSimulation(db: Knex, user: StoredUser, id: string) {
  await getSimulation(db, user, id);
  await simulations.requestCancel(db, id);
  return getSimulation(db, user, id);
}
