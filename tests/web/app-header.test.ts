import { afterEach, describe, expect, it, vi } from 'vitest';
import { flushPromises } from '@vue/test-utils';
import TheAppHeader from '@web/components/TheAppHeader.vue';
import * as auth from '@web/services/auth';
import type { Role } from '@web/services/types';
import { demoUser, eventually, mountWithApp } from './mount-app';

vi.mock('@web/services/auth', () => ({ fetchSession: vi.fn(), signOut: vi.fn(), GITHUB_SIGN_IN_PATH: '/auth/github' }));

async function headerFor(roles: Role[]) {
  vi.mocked(auth.fetchSession).mockResolvedValue({ user: demoUser(roles), csrfToken: 't' });
  return mountWithApp(TheAppHeader);
}

function navLabels(wrapper: Awaited<ReturnType<typeof headerFor>>['wrapper']): string[] {
  return wrapper.findAll('nav a').map((link) => link.text());
}

/** Opens the person's menu (teleported to the body) and lists its entries. */
async function personMenuLabels(wrapper: Awaited<ReturnType<typeof headerFor>>['wrapper']): Promise<string[]> {
  await wrapper.get('button[aria-controls="person-menu"]').trigger('click');
  await flushPromises();
  return [...document.body.querySelectorAll('#person-menu [role="menuitem"]')].map((item) => item.textContent!.trim());
}

afterEach(() => {
  document.body.innerHTML = '';
});

describe('TheAppHeader', () => {
  it('shows the word-mark and the search box with its placeholder', async () => {
    const { wrapper } = await headerFor(['author']);
    expect(wrapper.text()).toContain('Cyclewright');
    expect(wrapper.get('input[type="search"]').attributes('placeholder')).toBe('mechanism, species or label');
  });

  it.each<[Role[], string[]]>([
    [['author'], ['Library']],
    [['reviewer'], ['Library', 'My reviews']],
    [['curator'], ['Library', 'To adopt']],
    [['author', 'reviewer', 'curator'], ['Library', 'My reviews', 'To adopt']],
    [['instructor', 'admin'], ['Library']],
  ])('for roles %j shows the navigation %j', async (roles, expected) => {
    const { wrapper } = await headerFor(roles);
    expect(navLabels(wrapper)).toEqual(expected);
  });

  it("puts the person's name on the menu button, with Account and Sign out for everyone", async () => {
    const { wrapper } = await headerFor(['author']);
    expect(wrapper.get('button[aria-controls="person-menu"]').text()).toBe('Ines Marlow');
    expect(await personMenuLabels(wrapper)).toEqual(['Account', 'Sign out']);
  });

  it('adds the roles page to the menu for admins only', async () => {
    const { wrapper } = await headerFor(['admin']);
    expect(await personMenuLabels(wrapper)).toEqual(['Account', 'Admin: roles', 'Sign out']);
  });

  it('signs out through the API and lands on sign-in', async () => {
    vi.mocked(auth.signOut).mockResolvedValue(undefined);
    const { wrapper, router } = await headerFor(['reviewer']);
    vi.mocked(auth.fetchSession).mockResolvedValue({ user: null, csrfToken: 'fresh' });
    await personMenuLabels(wrapper);
    const signOut = [...document.body.querySelectorAll<HTMLElement>('#person-menu [role="menuitem"]')].at(-1)!;
    signOut.querySelector<HTMLElement>('a, .p-menu-item-content')!.click();
    await flushPromises();
    expect(auth.signOut).toHaveBeenCalledTimes(1);
    await eventually(() => expect(router.currentRoute.value.name).toBe('sign-in'));
  });

  it('hands the search words to the library', async () => {
    const { wrapper, router } = await headerFor(['author']);
    await wrapper.get('input[type="search"]').setValue('  BrO•  ');
    await wrapper.get('form[role="search"]').trigger('submit');
    await flushPromises();
    expect(router.currentRoute.value.name).toBe('library');
    expect(router.currentRoute.value.query.q).toBe('BrO•');
  });
});
