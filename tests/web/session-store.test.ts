import { beforeEach, describe, expect, it, vi } from 'vitest';
import * as auth from '@web/services/auth';
import { ApiError } from '@web/services/http';
import { useSessionStore } from '@web/stores/session';
import { demoUser, freshPinia } from './mount-app';

vi.mock('@web/services/auth', () => ({
  fetchSession: vi.fn(),
  signIn: vi.fn(),
  signUp: vi.fn(),
  signOut: vi.fn(),
  GITHUB_SIGN_IN_PATH: '/auth/github',
}));

beforeEach(() => {
  freshPinia();
  vi.mocked(auth.fetchSession).mockReset();
});

describe('session store', () => {
  it('loads the session once however many callers ask at the same time', async () => {
    vi.mocked(auth.fetchSession).mockResolvedValue({ user: demoUser(['author']), csrfToken: 't1' });
    const session = useSessionStore();
    await Promise.all([session.ensureLoaded(), session.ensureLoaded()]);
    await session.ensureLoaded();
    expect(auth.fetchSession).toHaveBeenCalledTimes(1);
    expect(session.status).toBe('ready');
    expect(session.csrfToken).toBe('t1');
    expect(session.isSignedIn).toBe(true);
  });

  it('answers role questions from the signed-in user', async () => {
    vi.mocked(auth.fetchSession).mockResolvedValue({ user: demoUser(['author', 'curator']), csrfToken: 't' });
    const session = useSessionStore();
    await session.ensureLoaded();
    expect(session.hasRole('curator')).toBe(true);
    expect(session.hasRole('admin')).toBe(false);
    expect(session.hasAnyRole(['admin', 'curator'])).toBe(true);
    expect(session.hasAnyRole(['admin', 'reviewer'])).toBe(false);
  });

  it('keeps a signed-out session as ready with no user and no roles', async () => {
    vi.mocked(auth.fetchSession).mockResolvedValue({ user: null, csrfToken: 't0' });
    const session = useSessionStore();
    await session.ensureLoaded();
    expect(session.isSignedIn).toBe(false);
    expect(session.roles).toEqual([]);
    expect(session.csrfToken).toBe('t0');
  });

  it('records a failed first load and tries again on the next call', async () => {
    vi.mocked(auth.fetchSession).mockRejectedValueOnce(new ApiError(0, 'NETWORK_ERROR', 'unreachable'));
    const session = useSessionStore();
    await session.ensureLoaded();
    expect(session.status).toBe('failed');
    expect(session.loadError?.message).toBe('unreachable');
    vi.mocked(auth.fetchSession).mockResolvedValue({ user: null, csrfToken: 't' });
    await session.ensureLoaded();
    expect(session.status).toBe('ready');
    expect(session.loadError).toBeNull();
  });

  it('keeps the known person when a later refresh fails', async () => {
    vi.mocked(auth.fetchSession).mockResolvedValueOnce({ user: demoUser(['reviewer']), csrfToken: 't' });
    const session = useSessionStore();
    await session.ensureLoaded();
    vi.mocked(auth.fetchSession).mockRejectedValueOnce(new ApiError(503, 'HTTP_503', 'down'));
    await session.refresh();
    expect(session.status).toBe('ready');
    expect(session.user?.name).toBe('Ines Marlow');
    expect(session.loadError?.message).toBe('down');
  });

  it('takes user and new CSRF token from sign-in and sign-up answers', async () => {
    const session = useSessionStore();
    vi.mocked(auth.signIn).mockResolvedValue({ user: demoUser(['author']), csrfToken: 'after-sign-in' });
    await session.signIn({ email: 'ines.marlow@example.test', password: 'tidal-flats-42' });
    expect(session.csrfToken).toBe('after-sign-in');
    vi.mocked(auth.signUp).mockResolvedValue({ user: demoUser(['author'], { id: 9 }), csrfToken: 'after-sign-up' });
    await session.signUp({ name: 'Ines Marlow', email: 'ines.marlow@example.test', password: 'tidal-flats-42' });
    expect(session.user?.id).toBe(9);
    expect(session.csrfToken).toBe('after-sign-up');
  });

  it('propagates a failed sign-in and stays signed out', async () => {
    const session = useSessionStore();
    vi.mocked(auth.signIn).mockRejectedValue(new ApiError(401, 'INVALID_CREDENTIALS', 'Wrong e-mail or password'));
    await expect(session.signIn({ email: 'x@example.test', password: 'nope' })).rejects.toMatchObject({ status: 401 });
    expect(session.isSignedIn).toBe(false);
  });

  it('forgets the person on sign-out and fetches a fresh session next time', async () => {
    vi.mocked(auth.fetchSession).mockResolvedValueOnce({ user: demoUser(['author']), csrfToken: 'old' });
    const session = useSessionStore();
    await session.ensureLoaded();
    vi.mocked(auth.signOut).mockResolvedValue(undefined);
    await session.signOut();
    expect(session.user).toBeNull();
    expect(session.csrfToken).toBe('');
    vi.mocked(auth.fetchSession).mockResolvedValueOnce({ user: null, csrfToken: 'new' });
    await session.ensureLoaded();
    expect(session.csrfToken).toBe('new');
    expect(auth.fetchSession).toHaveBeenCalledTimes(2);
  });
});
