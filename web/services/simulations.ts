import type { SimulationInputs, SimulationInputsBody, SimulationResult, SimulationStatus } from '@api/simulations/simulations.schemas';
import { http } from './http';

export type { SimulationInputs, SimulationResult, SimulationStatus };

/** The body of `POST /api/simulations`: the editor's text (saved or not) and the run settings. */
export interface StartSimulationRequest {
  text: string;
  inputs: SimulationInputsBody;
}

/** 202 `{ status: 'queued' }` for a new run, 200 with `cached: true` when the same run succeeded before. */
export interface StartedSimulation {
  id: string;
  status: SimulationStatus;
  cached?: boolean;
}

/** `GET /api/simulations/:id`. */
export interface SimulationRun {
  id: string;
  status: SimulationStatus;
  progress: number;
  result: SimulationResult | null;
  error: { code: string; message: string } | null;
}

/** The payload of the `progress` and `done` server-sent events. */
export interface SimulationProgress {
  status: SimulationStatus;
  progress: number;
  error: { code: string; message: string } | null;
}

export function startSimulation(body: StartSimulationRequest): Promise<StartedSimulation> {
  return http.post<StartedSimulation>('/api/simulations', body);
}

export function fetchSimulation(id: string): Promise<SimulationRun> {
  return http.get<SimulationRun>(`/api/simulations/${encodeURIComponent(id)}`);
}

export function cancelSimulation(id: string): Promise<SimulationRun> {
  return http.post<SimulationRun>(`/api/simulations/${encodeURIComponent(id)}/cancel`);
}

/** Same origin, so the session cookie goes with the EventSource request. */
export function simulationEventsUrl(id: string): string {
  return `/api/simulations/${encodeURIComponent(id)}/events`;
}
