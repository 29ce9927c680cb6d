import { afterEach, describe, expect, it, vi } from 'vitest';
import { flushPromises } from '@vue/test-utils';
import AccountView from '@web/views/AccountView.vue';
import ForbiddenView from '@web/views/ForbiddenView.vue';
import * as auth from '@web/services/auth';
import { ApiError } from '@web/services/http';
import { demoUser, mountWithApp } from './mount-app';

vi.mock('@web/services/auth', () => ({ fetchSession: vi.fn(), GITHUB_SIGN_IN_PATH: '/auth/github' }));

const linked = demoUser(['author'], { githubLogin: 'imarlow' });

afterEach(() => {
  vi.mocked(auth.fetchSession).mockReset();
  document.body.innerHTML = '';
});

describe('AccountView', () => {
  it('shows name, e-mail, roles and the linked GitHub login', async () => {
    vi.mocked(auth.fetchSession).mockResolvedValue({ user: linked, csrfToken: 't' });
    const { wrapper } = await mountWithApp(AccountView, { path: '/account' });
    const text = wrapper.get('dl').text();
    expect(text).toContain('Ines Marlow');
    expect(text).toContain('ines.marlow@example.test');
    expect(text).toContain('author');
    expect(text).toContain('imarlow');
  });

  it('asks the server again on every visit, so newly granted roles show', async () => {
    vi.mocked(auth.fetchSession)
      .mockResolvedValueOnce({ user: linked, csrfToken: 't' })
      .mockResolvedValueOnce({ user: { ...linked, roles: ['author', 'reviewer'] }, csrfToken: 't' });
    const { wrapper } = await mountWithApp(AccountView, { path: '/account' });
    await flushPromises();
    expect(wrapper.findAll('.p-tag').map((tag) => tag.text())).toEqual(['author', 'reviewer']);
  });

  it('keeps the known details and says so when the refresh fails', async () => {
    vi.mocked(auth.fetchSession)
      .mockResolvedValueOnce({ user: { ...linked, githubLogin: null }, csrfToken: 't' })
      .mockRejectedValueOnce(new ApiError(503, 'HTTP_503', 'The server answered 503.'));
    const { wrapper } = await mountWithApp(AccountView, { path: '/account' });
    await flushPromises();
    expect(wrapper.get('[role="alert"]').text()).toContain('The server answered 503.');
    expect(wrapper.get('dl').text()).toContain('Not linked');
  });
});

describe('ForbiddenView', () => {
  it('names the role the refused page needs', async () => {
    vi.mocked(auth.fetchSession).mockResolvedValue({ user: linked, csrfToken: 't' });
    const { wrapper } = await mountWithApp(ForbiddenView, { path: '/forbidden?from=/to-adopt' });
    expect(wrapper.get('h1').text()).toBe('You do not have access to this page');
    expect(wrapper.text()).toContain('It is for people with the curator role.');
  });
});
