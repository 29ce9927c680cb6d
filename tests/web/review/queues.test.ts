import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { flushPromises } from '@vue/test-utils';
import MyReviewsView from '@web/views/MyReviewsView.vue';
import ToAdoptView from '@web/views/ToAdoptView.vue';
import * as auth from '@web/services/auth';
import { ApiError } from '@web/services/http';
import * as reviews from '@web/services/reviews';
import { useReviewActivityStore } from '@web/stores/reviewActivity';
import type { QueuedRound } from '@web/services/reviews';
import { demoUser } from '../mount-app';
import { demoRemark, demoRound } from './review-fixtures';
import { mountWithProps } from './mount-with-props';

vi.mock('@web/services/auth', () => ({ fetchSession: vi.fn(), GITHUB_SIGN_IN_PATH: '/auth/github' }));
vi.mock('@web/services/reviews', () => ({ listMyReviews: vi.fn(), listToAdopt: vi.fn(), getRound: vi.fn(), adoptRound: vi.fn(), listRemarks: vi.fn() }));

const queued: QueuedRound = {
  id: 11, state: 'open', slug: 'salt-lake-bromine', title: 'Bromine release over the salt lake', revision: 3, updatedAt: '2026-11-24T08:00:00.000Z',
};

beforeEach(() => {
  vi.mocked(reviews.listRemarks).mockResolvedValue([]);
});

afterEach(() => {
  vi.clearAllMocks();
  document.body.innerHTML = '';
});

async function mountView(view: typeof MyReviewsView, roles: Parameters<typeof demoUser>[0]) {
  vi.mocked(auth.fetchSession).mockResolvedValue({ user: demoUser(roles), csrfToken: 't' });
  const { wrapper } = await mountWithProps(view, {}, '/account');
  await flushPromises();
  return wrapper;
}

describe('MyReviewsView', () => {
  it('lists the rounds waiting for my verdict with a link to the revision on the workbench', async () => {
    vi.mocked(reviews.listMyReviews).mockResolvedValue([queued]);
    const wrapper = await mountView(MyReviewsView, ['reviewer']);
    const row = wrapper.get('tbody tr');
    expect(row.text()).toContain('Bromine release over the salt lake');
    expect(row.text()).toContain('r3');
    expect(row.text()).toContain('open');
    expect(row.get('a').attributes('href')).toBe('/m/salt-lake-bromine/r/3#remarks');
  });

  it('says what happens next when nothing waits', async () => {
    vi.mocked(reviews.listMyReviews).mockResolvedValue([]);
    const wrapper = await mountView(MyReviewsView, ['reviewer']);
    expect(wrapper.text()).toContain('No review rounds are waiting for you');
    expect(wrapper.find('table').exists()).toBe(false);
  });

  it('shows the error with a way to try again', async () => {
    vi.mocked(reviews.listMyReviews).mockRejectedValueOnce(new ApiError(503, 'HTTP_503', 'The server answered 503.')).mockResolvedValueOnce([queued]);
    const wrapper = await mountView(MyReviewsView, ['reviewer']);
    expect(wrapper.get('[role="alert"]').text()).toContain('The server answered 503.');
    await wrapper.get('[role="alert"] button').trigger('click');
    await flushPromises();
    expect(wrapper.find('tbody tr').exists()).toBe(true);
  });
});

describe('ToAdoptView', () => {
  it('shows each endorsed round with its endorsements and adopts it', async () => {
    const endorsed = { ...queued, state: 'endorsed' as const };
    vi.mocked(reviews.listToAdopt).mockResolvedValueOnce([endorsed]).mockResolvedValueOnce([]);
    vi.mocked(reviews.getRound).mockResolvedValue(demoRound({ id: 11, state: 'endorsed', endorsements: 2, endorsementsNeeded: 2 }));
    vi.mocked(reviews.adoptRound).mockResolvedValue(demoRound({ state: 'adopted' }));
    const wrapper = await mountView(ToAdoptView, ['curator']);
    expect(wrapper.get('tbody tr').text()).toContain('2 of 2');
    await wrapper.get('button[aria-label="Adopt r3 of Bromine release over the salt lake"]').trigger('click');
    await flushPromises();
    expect(reviews.adoptRound).toHaveBeenCalledWith(11);
    expect(wrapper.text()).toContain('No endorsed revisions to adopt');
    // The header's queue counts read the server again after this act.
    expect(useReviewActivityStore().changes).toBe(1);
  });

  it('names the round when adopting fails', async () => {
    vi.mocked(reviews.listToAdopt).mockResolvedValue([{ ...queued, state: 'endorsed' }]);
    vi.mocked(reviews.getRound).mockResolvedValue(demoRound({ state: 'endorsed', endorsements: 2 }));
    vi.mocked(reviews.adoptRound).mockRejectedValue(new ApiError(409, 'INVALID_STATE', 'Only a round that is endorsed can be adopted; this one is open'));
    const wrapper = await mountView(ToAdoptView, ['curator']);
    await wrapper.get('tbody button').trigger('click');
    await flushPromises();
    expect(wrapper.get('[role="alert"]').text()).toBe('Bromine release over the salt lake, r3: Only a round that is endorsed can be adopted; this one is open');
  });

  it('lists the open remarks before adopting and adopts only once the curator confirms', async () => {
    vi.mocked(reviews.listToAdopt).mockResolvedValue([{ ...queued, state: 'endorsed' }]);
    vi.mocked(reviews.getRound).mockResolvedValue(demoRound({ state: 'endorsed', endorsements: 2 }));
    vi.mocked(reviews.listRemarks).mockResolvedValue([demoRemark({ stepLabel: 'B3', body: 'Is the photolysis frequency for noon?', bodyHtml: '<p>Is the photolysis frequency for noon?</p>\n' })]);
    vi.mocked(reviews.adoptRound).mockResolvedValue(demoRound({ state: 'adopted' }));
    const wrapper = await mountView(ToAdoptView, ['curator']);
    await wrapper.get('tbody button').trigger('click');
    await flushPromises();
    expect(reviews.adoptRound).not.toHaveBeenCalled();
    const caution = wrapper.get('[role="alertdialog"]');
    expect(caution.text()).toContain('Step B3 — Kofi Glasswort: Is the photolysis frequency for noon?');
    await caution.findAll('button').find((b) => b.text() === 'Adopt r3 anyway')!.trigger('click');
    await flushPromises();
    expect(reviews.adoptRound).toHaveBeenCalledWith(11);
    expect(wrapper.find('[role="alertdialog"]').exists()).toBe(false);
  });
});
