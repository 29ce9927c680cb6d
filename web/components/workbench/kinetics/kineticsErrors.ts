import { ApiError } from '@web/services/http';

interface Located {
  line?: number;
  column?: number;
  message?: string;
  id?: string;
  path?: (string | number)[];
}

function describe(item: Located): string {
  if (item.path) return `${item.path.join('.') || 'request'}: ${item.message ?? ''}`;
  const where = item.line ? `line ${item.line}${item.column ? `, column ${item.column}` : ''}` : '';
  const what = item.message ?? (item.id ? `step ${item.id}` : '');
  return [where, what].filter(Boolean).join(': ');
}

/**
 * The why and where of a failed run, one line each: the server's message first, then the
 * places its `details` name (zod issues, diagnostics, steps without a rate, unknown species).
 */
export function errorLines(error: Error | null): string[] {
  if (!error) return [];
  const lines = [error.message];
  const details = error instanceof ApiError ? error.details : undefined;
  if (Array.isArray(details)) return [...lines, ...details.map((d) => describe(d as Located))];
  if (details && typeof details === 'object') {
    const { diagnostics, steps, unknown } = details as { diagnostics?: Located[]; steps?: Located[]; unknown?: string[] };
    for (const list of [diagnostics, steps]) if (Array.isArray(list)) lines.push(...list.map(describe));
    if (Array.isArray(unknown)) lines.push(`unknown species: ${unknown.join(', ')}`);
  }
  return lines;
}
