import { Worker } from 'node:worker_threads';
import type { SimulationInputs } from './simulations.schemas';

// Worker threads do not inherit tsx's loader, so the thread registers it before loading the TypeScript entry.
const THREAD_URL = new URL('./simulation.thread.ts', import.meta.url).href;
const THREAD_BOOT = `import('tsx/esm/api').then(({ register }) => { register(); return import(${JSON.stringify(THREAD_URL)}); })`;

export interface ThreadTask {
  text: string;
  inputs: SimulationInputs;
  /** Int32 flag: the thread stops the solver when cancel[0] becomes 1. */
  cancel: SharedArrayBuffer;
  onProgress: (fraction: number) => void;
}

export type ThreadOutcome = { type: 'done'; result: { status: string } & Record<string, unknown> } | { type: 'error'; message: string };

/**
 * One long-lived simulation thread: loading the engine once keeps each run fast, and the server's
 * own thread stays free to answer requests. A thread that must be killed (time limit) is replaced.
 */
export class SimulationThread {
  private worker: Worker | null = null;
  private current: { task: ThreadTask; resolve: (outcome: ThreadOutcome) => void } | null = null;

  run(task: ThreadTask): Promise<ThreadOutcome> {
    if (this.current) throw new Error('the simulation thread is busy');
    const worker = this.worker ?? this.spawn();
    return new Promise((resolve) => {
      this.current = { task, resolve };
      worker.postMessage({ text: task.text, inputs: task.inputs, cancel: task.cancel });
    });
  }

  /** Starts the thread ahead of the first run, so that run does not wait for the engine to load. */
  warmUp(): void {
    if (!this.worker) this.spawn();
  }

  /** Ends the thread (a run over its time limit, or shutdown); the waiting run gets the reason. */
  async kill(reason: string): Promise<void> {
    const worker = this.worker;
    this.worker = null;
    this.settle({ type: 'error', message: reason });
    await worker?.terminate();
  }

  private spawn(): Worker {
    const worker = new Worker(THREAD_BOOT, { eval: true });
    worker.on('message', (message) => {
      if (message.type === 'progress') this.current?.task.onProgress(message.fraction);
      else this.settle(message as ThreadOutcome);
    });
    worker.on('error', (error) => {
      this.worker = null;
      this.settle({ type: 'error', message: error.message });
    });
    worker.on('exit', () => {
      if (this.worker === worker) this.worker = null;
      this.settle({ type: 'error', message: 'the simulation thread stopped unexpectedly' });
    });
    this.worker = worker;
    return worker;
  }

  private settle(outcome: ThreadOutcome): void {
    const current = this.current;
    this.current = null;
    current?.resolve(outcome);
  }
}
