import { describe, expect, it, vi } from 'vitest';
import { flushPromises } from '@vue/test-utils';
import * as auth from '@web/services/auth';
import { demoUser, mountWithApp } from '../mount-app';
import App from '@web/App.vue';

vi.mock('@web/services/auth', () => ({ fetchSession: vi.fn(), GITHUB_SIGN_IN_PATH: '/auth/github' }));

describe('the workbench section named in the address', () => {
  it('opens the section a queue link names (#remarks) instead of the first one', async () => {
    vi.mocked(auth.fetchSession).mockResolvedValue({ user: demoUser(['author']), csrfToken: 't' });
    const { wrapper } = await mountWithApp(App, { path: '/new#remarks' });
    await flushPromises();
    const selected = wrapper.find('[data-panel="remarks"]');
    expect(selected.exists()).toBe(true);
    expect(selected.attributes('aria-selected')).toBe('true');
    wrapper.unmount();
  });
});
