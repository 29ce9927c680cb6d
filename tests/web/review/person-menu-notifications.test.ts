import { afterEach, describe, expect, it, vi } from 'vitest';
import { flushPromises } from '@vue/test-utils';
import TheAppHeaderPersonMenu from '@web/components/TheAppHeaderPersonMenu.vue';
import * as auth from '@web/services/auth';
import * as notifications from '@web/services/notifications';
import type { AppNotification } from '@web/services/notifications';
import { demoUser, eventually } from '../mount-app';
import { mountWithProps } from './mount-with-props';

vi.mock('@web/services/auth', () => ({ fetchSession: vi.fn(), signOut: vi.fn(), GITHUB_SIGN_IN_PATH: '/auth/github' }));
vi.mock('@web/services/notifications', () => ({ listNotifications: vi.fn(), markNotificationRead: vi.fn() }));

const remark: AppNotification = {
  id: 9, kind: 'remark', message: 'Kofi Glasswort left a remark on "Bromine release over the salt lake" r3, step B2',
  details: {}, mechanismSlug: 'salt-lake-bromine', readAt: null, createdAt: '2026-11-24T08:00:00.000Z',
};

afterEach(() => {
  vi.clearAllMocks();
  document.body.innerHTML = '';
});

describe('TheAppHeaderPersonMenu notifications', () => {
  it('shows the unread count and opens a notification at its mechanism, marking it read', async () => {
    vi.mocked(auth.fetchSession).mockResolvedValue({ user: demoUser(['author']), csrfToken: 't' });
    vi.mocked(notifications.listNotifications).mockResolvedValue([remark]);
    vi.mocked(notifications.markNotificationRead).mockResolvedValue(undefined);
    const { wrapper, router } = await mountWithProps(TheAppHeaderPersonMenu, {});
    const button = wrapper.get('button[aria-controls="person-menu"]');
    expect(notifications.listNotifications).toHaveBeenCalledWith(true);
    expect(button.attributes('aria-label')).toBe('Ines Marlow, 1 unread notifications');
    await button.trigger('click');
    await flushPromises();
    const item = [...document.body.querySelectorAll<HTMLElement>('#person-menu [role="menuitem"]')].find((el) => el.textContent!.includes('left a remark'))!;
    item.querySelector<HTMLElement>('a, .p-menu-item-content')!.click();
    await flushPromises();
    expect(notifications.markNotificationRead).toHaveBeenCalledWith(9);
    await eventually(() => expect(router.currentRoute.value.fullPath).toBe('/m/salt-lake-bromine#remarks'));
  });
});
