import type { Knex } from 'knex';
import type { SimulationInputs, SimulationStatus } from './simulations.schemas';

type Db = Knex | Knex.Transaction;

export interface SimulationRow {
  id: string;
  createdBy: number | null;
  revisionId: number | null;
  sourceText: string;
  inputs: SimulationInputs;
  cacheKey: string;
  status: SimulationStatus;
  progress: number;
  cancelRequested: boolean;
  result: unknown;
  error: { code: string; message: string } | null;
  createdAt: Date;
  startedAt: Date | null;
  finishedAt: Date | null;
}

const columns = [
  'id', 'created_by as createdBy', 'revision_id as revisionId', 'source_text as sourceText', 'inputs',
  'cache_key as cacheKey', 'status', 'progress', 'cancel_requested as cancelRequested', 'result', 'error',
  'created_at as createdAt', 'started_at as startedAt', 'finished_at as finishedAt',
];

export async function findById(db: Db, id: string): Promise<SimulationRow | undefined> {
  return db('simulations').where({ id }).first(columns);
}

/** Without the (large) source text and result: for progress polling. */
export async function findStatus(db: Db, id: string) {
  return db('simulations').where({ id }).first('status', 'progress', 'error', 'cancel_requested as cancelRequested');
}

export async function findSucceededByCacheKey(db: Db, cacheKey: string): Promise<SimulationRow | undefined> {
  return db('simulations').where({ cache_key: cacheKey, status: 'succeeded' }).orderBy('finished_at', 'desc').first(columns);
}

export async function insert(
  db: Db,
  values: { createdBy: number; revisionId: number | null; sourceText: string; inputs: SimulationInputs; cacheKey: string },
): Promise<string> {
  const [row] = await db('simulations')
    .insert({
      created_by: values.createdBy,
      revision_id: values.revisionId,
      source_text: values.sourceText,
      inputs: JSON.stringify(values.inputs),
      cache_key: values.cacheKey,
    })
    .returning('id');
  return row.id;
}

/** Moves a queued run to running; false when it was cancelled (or taken) meanwhile. */
export async function claim(db: Db, id: string): Promise<boolean> {
  const count = await db('simulations')
    .where({ id, status: 'queued', cancel_requested: false })
    .update({ status: 'running', started_at: db.fn.now() });
  return count === 1;
}

export async function setProgress(db: Db, id: string, progress: number): Promise<void> {
  await db('simulations').where({ id, status: 'running' }).update({ progress });
}

export async function finish(
  db: Db,
  id: string,
  outcome: { status: 'succeeded' | 'failed' | 'cancelled'; result?: unknown; error?: { code: string; message: string } },
): Promise<void> {
  await db('simulations')
    .where({ id })
    .whereIn('status', ['queued', 'running'])
    .update({
      status: outcome.status,
      progress: outcome.status === 'succeeded' ? 1 : db.raw('progress'),
      result: outcome.result === undefined ? null : JSON.stringify(outcome.result),
      error: outcome.error ? JSON.stringify(outcome.error) : null,
      finished_at: db.fn.now(),
    });
}

/** A queued run is cancelled at once; a running one is asked to stop (its worker polls the flag). */
export async function requestCancel(db: Db, id: string): Promise<void> {
  await db('simulations').where({ id, status: 'queued' }).update({ status: 'cancelled', cancel_requested: true, finished_at: db.fn.now() });
  await db('simulations').where({ id, status: 'running' }).update({ cancel_requested: true });
}
