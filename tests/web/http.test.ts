import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { ApiError, configureHttp, http, NETWORK_ERROR } from '@web/services/http';

const fetchMock = vi.fn<typeof fetch>();
const onUnauthorized = vi.fn();
const onCsrfRejected = vi.fn();

function jsonResponse(status: number, body: unknown): Response {
  return new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });
}

function sentInit(call = 0): RequestInit {
  return fetchMock.mock.calls[call]![1]!;
}

beforeEach(() => {
  vi.stubGlobal('fetch', fetchMock);
  configureHttp({ csrfToken: () => 'token-abc', onUnauthorized, onCsrfRejected });
});

afterEach(() => {
  vi.unstubAllGlobals();
  fetchMock.mockReset();
  onUnauthorized.mockReset();
  onCsrfRejected.mockReset();
});

describe('http client requests', () => {
  it('sends GET with same-origin credentials, JSON accept and no CSRF header', async () => {
    fetchMock.mockResolvedValue(jsonResponse(200, { ok: 1 }));
    await expect(http.get('/api/session')).resolves.toEqual({ ok: 1 });
    const init = sentInit();
    expect(fetchMock.mock.calls[0]![0]).toBe('/api/session');
    expect(init.credentials).toBe('same-origin');
    expect(init.headers).toEqual({ Accept: 'application/json' });
  });

  it.each(['post', 'put'] as const)('sends %s with a JSON body and the X-CSRF-Token header', async (method) => {
    fetchMock.mockResolvedValue(jsonResponse(200, { id: 1 }));
    await http[method]('/api/thing', { name: 'Salt-lake bromine cycle' });
    const init = sentInit();
    expect(init.method).toBe(method.toUpperCase());
    expect(init.body).toBe('{"name":"Salt-lake bromine cycle"}');
    expect(init.headers).toMatchObject({ 'Content-Type': 'application/json', 'X-CSRF-Token': 'token-abc' });
  });

  it('sends the CSRF header on a body-less DELETE and reads 204 as undefined', async () => {
    fetchMock.mockResolvedValue(new Response(null, { status: 204 }));
    await expect(http.delete('/api/thing/3')).resolves.toBeUndefined();
    expect(sentInit().headers).toEqual({ Accept: 'application/json', 'X-CSRF-Token': 'token-abc' });
  });

  it('reads the token at request time, so a new sign-in token is used at once', async () => {
    let token = 'first';
    configureHttp({ csrfToken: () => token });
    fetchMock.mockImplementation(async () => jsonResponse(200, {}));
    await http.post('/api/a');
    token = 'second';
    await http.post('/api/b');
    expect((sentInit(1).headers as Record<string, string>)['X-CSRF-Token']).toBe('second');
  });
});

describe('http client errors', () => {
  it('maps the error body to ApiError with status, code, message and details', async () => {
    const details = [{ path: ['email'], message: 'Enter an e-mail address' }];
    fetchMock.mockResolvedValue(jsonResponse(400, { error: { code: 'VALIDATION_FAILED', message: 'Invalid input', details } }));
    const error = await http.post('/api/auth/sign-up', {}).catch((caught: unknown) => caught);
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ status: 400, code: 'VALIDATION_FAILED', message: 'Invalid input', details });
  });

  it('gives an error body without a message a readable one naming the code', async () => {
    fetchMock.mockResolvedValue(jsonResponse(409, { error: { code: 'CONFLICT' } }));
    await expect(http.get('/api/x')).rejects.toMatchObject({ code: 'CONFLICT', message: 'The server refused the request (CONFLICT).' });
  });

  it('maps a response without an error body to an HTTP_<status> error', async () => {
    fetchMock.mockResolvedValue(new Response('<html>Bad gateway</html>', { status: 502, statusText: 'Bad Gateway' }));
    await expect(http.get('/api/session')).rejects.toMatchObject({ status: 502, code: 'HTTP_502' });
  });

  it('turns a failed connection into a NETWORK_ERROR with status 0', async () => {
    fetchMock.mockRejectedValue(new TypeError('Failed to fetch'));
    await expect(http.get('/api/session')).rejects.toMatchObject({ status: 0, code: NETWORK_ERROR });
  });

  it('lets an abort through as an abort, not as a network error', async () => {
    fetchMock.mockRejectedValue(new DOMException('The operation was aborted.', 'AbortError'));
    await expect(http.get('/api/session')).rejects.toMatchObject({ name: 'AbortError' });
  });

  it('reports a 401 to the one unauthorized handler and still rejects', async () => {
    fetchMock.mockResolvedValue(jsonResponse(401, { error: { code: 'UNAUTHENTICATED', message: 'Sign in first' } }));
    await expect(http.get('/api/admin/users')).rejects.toMatchObject({ status: 401 });
    expect(onUnauthorized).toHaveBeenCalledTimes(1);
    expect(onUnauthorized.mock.calls[0]![0]).toMatchObject({ code: 'UNAUTHENTICATED' });
  });

  it('leaves a 401 alone where the caller expects it (a wrong password)', async () => {
    fetchMock.mockResolvedValue(jsonResponse(401, { error: { code: 'INVALID_CREDENTIALS', message: 'Wrong e-mail or password' } }));
    await expect(http.post('/api/auth/sign-in', {}, { handleUnauthorized: false })).rejects.toMatchObject({
      code: 'INVALID_CREDENTIALS',
    });
    expect(onUnauthorized).not.toHaveBeenCalled();
  });

  it('reports a rejected CSRF token (not as a lost session) and still rejects', async () => {
    fetchMock.mockResolvedValue(jsonResponse(403, { error: { code: 'CSRF_INVALID', message: 'Reload the page' } }));
    await expect(http.put('/api/admin/users/1/roles', { roles: [] })).rejects.toMatchObject({ status: 403, code: 'CSRF_INVALID' });
    expect(onCsrfRejected).toHaveBeenCalledTimes(1);
    expect(onUnauthorized).not.toHaveBeenCalled();
  });

  it('leaves other 403s to the caller', async () => {
    fetchMock.mockResolvedValue(jsonResponse(403, { error: { code: 'FORBIDDEN', message: 'Admins only' } }));
    await expect(http.get('/api/admin/users')).rejects.toMatchObject({ status: 403, code: 'FORBIDDEN' });
    expect(onCsrfRejected).not.toHaveBeenCalled();
    expect(onUnauthorized).not.toHaveBeenCalled();
  });
});
