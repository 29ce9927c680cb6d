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

/** Runs per measurement: one run on this shared machine can be a third slower than the next, so the median is printed. */
const RUNS = 5;

interface Timings {
  wall: number[];
  cpu: number[];
}

function median(values: readonly number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}

/** `RUNS` timings of `work`, each after `prepare` and a full collection (nothing a run makes is kept). */
function timings(work: () => unknown, prepare: () => void = () => undefined): Timings {
  const wall: number[] = [];
  const cpu: number[] = [];
  for (let run = 0; run < RUNS; run += 1) {
    prepare();
    collect();
    const { ms, cpuMs } = timed(() => work() !== null);
    wall.push(ms);
    cpu.push(cpuMs);
  }
  return { wall, cpu };
}

interface SizeFigures {
  steps: number;
  rows: BenchRow[];
  /** Median wall times of the engine and of the floor, for the growth between sizes. */
  engineMs: number;
  floorMs: number;
}

function measureSize(steps: number): SizeFigures {
  const text = generateMechanism(steps);
  const json = prestructured(text);
  const floor = timings(() => JSON.parse(json) as unknown[]);
  // Warm: the server analyses many texts, so the compiled code is what counts; a small text is
  // analysed more often, so that every size runs optimised code (about 20 000 steps of warm-up).
  for (let warm = 0; warm < Math.max(1, Math.round(20_000 / steps)); warm += 1) analyseMechanism(text);
  // Each run meets every spelling anew (the kept resolutions are forgotten), as a text never seen
  // before; only the figures are kept, so that no earlier result weighs on the next run.
  const run = timings(() => analyseMechanism(text), forgetSharedResolutions);
  const heldMb = heldByResult(text);
  const again = timings(() => analyseMechanism(text)); // the workbench's case: the same spellings once more
  const group = 'engine';
  const name = `${steps} steps`;
  const floorMs = median(floor.wall);
  const engineMs = median(run.wall);
  const floorRow = { name: `JSON.parse of the same steps (median)`, value: floorMs, unit: 'ms' };
  const floorRate = { ...floorRow, name: 'JSON.parse steps/s', value: (steps / floorMs) * 1000, unit: 'steps/s' };
  const rows: BenchRow[] = [
    { group, name: `${name}: check time (wall, median of ${RUNS})`, value: engineMs, unit: 'ms', baseline: floorRow },
    { group, name: `${name}: check time (wall, fastest)`, value: Math.min(...run.wall), unit: 'ms', baseline: { ...floorRow, name: 'JSON.parse fastest', value: Math.min(...floor.wall) } },
    { group, name: `${name}: check time (wall, slowest)`, value: Math.max(...run.wall), unit: 'ms', baseline: { ...floorRow, name: 'JSON.parse slowest', value: Math.max(...floor.wall) } },
    { group, name: `${name}: check time (CPU, median)`, value: median(run.cpu), unit: 'ms', baseline: { ...floorRow, value: median(floor.cpu) } },
    { group, name: `${name}: steps/s (wall, median)`, value: (steps / engineMs) * 1000, unit: 'steps/s', baseline: floorRate, target: '≥ 50000 steps/s' },
    { group, name: `${name}: steps/s (CPU, median)`, value: (steps / median(run.cpu)) * 1000, unit: 'steps/s', target: '≥ 50000 steps/s' },
    { group, name: `${name}: same text again (wall, median)`, value: median(again.wall), unit: 'ms', baseline: floorRow },
    { group, name: `${name}: heap held by the result`, value: heldMb, unit: 'MB' },
    { group, name: `${name}: peak RSS of the process so far`, value: process.resourceUsage().maxRSS / 1024, unit: 'MB' },
  ];
  return { steps, rows, engineMs, floorMs };
}

/**
 * How the time grows from one size to the next, beside how the floor grows on the same machine:
 * linear growth is the ratio of the sizes; `JSON.parse`, which also keeps every step, shows what
 * the memory of this machine adds on top of that.
 */
function growthRows(sizes: readonly SizeFigures[]): BenchRow[] {
  return sizes.slice(1).map((larger, index) => {
    const smaller = sizes[index];
    const name = `growth ${smaller.steps} → ${larger.steps} steps (×${larger.steps / smaller.steps} steps)`;
    const floor = { name: 'JSON.parse growth', value: larger.floorMs / smaller.floorMs, unit: '×' };
    return { group: 'engine', name, value: larger.engineMs / smaller.engineMs, unit: '×', baseline: floor, target: `close to ×${larger.steps / smaller.steps}` };
  });
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
  const sizes = SIZES.map(measureSize);
  return [...sizes.flatMap((size) => size.rows), ...growthRows(sizes), ...routeRows()];
};

export default engineBench;
