import type { LightProfile } from '@api/chemistry/kinetics/light';
import type { KineticModel } from '@api/chemistry/kinetics/model';
import { simulate } from '@api/chemistry/kinetics/simulate';
import type { SimulationResult } from '@api/chemistry/kinetics/simulation-types';
import { hubAndChainInitial, hubAndChainMechanism } from './kinetics-chain-mechanism';
import { randomGraphInitial, randomGraphMechanism } from './kinetics-mechanism';
import { runPeer, type PeerRun } from './kinetics-peer';
import type { BenchRow, BenchSuite } from './types';

const PEER_CAP_MS = 3000;
const GROUP = 'kinetics';

interface Case {
  title: string;
  model: KineticModel;
  initial: Record<string, number>;
  tEnd: number;
  light: LightProfile;
  rtol: number;
  atol?: number;
  target: string;
}

const robertson: Case = {
  title: 'Robertson to 4e10 (rtol 1e-6, atol 1e-14)',
  model: {
    species: ['A', 'B', 'C'], unit: 'mol L^-1',
    steps: [
      { label: 'R1', reactants: [{ index: 0, coef: 1 }], products: [{ index: 1, coef: 1 }], thirdBody: false, photolysis: false, forward: '0.04', reverse: null },
      { label: 'R2', reactants: [{ index: 1, coef: 2 }], products: [{ index: 1, coef: 1 }, { index: 2, coef: 1 }], thirdBody: false, photolysis: false, forward: '3e7', reverse: null },
      { label: 'R3', reactants: [{ index: 1, coef: 1 }, { index: 2, coef: 1 }], products: [{ index: 0, coef: 1 }, { index: 2, coef: 1 }], thirdBody: false, photolysis: false, forward: '1e4', reverse: null },
    ],
  },
  initial: { A: 1 }, tEnd: 4e10, light: { kind: 'constant', level: 1 }, rtol: 1e-6, atol: 1e-14, target: '< 20 ms',
};

const diurnal: LightProfile = { kind: 'diurnal', latitudeDeg: 40, declinationDeg: 15, noon: 43_200 };
const hubAndChain = hubAndChainMechanism(200, 600);
const dayCase: Case = {
  title: 'hub-and-chain 200 species / 600 steps, 1 day, diurnal J (rtol 1e-4)',
  model: hubAndChain, initial: hubAndChainInitial(hubAndChain), tEnd: 86_400, light: diurnal, rtol: 1e-4, target: '< 2 s',
};
const randomGraph = randomGraphMechanism(200, 600);
const randomCase: Case = {
  title: 'random-graph 200 species / 600 steps, 1 day, diurnal J (rtol 1e-4)',
  model: randomGraph, initial: randomGraphInitial(randomGraph), tEnd: 86_400, light: diurnal, rtol: 1e-4, target: 'worst case for sparsity',
};

function runOnce(c: Case): { ms: number; result: SimulationResult } {
  const start = performance.now();
  const result = simulate({
    model: c.model, conditions: { T: 298, P: 1 }, initial: c.initial, tEnd: c.tEnd, output: { kind: 'log', points: 50 },
    light: c.light, rtol: c.rtol, atol: c.atol,
  });
  return { ms: performance.now() - start, result };
}

/** Median wall time of `repeats` runs after `warmups` runs (the JIT compiles the solver first). */
function measure(c: Case, warmups: number, repeats: number): { ms: number; result: SimulationResult } {
  for (let k = 0; k < warmups; k++) runOnce(c);
  const runs = Array.from({ length: repeats }, () => runOnce(c)).sort((a, b) => a.ms - b.ms);
  return runs[Math.floor(runs.length / 2)];
}

function peerName(peer: PeerRun, tEnd: number): string {
  const reach = peer.finished ? 'finished' : `capped, reached t = ${peer.reachedTime.toExponential(2)} of ${tEnd.toExponential(0)} s`;
  return `mathjs solveODE RK45 (${reach})`;
}

/**
 * The capped peer's time carried linearly to the whole span, over RODAS4's time: an estimate, fair
 * for an explicit method whose step is held down by stability (roughly constant once the fastest
 * modes have decayed).
 */
function extrapolatedRatio(c: Case, peer: PeerRun, ms: number): BenchRow {
  const fullSpanMs = peer.reachedTime > 0 ? (peer.ms * c.tEnd) / peer.reachedTime : Infinity;
  return { group: GROUP, name: `${c.title}: peer extrapolated to the span / RODAS4`, value: fullSpanMs / ms, unit: '× (estimate)' };
}

function caseRows(c: Case, warmups: number, repeats: number): BenchRow[] {
  const { ms, result } = measure(c, warmups, repeats);
  const y0 = c.model.species.map((key) => c.initial[key] ?? 0);
  const peer = runPeer(c.model, y0, c.tEnd, c.light, c.rtol, PEER_CAP_MS);
  const { accepted, rejected } = result.stats;
  return [
    { group: GROUP, name: `${c.title}: RODAS4 time`, value: ms, unit: 'ms', baseline: { name: peerName(peer, c.tEnd), value: peer.ms, unit: 'ms' }, target: c.target },
    { group: GROUP, name: `${c.title}: accepted steps`, value: accepted, unit: 'steps', baseline: { name: 'rejected steps', value: rejected, unit: 'steps' } },
    { group: GROUP, name: `${c.title}: peer time / RODAS4 time`, value: peer.ms / ms, unit: peer.finished ? '×' : '× (at least)' },
    ...(peer.finished ? [] : [extrapolatedRatio(c, peer, ms)]),
  ];
}

/** RODAS4 on the Robertson problem and on generated 200-species day runs, beside mathjs solveODE. */
const kineticsBench: BenchSuite = async () => [...caseRows(robertson, 20, 9), ...caseRows(dayCase, 1, 3), ...caseRows(randomCase, 1, 1)];

export default kineticsBench;
