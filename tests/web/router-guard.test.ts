import { beforeEach, describe, expect, it, vi } from 'vitest';
import { createMemoryHistory } from 'vue-router';
import { createAppRouter } from '@web/router';
import { safeRedirect } from '@web/router/guard';
import * as auth from '@web/services/auth';
import type { Role } from '@web/services/types';
import { demoUser, freshPinia } from './mount-app';

vi.mock('@web/services/auth', () => ({ fetchSession: vi.fn(), GITHUB_SIGN_IN_PATH: '/auth/github' }));

function signedInAs(roles: Role[] | null) {
  vi.mocked(auth.fetchSession).mockResolvedValue({ user: roles ? demoUser(roles) : null, csrfToken: 't' });
  return createAppRouter(freshPinia(), createMemoryHistory());
}

async function landing(roles: Role[] | null, path: string) {
  const router = signedInAs(roles);
  await router.push(path);
  return router.currentRoute.value;
}

beforeEach(() => {
  vi.mocked(auth.fetchSession).mockReset();
});

describe('route guard', () => {
  it('sends signed-out people to sign-in and remembers where they wanted to go', async () => {
    const route = await landing(null, '/admin/roles?page=2');
    expect(route.name).toBe('sign-in');
    expect(route.query.redirect).toBe('/admin/roles?page=2');
  });

  it.each(['/sign-in', '/sign-up'])('lets signed-out people open %s', async (path) => {
    expect((await landing(null, path)).path).toBe(path);
  });

  it('sends signed-in people away from sign-in to the library', async () => {
    expect((await landing(['author'], '/sign-in')).name).toBe('library');
  });

  it.each<[string, Role[]]>([
    ['/admin/roles', ['author', 'reviewer', 'curator', 'instructor']],
    ['/my-reviews', ['author', 'curator']],
    ['/to-adopt', ['reviewer', 'instructor']],
  ])('refuses %s to someone holding only %j', async (path, roles) => {
    const route = await landing(roles, path);
    expect(route.name).toBe('forbidden');
    expect(route.query.from).toBe(path);
  });

  it.each<[string, Role[], string]>([
    ['/admin/roles', ['admin'], 'admin-roles'],
    ['/my-reviews', ['author', 'reviewer'], 'my-reviews'],
    ['/to-adopt', ['curator'], 'to-adopt'],
    ['/account', ['instructor'], 'account'],
    ['/', ['author'], 'library'],
  ])('opens %s for %j', async (path, roles, name) => {
    expect((await landing(roles, path)).name).toBe(name);
  });

  it('shows the 404 page for unknown paths, signed in or not', async () => {
    expect((await landing(null, '/no/such/page')).name).toBe('not-found');
    expect((await landing(['author'], '/m/unknown/more/parts')).name).toBe('not-found');
  });

  it('treats an unreachable server as signed out', async () => {
    vi.mocked(auth.fetchSession).mockRejectedValue(new Error('unreachable'));
    const router = createAppRouter(freshPinia(), createMemoryHistory());
    await router.push('/account');
    expect(router.currentRoute.value.name).toBe('sign-in');
  });
});

describe('safeRedirect', () => {
  it('keeps in-app paths with their query', () => {
    expect(safeRedirect('/account?tab=roles')).toBe('/account?tab=roles');
    expect(safeRedirect(['/to-adopt'])).toBe('/to-adopt');
  });

  it.each(['//evil.example/x', '/\\evil.example', 'https://evil.example', 'account', '', undefined, null])(
    'falls back to the library for %j',
    (value) => expect(safeRedirect(value)).toBe('/'),
  );
});
