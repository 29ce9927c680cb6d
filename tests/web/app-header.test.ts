import { afterEach, describe, expect, it, vi } from 'vitest';
import { flushPromises } from '@vue/test-utils';
import TheAppHeader from '@web/components/TheAppHeader.vue';
import * as auth from '@web/services/auth';
import { ApiError } from '@web/services/http';
import * as queues from '@web/services/queues';
import type { Role } from '@web/services/types';
import { useReviewActivityStore } from '@web/stores/reviewActivity';
import { demoUser, eventually, mountWithApp } from './mount-app';

vi.mock('@web/services/auth', () => ({ fetchSession: vi.fn(), signOut: vi.fn(), GITHUB_SIGN_IN_PATH: '/auth/github' }));
vi.mock('@web/services/queues', () => ({ fetchQueueCounts: vi.fn() }));

async function headerFor(roles: Role[]) {
  vi.mocked(queues.fetchQueueCounts).mockResolvedValue({ myReviews: 0, toAdopt: roles.includes('curator') ? 0 : null });
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
    [['author'], ['Library', 'Catalogue', 'Sets', 'Import']],
    [['reviewer'], ['Library', 'Catalogue', 'Sets', 'My reviews']],
    [['curator'], ['Library', 'Catalogue', 'Sets', 'To adopt']],
    [['author', 'reviewer', 'curator'], ['Library', 'Catalogue', 'Sets', 'Import', 'My reviews', 'To adopt']],
    [['instructor', 'admin'], ['Library', 'Catalogue', 'Sets']],
  ])('for roles %j shows the navigation %j', async (roles, expected) => {
    const { wrapper } = await headerFor(roles);
    expect(navLabels(wrapper)).toEqual(expected);
  });

  it.each<[Role[], string[]]>([
    [['author'], ['Library', 'Catalogue', 'Sets', 'Import']],
    [['author', 'reviewer', 'curator'], ['Library', 'Catalogue', 'Sets', 'Import', 'My reviews', 'To adopt']],
  ])('for roles %j folds the same links %j behind the menu button (shown on narrow windows)', async (roles, expected) => {
    const { wrapper } = await headerFor(roles);
    const button = wrapper.get('button[aria-controls="header-nav-menu"]');
    expect(button.attributes('aria-label')).toBe('Menu');
    expect(button.attributes('aria-expanded')).toBe('false');
    await button.trigger('click');
    await flushPromises();
    const entries = [...document.body.querySelectorAll('#header-nav-menu [role="menuitem"]')].map((item) => item.textContent!.trim());
    expect(entries).toEqual(expected);
  });

  it('goes to the page of a link picked in the folded menu, and marks the page shown', async () => {
    const { wrapper, router } = await headerFor(['author']);
    await wrapper.get('button[aria-controls="header-nav-menu"]').trigger('click');
    await flushPromises();
    const link = (label: string) =>
      [...document.body.querySelectorAll<HTMLAnchorElement>('#header-nav-menu a')].find((a) => a.textContent!.trim() === label)!;
    expect(link('Library').getAttribute('aria-current')).toBe('page');
    expect(link('Catalogue').getAttribute('href')).toBe('/catalogue');
    link('Catalogue').click();
    await eventually(() => expect(router.currentRoute.value.name).toBe('catalogue'));
  });

  it("puts the person's name on the menu button, with Account and Sign out for everyone", async () => {
    const { wrapper } = await headerFor(['author']);
    expect(wrapper.get('button[aria-controls="person-menu"]').text()).toBe('Ines Marlow');
    // The name is also the button's accessible name, for phones where only its icon shows.
    expect(wrapper.get('button[aria-controls="person-menu"]').attributes('aria-label')).toBe('Ines Marlow');
    expect(await personMenuLabels(wrapper)).toEqual(['Account', 'Sign out']);
  });

  it('adds the roles page to the menu for admins only', async () => {
    const { wrapper } = await headerFor(['admin']);
    expect(await personMenuLabels(wrapper)).toEqual(['Account', 'Admin: roles', 'Development inbox', 'Sign out']);
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

  it('shows how much waits in each queue, as numbers beside the links', async () => {
    vi.mocked(auth.fetchSession).mockResolvedValue({ user: demoUser(['reviewer', 'curator']), csrfToken: 't' });
    vi.mocked(queues.fetchQueueCounts).mockResolvedValue({ myReviews: 3, toAdopt: 1 });
    const { wrapper } = await mountWithApp(TheAppHeader);
    expect(wrapper.get('[data-queue="my-reviews"]').text().replace(/\s+/g, ' ')).toBe('My reviews 3 waiting');
    expect(wrapper.get('[data-queue="to-adopt"] .p-badge').text()).toBe('1');
  });

  it('asks for queue counts again after each navigation', async () => {
    const { router } = await headerFor(['reviewer']);
    const asked = vi.mocked(queues.fetchQueueCounts).mock.calls.length;
    await router.push('/my-reviews');
    await flushPromises();
    expect(vi.mocked(queues.fetchQueueCounts).mock.calls.length).toBe(asked + 1);
  });

  it('asks for queue counts again after a review act in this tab, and shows the new numbers', async () => {
    const { wrapper, pinia } = await headerFor(['curator']);
    vi.mocked(queues.fetchQueueCounts).mockResolvedValue({ myReviews: 0, toAdopt: 2 });
    const asked = vi.mocked(queues.fetchQueueCounts).mock.calls.length;
    useReviewActivityStore(pinia).record();
    await flushPromises();
    expect(vi.mocked(queues.fetchQueueCounts).mock.calls.length).toBe(asked + 1);
    expect(wrapper.get('[data-queue="to-adopt"] .p-badge').text()).toBe('2');
  });

  it('does not ask for queue counts for people without a queue, and shows none on failure', async () => {
    vi.mocked(queues.fetchQueueCounts).mockClear();
    await headerFor(['author', 'instructor']);
    expect(queues.fetchQueueCounts).not.toHaveBeenCalled();
    vi.mocked(auth.fetchSession).mockResolvedValue({ user: demoUser(['reviewer']), csrfToken: 't' });
    vi.mocked(queues.fetchQueueCounts).mockRejectedValue(new ApiError(503, 'HTTP_503', 'down'));
    const { wrapper } = await mountWithApp(TheAppHeader);
    expect(wrapper.get('[data-queue="my-reviews"]').text()).toBe('My reviews');
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
