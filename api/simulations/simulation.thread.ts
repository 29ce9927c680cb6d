import { parentPort } from 'node:worker_threads';
import { runSimulation } from './run-simulation';
import type { SimulationInputs } from './simulations.schemas';

/**
 * The simulation thread: takes one run at a time from the parent, posts progress and the outcome.
 * The parent sets cancel[0] = 1 to stop the solver between steps.
 */
interface ThreadRequest {
  text: string;
  inputs: SimulationInputs;
  cancel: SharedArrayBuffer;
}

parentPort!.on('message', ({ text, inputs, cancel }: ThreadRequest) => {
  const flag = new Int32Array(cancel);
  try {
    const result = runSimulation(text, inputs, {
      shouldStop: () => Atomics.load(flag, 0) === 1,
      onProgress: (fraction) => parentPort!.postMessage({ type: 'progress', fraction }),
    });
    parentPort!.postMessage({ type: 'done', result });
  } catch (error) {
    parentPort!.postMessage({ type: 'error', message: error instanceof Error ? error.message : String(error) });
  }
});
