import { setFlagsFromString } from 'node:v8';
import { runInNewContext } from 'node:vm';
import { parseMechanism } from '@grammar/parse';
import { analyseMechanism } from '@api/chemistry/analyse';
import { forgetSharedResolutions } from '@api/chemistry/species-registry';
import { generateMechanism } from '../../examples/generate-large';
import type { BenchRow, BenchSuite } from './types';

const SIZES = [1_000, 10_000, 50_000];

// A full collection before each measurement, so that garbage of the set-up is not billed to the engine.
setFlagsFromString('--expose-gc');
const collect = runInNewContext('gc') as () => void;

/** Wall time and the process's CPU time (user + system, all threads): on a shared machine the CPU time shows the work. */
function timed<T>(work: () => T): { result: T; ms: number; cpuMs: number } {
  const cpu = process.cpuUsage();
  const start = performance.now();
  const result = work();
  const used = process.cpuUsage(cpu);
  return { result, ms: performance.now() - start, cpuMs: (used.user + used.system) / 1000 };
}

/** The same steps as plain JSON: what parsing costs when the text is already structured (the floor). */
function prestructured(text: string): string {
  const steps = parseMechanism(text).steps.map((step) => ({
    label: step.label?.text ?? null,
    reversible: step.reversible,
    reactants: step.reactants.map((term) => ({ coef: term.coefficient?.text ?? '1', species: term.particle.kind === 'species' ? term.particle.text : term.particle.text })),
    products: step.products.map((term) => ({ coef: term.coefficient?.text ?? '1', species: term.particle.text })),
    rate: step.rate?.forward ?? null,
  }));
  return JSON.stringify(steps);
}

/** Heap the result of analysing `text` holds (analysed once more and kept until measured). */
function heldByResult(text: string): number {
  collect();
  const heapBefore = process.memoryUsage().heapUsed;
  const result = analyseMechanism(text);
  collect();
  const held = (process.memoryUsage().heapUsed - heapBefore) / 2 ** 20;
  return result ? held : 0;
}

function sizeRows(steps: number): BenchRow[] {
  const text = generateMechanism(steps);
  const json = prestructured(text);
  collect();
  const floor = timed(() => JSON.parse(json) as unknown[]);
  // Warm: the server analyses many texts, so the compiled code is what counts; a small text is
  // analysed more often, so that every size runs optimised code (about 20 000 steps of warm-up).
  for (let warm = 0; warm < Math.max(1, Math.round(20_000 / steps)); warm += 1) analyseMechanism(text);
  forgetSharedResolutions(); // …but every spelling is new to it, as in a text never seen before
  collect();
  // Only the figures are kept, so that no earlier result weighs on the next measurement.
  const run = timed(() => analyseMechanism(text) !== null);
  const heldMb = heldByResult(text);
  collect();
  const again = timed(() => analyseMechanism(text) !== null); // the workbench's case: the same spellings once more
  const group = 'engine';
  const name = `${steps} steps`;
  const floorRow = { name: 'JSON.parse of the same steps', value: floor.ms, unit: 'ms' };
  const floorRate = { ...floorRow, name: 'JSON.parse steps/s', value: (steps / floor.ms) * 1000, unit: 'steps/s' };
  return [
    { group, name: `${name}: check time (wall)`, value: run.ms, unit: 'ms', baseline: floorRow },
    { group, name: `${name}: check time (CPU)`, value: run.cpuMs, unit: 'ms', baseline: { ...floorRow, value: floor.cpuMs } },
    { group, name: `${name}: steps/s (wall)`, value: (steps / run.ms) * 1000, unit: 'steps/s', baseline: floorRate, target: '≥ 50000 steps/s' },
    { group, name: `${name}: steps/s (CPU)`, value: (steps / run.cpuMs) * 1000, unit: 'steps/s', target: '≥ 50000 steps/s' },
    { group, name: `${name}: same text again (wall)`, value: again.ms, unit: 'ms', baseline: floorRow },
    { group, name: `${name}: heap held by the result`, value: heldMb, unit: 'MB' },
    { group, name: `${name}: peak RSS of the process so far`, value: process.resourceUsage().maxRSS / 1024, unit: 'MB' },
  ];
}

function routeRows(): BenchRow[] {
  const text = generateMechanism(300, 40);
  analyseMechanism(text);
  const run = timed(() => analyseMechanism(text));
  const { steps, species, routes } = run.result;
  collect();
  const name = `routes, ${steps.length} steps / ${species.length} species (${routes.length} routes)`;
  return [
    { group: 'engine', name: `${name} (wall)`, value: run.ms, unit: 'ms', target: '< 500 ms' },
    { group: 'engine', name: `${name} (CPU)`, value: run.cpuMs, unit: 'ms', target: '< 500 ms' },
  ];
}

/** Engine throughput on generated mechanisms of 1k, 10k and 50k steps, and exact route analysis at 300 steps. */
const engineBench: BenchSuite = async () => {
  const rows = SIZES.flatMap(sizeRows);
  return [...rows, ...routeRows()];
};

export default engineBench;
