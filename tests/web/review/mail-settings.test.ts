import { afterEach, describe, expect, it, vi } from 'vitest';
import { flushPromises } from '@vue/test-utils';
import AccountViewMailSettings from '@web/components/AccountViewMailSettings.vue';
import * as auth from '@web/services/auth';
import * as notifications from '@web/services/notifications';
import { demoUser } from '../mount-app';
import { mountWithProps } from './mount-with-props';

vi.mock('@web/services/auth', () => ({ fetchSession: vi.fn(), GITHUB_SIGN_IN_PATH: '/auth/github' }));
vi.mock('@web/services/notifications', async (original) => ({
  ...(await original<typeof notifications>()),
  getMailPreferences: vi.fn(),
  saveMailPreferences: vi.fn(),
}));

afterEach(() => {
  vi.clearAllMocks();
  document.body.innerHTML = '';
});

describe('AccountViewMailSettings', () => {
  it('shows every kind on unless turned off, and saves all four with PATCH /api/me', async () => {
    vi.mocked(auth.fetchSession).mockResolvedValue({ user: demoUser(['reviewer']), csrfToken: 't' });
    vi.mocked(notifications.getMailPreferences).mockResolvedValue({ remark: false });
    vi.mocked(notifications.saveMailPreferences).mockImplementation(async (preferences) => preferences);
    const { wrapper } = await mountWithProps(AccountViewMailSettings, {});
    const box = (kind: string) => wrapper.get(`#mail-${kind}`).element as HTMLInputElement;
    expect(['review-requested', 'remark', 'verdict', 'adopted'].map((kind) => box(kind).checked)).toEqual([true, false, true, true]);
    await wrapper.get('#mail-verdict').setValue(false);
    await wrapper.get('form').trigger('submit');
    await flushPromises();
    expect(notifications.saveMailPreferences).toHaveBeenCalledWith({ 'review-requested': true, remark: false, verdict: false, adopted: true });
    expect(wrapper.text()).toContain('E-mail settings saved.');
  });
});
