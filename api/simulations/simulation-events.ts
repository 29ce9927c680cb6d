import type { Request, Response } from 'express';
import type { Knex } from 'knex';
import * as simulations from './simulations.queries';

const TERMINAL = new Set(['succeeded', 'failed', 'cancelled']);
const POLL_MS = 300;

/**
 * Server-sent events for one run: `progress` whenever status or progress changes, then `done`.
 * Polling the row keeps this independent of which process runs the job.
 */
export function streamSimulationEvents(db: Knex, id: string, req: Request, res: Response): void {
  res.writeHead(200, { 'Content-Type': 'text/event-stream', 'Cache-Control': 'no-cache', Connection: 'keep-alive' });
  res.write('retry: 2000\n\n');
  let last = '';
  let closed = false;
  const send = (event: string, data: unknown) => res.write(`event: ${event}\ndata: ${JSON.stringify(data)}\n\n`);
  const tick = async () => {
    if (closed) return;
    const row = await simulations.findStatus(db, id).catch(() => undefined);
    if (row) {
      const payload = { status: row.status, progress: row.progress, error: row.error };
      const text = JSON.stringify(payload);
      if (text !== last) send('progress', payload);
      last = text;
      if (TERMINAL.has(row.status)) {
        send('done', payload);
        closed = true;
        return void res.end();
      }
    }
    timer = setTimeout(tick, POLL_MS);
  };
  let timer = setTimeout(tick, 0);
  req.on('close', () => {
    closed = true;
    clearTimeout(timer);
  });
}
