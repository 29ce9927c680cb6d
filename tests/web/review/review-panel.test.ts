import { afterEach, describe, expect, it, vi } from 'vitest';
import { flushPromises } from '@vue/test-utils';
import WorkbenchReviewPanel from '@web/components/workbench/review/WorkbenchReviewPanel.vue';
import * as auth from '@web/services/auth';
import * as reviews from '@web/services/reviews';
import type { Role } from '@web/services/types';
import { demoUser } from '../mount-app';
import { demoMechanism, demoRemark, demoRound } from './review-fixtures';
import { mountWithProps } from './mount-with-props';

vi.mock('@web/services/auth', () => ({ fetchSession: vi.fn(), GITHUB_SIGN_IN_PATH: '/auth/github' }));
vi.mock('@web/services/reviews', () => ({
  listRounds: vi.fn(), getRound: vi.fn(), listRemarks: vi.fn(), findPeople: vi.fn(), openRound: vi.fn(), adoptRound: vi.fn(), withdrawRound: vi.fn(),
}));

afterEach(() => {
  vi.clearAllMocks();
  document.body.innerHTML = '';
});

type PanelOptions = { round?: ReturnType<typeof demoRound> | null; youCanEdit?: boolean; remarks?: ReturnType<typeof demoRemark>[] };
async function mountPanel(roles: Role[], userId: number, options: PanelOptions = {}) {
  const round = options.round === undefined ? demoRound() : options.round;
  vi.mocked(auth.fetchSession).mockResolvedValue({ user: demoUser(roles, { id: userId }), csrfToken: 't' });
  vi.mocked(reviews.listRounds).mockResolvedValue(round ? [{ id: round.id, state: round.state, revision: round.revision, createdAt: round.createdAt, closedAt: null }] : []);
  if (round) vi.mocked(reviews.getRound).mockResolvedValue(round);
  vi.mocked(reviews.listRemarks).mockResolvedValue(options.remarks ?? []);
  vi.mocked(reviews.findPeople).mockResolvedValue([{ id: 4, name: 'Anouk Spartina', roles: ['curator'] }]);
  const mechanism = demoMechanism({ youCanEdit: options.youCanEdit ?? false, activeRound: null });
  const { wrapper } = await mountWithProps(WorkbenchReviewPanel, { mechanism, revision: null, source: '', analysis: null, selectedStep: null });
  await flushPromises();
  return wrapper;
}

const buttons = (wrapper: Awaited<ReturnType<typeof mountPanel>>) => wrapper.findAll('button').map((b) => b.text()).filter(Boolean);

describe('WorkbenchReviewPanel', () => {
  it('lets an author open a round on the latest revision when there is none', async () => {
    vi.mocked(reviews.openRound).mockResolvedValue(demoRound());
    const wrapper = await mountPanel(['author'], 1, { round: null, youCanEdit: true });
    expect(wrapper.text()).toContain('No review round yet');
    const open = wrapper.findAll('button').find((b) => b.text() === 'Open review round on r2')!;
    await open.trigger('click');
    await flushPromises();
    expect(reviews.openRound).toHaveBeenCalledWith('stratospheric-nox', undefined);
  });

  it('shows the timeline with names and offers an assigned reviewer the verdict form, not adopt or withdraw', async () => {
    const wrapper = await mountPanel(['reviewer'], 2);
    expect(wrapper.get('.review-round-timeline').text()).toContain('Anouk Spartina assigned Kofi Glasswort as reviewer');
    expect(wrapper.find('.review-verdict-form').exists()).toBe(true);
    expect(buttons(wrapper).some((t) => t.startsWith('Adopt') || t.startsWith('Withdraw'))).toBe(false);
  });

  it('offers a curator adoption of an endorsed round and the reviewer picker', async () => {
    vi.mocked(reviews.adoptRound).mockResolvedValue(demoRound({ state: 'adopted' }));
    const wrapper = await mountPanel(['curator'], 4, { round: demoRound({ state: 'endorsed', endorsements: 2 }) });
    expect(wrapper.find('#reviewer-picker').exists()).toBe(true);
    expect(wrapper.find('.review-verdict-form').exists()).toBe(false);
    await wrapper.findAll('button').find((b) => b.text() === 'Adopt r2')!.trigger('click');
    await flushPromises();
    expect(reviews.adoptRound).toHaveBeenCalledWith(11);
  });

  it('cautions a curator about open remarks, listing them, and adopts only once confirmed', async () => {
    vi.mocked(reviews.adoptRound).mockResolvedValue(demoRound({ state: 'adopted' }));
    const remarks = [demoRemark(), demoRemark({ id: 22, state: 'settled', stepLabel: 'N2', body: 'Fine now' })];
    const wrapper = await mountPanel(['curator'], 4, { round: demoRound({ state: 'endorsed', endorsements: 2 }), remarks });
    await wrapper.findAll('button').find((b) => b.text() === 'Adopt r2')!.trigger('click');
    await flushPromises();
    expect(reviews.adoptRound).not.toHaveBeenCalled();
    const caution = wrapper.get('[role="alertdialog"]');
    expect(caution.text()).toContain('1 remark is still open on r2');
    expect(caution.text()).toContain('Step N1 — Kofi Glasswort: Check the rate');
    expect(caution.text()).not.toContain('**');
    expect(caution.text()).not.toContain('Fine now');
    await caution.findAll('button').find((b) => b.text() === 'Adopt r2 anyway')!.trigger('click');
    await flushPromises();
    expect(reviews.adoptRound).toHaveBeenCalledWith(11);
  });

  it('lets an author withdraw a round in progress but not review it', async () => {
    vi.mocked(reviews.withdrawRound).mockResolvedValue(demoRound({ state: 'withdrawn' }));
    const wrapper = await mountPanel(['author', 'reviewer'], 1, { youCanEdit: true, round: demoRound({ reviewers: [{ id: 1, name: 'Rosalind Samphire' }] }) });
    expect(wrapper.find('.review-verdict-form').exists()).toBe(false);
    await wrapper.findAll('button').find((b) => b.text() === 'Withdraw round')!.trigger('click');
    await flushPromises();
    expect(reviews.withdrawRound).toHaveBeenCalledWith(11);
  });
});
