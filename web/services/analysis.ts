import type { MechanismAnalysis } from '@api/analysis/analysis.schemas';
import { http } from './http';

/** `POST /api/analyse`: the engine's full analysis of unsaved text (the server is the one place that analyses). */
export function analyseText(text: string, signal?: AbortSignal): Promise<MechanismAnalysis> {
  return http.post<MechanismAnalysis>('/api/analyse', { text }, { signal });
}
