import type { Comparison } from '@api/comparison/comparison.schemas';
import { http } from './http';

export type { ComparedRoute, ComparedStep, Comparison, LineHunk, StepChange } from '@api/comparison/comparison.schemas';

/** The chemistry-aware comparison of two revisions and the line diff of their texts. */
export function compareRevisions(slug: string, from: number, to: number): Promise<Comparison> {
  const query = new URLSearchParams({ from: String(from), to: String(to) });
  return http.get<Comparison>(`/api/mechanisms/${encodeURIComponent(slug)}/compare?${query}`);
}
