import { ApiError } from './http';
import type { ValidationIssue } from './types';

export const VALIDATION_FAILED = 'VALIDATION_FAILED';

function isIssue(value: unknown): value is ValidationIssue {
  if (typeof value !== 'object' || value === null) return false;
  const issue = value as Partial<ValidationIssue>;
  return Array.isArray(issue.path) && typeof issue.message === 'string';
}

/**
 * The server's zod issues as `{ field: message }`, keyed by the first path segment
 * (the first message per field wins, as zod lists the most basic problem first).
 */
export function fieldErrorsOf(error: unknown): Record<string, string> {
  if (!(error instanceof ApiError) || error.code !== VALIDATION_FAILED || !Array.isArray(error.details)) return {};
  const fields: Record<string, string> = {};
  for (const issue of error.details.filter(isIssue)) {
    const field = String(issue.path[0] ?? '');
    fields[field] ??= issue.message;
  }
  return fields;
}
