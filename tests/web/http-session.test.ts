import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { createMemoryHistory } from 'vue-router';
import { connectHttpToSession } from '@web/plugins/http';
import { createAppRouter } from '@web/router';
import { http } from '@web/services/http';
import { useSessionStore } from '@web/stores/session';
import { demoUser, eventually, freshPinia } from './mount-app';

const fetchMock = vi.fn<typeof fetch>();

function jsonResponse(status: number, body: unknown): Response {
  return new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });
}

/** Answers /api/session as a signed-in author, and `answer` for everything else. */
function serverAnswering(answer: () => Response, user = demoUser(['author'])) {
  fetchMock.mockImplementation(async (input) =>
    input === '/api/session' ? jsonResponse(200, { user, csrfToken: 'csrf-from-session' }) : answer(),
  );
}

async function appAt(path: string) {
  const pinia = freshPinia();
  const router = createAppRouter(pinia, createMemoryHistory());
  connectHttpToSession(pinia, router);
  await router.push(path);
  return { router, session: useSessionStore(pinia) };
}

beforeEach(() => vi.stubGlobal('fetch', fetchMock));
afterEach(() => {
  vi.unstubAllGlobals();
  fetchMock.mockReset();
});

describe('http client wired to the session', () => {
  it("sends the session store's CSRF token on writes", async () => {
    serverAnswering(() => jsonResponse(200, {}));
    await appAt('/account');
    await http.put('/api/admin/users/3/roles', { roles: ['author'] });
    const init = fetchMock.mock.calls.at(-1)![1]!;
    expect((init.headers as Record<string, string>)['X-CSRF-Token']).toBe('csrf-from-session');
  });

  it('on a rejected CSRF token fetches a fresh one, so trying again is sent with it', async () => {
    serverAnswering(() => jsonResponse(403, { error: { code: 'CSRF_INVALID', message: 'Stale token' } }));
    const { session } = await appAt('/account');
    fetchMock.mockImplementation(async (input) =>
      input === '/api/session'
        ? jsonResponse(200, { user: demoUser(['author']), csrfToken: 'renewed' })
        : jsonResponse(403, { error: { code: 'CSRF_INVALID', message: 'Stale token' } }),
    );
    await expect(http.post('/api/anything')).rejects.toMatchObject({ code: 'CSRF_INVALID' });
    await eventually(() => expect(session.csrfToken).toBe('renewed'));
    expect(session.isSignedIn).toBe(true);
  });

  it('on a 401 clears the session and goes to sign-in, keeping where the person was', async () => {
    serverAnswering(() => jsonResponse(401, { error: { code: 'UNAUTHENTICATED', message: 'Sign in first' } }));
    const { router, session } = await appAt('/account?tab=roles');
    // The server has since forgotten the session.
    fetchMock.mockImplementation(async (input) =>
      input === '/api/session'
        ? jsonResponse(200, { user: null, csrfToken: 'fresh' })
        : jsonResponse(401, { error: { code: 'UNAUTHENTICATED', message: 'Sign in first' } }),
    );
    await expect(http.get('/api/admin/users')).rejects.toMatchObject({ status: 401 });
    await eventually(() => expect(router.currentRoute.value.name).toBe('sign-in'));
    expect(router.currentRoute.value.query.redirect).toBe('/account?tab=roles');
    expect(session.isSignedIn).toBe(false);
    expect(session.csrfToken).toBe('fresh');
  });
});
