import { computed, reactive, toValue, type MaybeRefOrGetter } from 'vue';
import {
  cancelSimulation,
  fetchSimulation,
  simulationEventsUrl,
  startSimulation,
  type SimulationProgress,
  type SimulationResult,
  type SimulationStatus,
  type StartSimulationRequest,
} from '@web/services/simulations';

export type RunPhase = 'idle' | 'starting' | SimulationStatus;

export interface SimulationState {
  runId: string | null;
  phase: RunPhase;
  /** 0…1 as the server reports it. */
  progress: number;
  result: SimulationResult | null;
  error: Error | null;
}

/** One mechanism's runs: the kinetics panel starts them, the network panel reads the latest result. */
export interface SharedSimulation {
  state: SimulationState;
  run: (request: StartSimulationRequest) => Promise<void>;
  cancel: () => Promise<void>;
}

const TERMINAL: ReadonlySet<RunPhase> = new Set(['succeeded', 'failed', 'cancelled']);
const shared = new Map<string, SharedSimulation>();

function failure(error: { code: string; message: string } | null, fallback: string): Error {
  return Object.assign(new Error(error?.message ?? fallback), { code: error?.code ?? 'SIMULATION_FAILED' });
}

function createSimulation(): SharedSimulation {
  const state = reactive<SimulationState>({ runId: null, phase: 'idle', progress: 0, result: null, error: null });
  let events: EventSource | null = null;

  const stopListening = () => {
    events?.close();
    events = null;
  };

  async function finish(id: string, payload: SimulationProgress): Promise<void> {
    stopListening();
    if (state.runId !== id) return;
    if (payload.status === 'succeeded') {
      const run = await fetchSimulation(id);
      if (state.runId !== id) return;
      state.result = run.result;
    }
    state.phase = payload.status;
    state.progress = payload.progress;
    if (payload.status === 'failed') state.error = failure(payload.error, 'The simulation failed.');
  }

  function follow(id: string): void {
    stopListening();
    events = new EventSource(simulationEventsUrl(id), { withCredentials: true });
    events.addEventListener('progress', (event) => {
      const payload = JSON.parse((event as MessageEvent).data) as SimulationProgress;
      if (state.runId !== id || TERMINAL.has(state.phase)) return;
      state.phase = payload.status;
      state.progress = payload.progress;
    });
    events.addEventListener('done', (event) => {
      void finish(id, JSON.parse((event as MessageEvent).data) as SimulationProgress).catch((error: Error) => {
        state.error = error;
        state.phase = 'failed';
      });
    });
  }

  async function run(request: StartSimulationRequest): Promise<void> {
    stopListening();
    Object.assign(state, { runId: null, phase: 'starting', progress: 0, error: null });
    try {
      const started = await startSimulation(request);
      state.runId = started.id;
      state.phase = started.status;
      if (TERMINAL.has(started.status)) await finish(started.id, { status: started.status, progress: 1, error: null });
      else follow(started.id);
    } catch (error) {
      state.phase = 'failed';
      state.error = error instanceof Error ? error : new Error(String(error));
    }
  }

  async function cancel(): Promise<void> {
    if (!state.runId || TERMINAL.has(state.phase)) return;
    const run = await cancelSimulation(state.runId);
    if (TERMINAL.has(run.status)) await finish(run.id, { status: run.status, progress: run.progress, error: run.error });
  }

  return { state, run, cancel };
}

/** The shared simulation of `key` (mechanism and revision), created on first use. */
export function simulationFor(key: string): SharedSimulation {
  let simulation = shared.get(key);
  if (!simulation) {
    simulation = createSimulation();
    shared.set(key, simulation);
  }
  return simulation;
}

/** The key runs are shared under: the mechanism's slug and revision number (`new` before the first save). */
export function simulationKey(slug: string | null | undefined, revision: number | null | undefined): string {
  return `${slug ?? 'new'}@r${revision ?? 0}`;
}

/** The simulation of the workbench's current mechanism and revision, following `key` as it changes. */
export function useSimulation(key: MaybeRefOrGetter<string>) {
  const simulation = computed(() => simulationFor(toValue(key)));
  const state = computed(() => simulation.value.state);
  const running = computed(() => ['starting', 'queued', 'running'].includes(state.value.phase));
  return {
    state,
    running,
    run: (request: StartSimulationRequest) => simulation.value.run(request),
    cancel: () => simulation.value.cancel(),
  };
}
