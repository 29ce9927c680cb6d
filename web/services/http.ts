import type { ApiErrorBody } from './types';

/** Any failed API call: the server's `{ error: { code, message, details } }`, or a local stand-in. */
export class ApiError extends Error {
  override readonly name = 'ApiError';

  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
  }
}

/** What the client needs from the rest of the app; wired once at start-up (plugins/http.ts). */
export interface HttpHooks {
  csrfToken: () => string;
  onUnauthorized: (error: ApiError) => void;
  /** The token went stale (the session changed in another tab): fetch a fresh one for the retry. */
  onCsrfRejected: (error: ApiError) => void;
}

let hooks: HttpHooks = { csrfToken: () => '', onUnauthorized: () => {}, onCsrfRejected: () => {} };

export const CSRF_INVALID = 'CSRF_INVALID';

export function configureHttp(next: Partial<HttpHooks>): void {
  hooks = { ...hooks, ...next };
}

/** The session's CSRF token, for requests that cannot go through `request` (upload progress needs XMLHttpRequest). */
export const csrfToken = (): string => hooks.csrfToken();

export interface RequestOptions {
  method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  body?: unknown;
  signal?: AbortSignal;
  /** False where a 401 is an expected answer (wrong password), not a lost session. */
  handleUnauthorized?: boolean;
}

export const NETWORK_ERROR = 'NETWORK_ERROR';

export async function request<T>(path: string, options: RequestOptions = {}): Promise<T> {
  const method = options.method ?? 'GET';
  const response = await send(path, method, options);
  if (response.ok) return readSuccess<T>(response);
  const error = await readError(response);
  reportSessionProblem(error, options.handleUnauthorized !== false);
  throw error;
}

/** Tells the app about a lost session (401) or a stale CSRF token, as every request does. */
export function reportSessionProblem(error: ApiError, handleUnauthorized = true): void {
  if (error.status === 401 && handleUnauthorized) hooks.onUnauthorized(error);
  if (error.status === 403 && error.code === CSRF_INVALID) hooks.onCsrfRejected(error);
}

async function send(path: string, method: string, options: RequestOptions): Promise<Response> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (options.body !== undefined) headers['Content-Type'] = 'application/json';
  if (method !== 'GET') headers['X-CSRF-Token'] = hooks.csrfToken();
  try {
    return await fetch(path, {
      method,
      headers,
      credentials: 'same-origin',
      body: options.body === undefined ? undefined : JSON.stringify(options.body),
      signal: options.signal,
    });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new ApiError(0, NETWORK_ERROR, 'The Cyclewright server could not be reached. Check your connection and try again.');
  }
}

async function readSuccess<T>(response: Response): Promise<T> {
  if (response.status === 204) return undefined as T;
  const text = await response.text();
  return (text === '' ? undefined : JSON.parse(text)) as T;
}

async function readError(response: Response): Promise<ApiError> {
  const body = await response.json().catch(() => null);
  return errorFromResponse(response.status, response.statusText, body);
}

/** The ApiError for a failed response and its parsed body (null when the body was not JSON). */
export function errorFromResponse(status: number, statusText: string, body: unknown): ApiError {
  if (isErrorBody(body)) {
    const { code, message, details } = body.error;
    return new ApiError(status, code, message || `The server refused the request (${code}).`, details);
  }
  return new ApiError(status, `HTTP_${status}`, `The server answered ${status} (${statusText || 'no reason given'}).`);
}

function isErrorBody(body: unknown): body is ApiErrorBody {
  if (typeof body !== 'object' || body === null || !('error' in body)) return false;
  const error = (body as { error: unknown }).error;
  return typeof error === 'object' && error !== null && typeof (error as { code?: unknown }).code === 'string';
}

export const http = {
  get: <T>(path: string, options?: Omit<RequestOptions, 'method' | 'body'>) => request<T>(path, options),
  post: <T>(path: string, body?: unknown, options?: Omit<RequestOptions, 'method' | 'body'>) =>
    request<T>(path, { ...options, method: 'POST', body }),
  put: <T>(path: string, body?: unknown, options?: Omit<RequestOptions, 'method' | 'body'>) =>
    request<T>(path, { ...options, method: 'PUT', body }),
  delete: <T>(path: string, options?: Omit<RequestOptions, 'method' | 'body'>) =>
    request<T>(path, { ...options, method: 'DELETE' }),
};
