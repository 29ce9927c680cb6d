import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { flushPromises } from '@vue/test-utils';
import * as service from '@web/services/simulations';
import { simulationFor, simulationKey, useSimulation } from '@web/composables/useSimulation';
import { ApiError } from '@web/services/http';

vi.mock('@web/services/simulations', async (original) => ({
  ...(await original<typeof import('@web/services/simulations')>()),
  startSimulation: vi.fn(),
  fetchSimulation: vi.fn(),
  cancelSimulation: vi.fn(),
}));

/** A stand-in for the browser's EventSource that the test drives by hand. */
class FakeEventSource {
  static last: FakeEventSource | null = null;
  listeners = new Map<string, ((event: MessageEvent) => void)[]>();
  closed = false;
  constructor(readonly url: string, readonly init?: EventSourceInit) {
    FakeEventSource.last = this;
  }
  addEventListener(name: string, listener: (event: MessageEvent) => void) {
    this.listeners.set(name, [...(this.listeners.get(name) ?? []), listener]);
  }
  emit(name: string, data: unknown) {
    for (const listener of this.listeners.get(name) ?? []) listener(new MessageEvent(name, { data: JSON.stringify(data) }));
  }
  close() {
    this.closed = true;
  }
}

const request = { text: 'D1: N2O5 -> NO3 + NO2 @ 0.05\n', inputs: { initial: { N2O5: 1e12 }, tEnd: 60 } } as service.StartSimulationRequest;
const result = { times: [0, 60], species: ['N2O5'] } as unknown as service.SimulationResult;
let keyCount = 0;
let key: string;

beforeEach(() => {
  vi.stubGlobal('EventSource', FakeEventSource);
  key = simulationKey('first-order', (keyCount += 1));
});
afterEach(() => {
  vi.unstubAllGlobals();
  vi.clearAllMocks();
});

describe('useSimulation', () => {
  it('posts the run, follows progress over server-sent events, then fetches the result', async () => {
    vi.mocked(service.startSimulation).mockResolvedValue({ id: 'run-1', status: 'queued' });
    vi.mocked(service.fetchSimulation).mockResolvedValue({ id: 'run-1', status: 'succeeded', progress: 1, result, error: null });
    const { state, running, run } = useSimulation(key);
    await run(request);
    expect(service.startSimulation).toHaveBeenCalledWith(request);
    const events = FakeEventSource.last!;
    expect(events.url).toBe('/api/simulations/run-1/events');
    expect(events.init).toEqual({ withCredentials: true });
    expect(running.value).toBe(true);
    events.emit('progress', { status: 'running', progress: 0.4, error: null });
    expect(state.value).toMatchObject({ phase: 'running', progress: 0.4 });
    events.emit('done', { status: 'succeeded', progress: 1, error: null });
    await flushPromises();
    expect(events.closed).toBe(true);
    expect(state.value).toMatchObject({ phase: 'succeeded', progress: 1, result });
    expect(running.value).toBe(false);
  });

  it('shares one run between panels under the same key', async () => {
    vi.mocked(service.startSimulation).mockResolvedValue({ id: 'run-2', status: 'queued' });
    await useSimulation(key).run(request);
    expect(simulationFor(key).state.runId).toBe('run-2');
    expect(useSimulation(key).state.value.phase).toBe('queued');
  });

  it('reports a failed run with the server’s code and message', async () => {
    vi.mocked(service.startSimulation).mockResolvedValue({ id: 'run-3', status: 'queued' });
    const { state, run } = useSimulation(key);
    await run(request);
    FakeEventSource.last!.emit('done', { status: 'failed', progress: 0.2, error: { code: 'SOLVER_FAILED', message: 'step size underflow at t = 3.2 s' } });
    await flushPromises();
    expect(state.value.phase).toBe('failed');
    expect(state.value.error?.message).toBe('step size underflow at t = 3.2 s');
    expect(service.fetchSimulation).not.toHaveBeenCalled();
  });

  it('cancels a running run and stops listening', async () => {
    vi.mocked(service.startSimulation).mockResolvedValue({ id: 'run-4', status: 'queued' });
    vi.mocked(service.cancelSimulation).mockResolvedValue({ id: 'run-4', status: 'cancelled', progress: 0.3, result: null, error: null });
    const { state, run, cancel } = useSimulation(key);
    await run(request);
    await cancel();
    expect(service.cancelSimulation).toHaveBeenCalledWith('run-4');
    expect(state.value.phase).toBe('cancelled');
    expect(FakeEventSource.last!.closed).toBe(true);
  });

  it('takes a cached answer at once, without an event stream', async () => {
    FakeEventSource.last = null;
    vi.mocked(service.startSimulation).mockResolvedValue({ id: 'run-5', status: 'succeeded', cached: true });
    vi.mocked(service.fetchSimulation).mockResolvedValue({ id: 'run-5', status: 'succeeded', progress: 1, result, error: null });
    const { state, run } = useSimulation(key);
    await run(request);
    expect(FakeEventSource.last).toBeNull();
    expect(state.value).toMatchObject({ phase: 'succeeded', result });
  });

  it('keeps a refused start as the error, with its details for the form', async () => {
    const refused = new ApiError(422, 'PARSE_FAILED', 'The mechanism has 1 error(s)', { diagnostics: [] });
    vi.mocked(service.startSimulation).mockRejectedValue(refused);
    const { state, run } = useSimulation(key);
    await run(request);
    expect(state.value).toMatchObject({ phase: 'failed', error: refused, runId: null });
  });
});
