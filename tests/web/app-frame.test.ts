import { afterEach, describe, expect, it, vi } from 'vitest';
import { flushPromises } from '@vue/test-utils';
import App from '@web/App.vue';
import * as auth from '@web/services/auth';
import { ApiError } from '@web/services/http';
import { useSessionStore } from '@web/stores/session';
import { demoUser, eventually, mountWithApp } from './mount-app';

vi.mock('@web/services/auth', () => ({ fetchSession: vi.fn(), GITHUB_SIGN_IN_PATH: '/auth/github' }));

afterEach(() => {
  vi.mocked(auth.fetchSession).mockReset();
  document.body.innerHTML = '';
});

async function appAt(path: string) {
  const mounted = await mountWithApp(App, { path });
  await eventually(() => expect(mounted.wrapper.find('main').text()).not.toBe(''));
  return mounted;
}

describe('the app frame', () => {
  it('wraps signed-in pages in the header, with the cautions in the footer', async () => {
    vi.mocked(auth.fetchSession).mockResolvedValue({ user: demoUser(['author']), csrfToken: 't' });
    const { wrapper } = await appAt('/');
    expect(wrapper.find('header.the-app-header').exists()).toBe(true);
    expect(wrapper.get('main h1').text()).toBe('Library');
    expect(wrapper.get('footer').text()).toContain('not a substitute for validated models or measurements');
    expect(document.title).toBe('Library · Cyclewright');
  });

  it('leaves the header off sign-in, where nobody is signed in yet', async () => {
    vi.mocked(auth.fetchSession).mockResolvedValue({ user: null, csrfToken: 't' });
    const { wrapper } = await appAt('/');
    expect(wrapper.find('header.the-app-header').exists()).toBe(false);
    expect(wrapper.get('main h1').text()).toBe('Sign in');
  });

  it('shows progress while a navigation waits for the server', async () => {
    vi.mocked(auth.fetchSession).mockResolvedValue({ user: demoUser(['author']), csrfToken: 't' });
    const { wrapper, router, pinia } = await appAt('/');
    let answer: (info: Awaited<ReturnType<typeof auth.fetchSession>>) => void = () => {};
    vi.mocked(auth.fetchSession).mockReturnValue(new Promise((resolve) => (answer = resolve)));
    useSessionStore(pinia).clear();
    const arrival = router.push('/account');
    await flushPromises();
    expect(wrapper.find('[role="progressbar"]').exists()).toBe(true);
    answer({ user: demoUser(['author']), csrfToken: 't' });
    await arrival;
    await flushPromises();
    expect(wrapper.find('[role="progressbar"]').exists()).toBe(false);
  });

  it('says when the session cannot be checked, and tries again on request', async () => {
    vi.mocked(auth.fetchSession).mockRejectedValue(new ApiError(0, 'NETWORK_ERROR', 'The Cyclewright server could not be reached.'));
    const { wrapper } = await appAt('/account');
    const notice = wrapper.get('.app-session-error');
    expect(notice.text()).toContain('could not be reached');
    vi.mocked(auth.fetchSession).mockResolvedValue({ user: null, csrfToken: 't' });
    await notice.get('button').trigger('click');
    await flushPromises();
    expect(wrapper.find('.app-session-error').exists()).toBe(false);
  });
});
