import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { flushPromises } from '@vue/test-utils';
import WorkbenchRemarksPanel from '@web/components/workbench/review/WorkbenchRemarksPanel.vue';
import * as auth from '@web/services/auth';
import * as reviews from '@web/services/reviews';
import { useReviewStore } from '@web/stores/review';
import { demoUser } from '../mount-app';
import { mountWithProps } from './mount-with-props';
import { analysedAsJson, demoMechanism, demoRemark, demoRound, NOX_SOURCE } from './review-fixtures';

vi.mock('@web/services/auth', () => ({ fetchSession: vi.fn(), GITHUB_SIGN_IN_PATH: '/auth/github' }));
vi.mock('@web/services/reviews', () => ({
  listRounds: vi.fn(), getRound: vi.fn(), listRemarks: vi.fn(), addRemark: vi.fn(), settleRemark: vi.fn(), replyToRemark: vi.fn(), findPeople: vi.fn(),
}));

const source = NOX_SOURCE;
const analysis = analysedAsJson(source);

const gone = demoRemark({
  id: 22, matching: false, stepLabel: 'X9', stepNormalised: 'Cl• + O3 -> ClO• + O2', originalLabel: 'X9', originalLine: 12,
  originalContext: 'X9: Cl• + O3 -> ClO• + O2 @ 2.3e-11', body: 'Why chlorine here?', bodyHtml: '<p>Why chlorine here?</p>\n',
});
const settled = demoRemark({ id: 23, state: 'settled', stepLabel: 'C2', stepNormalised: 'M + O(3P) + O2 -> M + O3', bodyHtml: '<p>Fine now</p>\n' });

async function mountPanel(roles: Parameters<typeof demoUser>[0], userId: number) {
  vi.mocked(auth.fetchSession).mockResolvedValue({ user: demoUser(roles, { id: userId }), csrfToken: 't' });
  const { wrapper } = await mountWithProps(WorkbenchRemarksPanel, { mechanism: demoMechanism(), revision: null, source, analysis, selectedStep: 'N1' });
  await flushPromises();
  return wrapper;
}

beforeEach(() => {
  vi.mocked(reviews.listRounds).mockResolvedValue([{ id: 11, state: 'open', revision: 2, createdAt: '2026-11-20T10:05:00.000Z', closedAt: null }]);
  vi.mocked(reviews.getRound).mockResolvedValue(demoRound());
  vi.mocked(reviews.listRemarks).mockResolvedValue([demoRemark(), gone, settled]);
});
afterEach(() => {
  vi.clearAllMocks();
  document.body.innerHTML = '';
});

const threads = (wrapper: Awaited<ReturnType<typeof mountPanel>>) => wrapper.findAll('article.remark-thread');

describe('WorkbenchRemarksPanel', () => {
  it('shows the open threads first, and the settled ones when asked', async () => {
    const wrapper = await mountPanel(['reviewer'], 2);
    expect(threads(wrapper)).toHaveLength(2);
    expect(wrapper.text()).toContain('open (2)');
    expect(wrapper.text()).toContain('settled (1)');
    await wrapper.findAll('[role="radio"], .p-togglebutton').find((b) => b.text().startsWith('settled'))!.trigger('click');
    expect(threads(wrapper)).toHaveLength(1);
    expect(threads(wrapper)[0].text()).toContain('Fine now');
  });

  it('places a matching remark on its step with the typeset equation and the server\'s HTML', async () => {
    const wrapper = await mountPanel(['reviewer'], 2);
    const first = threads(wrapper)[0];
    expect(first.find('.remark-thread__label').text()).toBe('N1');
    expect(first.find('.chem-equation').exists()).toBe(true);
    expect(first.find('.remark-thread__body strong').text()).toBe('rate');
    expect(first.classes()).toContain('remark-thread--selected');
  });

  it('labels a remark whose step is gone and keeps its original context', async () => {
    const wrapper = await mountPanel(['reviewer'], 2);
    const orphan = threads(wrapper)[1];
    expect(orphan.text()).toContain('No longer matching');
    expect(orphan.text()).toContain('As written in r1, X9');
    expect(orphan.find('code').text()).toBe('X9: Cl• + O3 -> ClO• + O2 @ 2.3e-11');
    expect(orphan.find('.remark-thread__step').exists()).toBe(false);
  });

  it('offers the new-remark form to an assigned reviewer and sends it for the selected step', async () => {
    vi.mocked(reviews.addRemark).mockResolvedValue(demoRemark());
    const wrapper = await mountPanel(['reviewer'], 2);
    await wrapper.get('#remark-body').setValue('Rate from the JPL evaluation?');
    await wrapper.get('form.remark-composer').trigger('submit');
    await flushPromises();
    expect(reviews.addRemark).toHaveBeenCalledWith(11, 'N1', 'Rate from the JPL evaluation?');
  });

  it('lets the remark\'s writer settle it, and then lists it as settled', async () => {
    vi.mocked(reviews.settleRemark).mockResolvedValue(undefined);
    const wrapper = await mountPanel(['reviewer'], 2);
    vi.mocked(reviews.listRemarks).mockResolvedValue([demoRemark({ state: 'settled' }), gone, settled]);
    await threads(wrapper)[0].findAll('button').find((b) => b.text() === 'Settle')!.trigger('click');
    await flushPromises();
    expect(reviews.settleRemark).toHaveBeenCalledWith(21);
    expect(wrapper.text()).toContain('settled (2)');
  });

  it('offers no new-remark form to someone who is not assigned and no curator', async () => {
    const wrapper = await mountPanel(['reviewer'], 5);
    expect(wrapper.find('#remark-body').exists()).toBe(false);
    expect(threads(wrapper)).toHaveLength(2);
  });

  it('brings a remark opened elsewhere into view and focus, showing it even when the filter hid it', async () => {
    const wrapper = await mountPanel(['reviewer'], 2);
    expect(threads(wrapper)).toHaveLength(2);
    const review = useReviewStore();
    review.showRemark(23);
    await flushPromises();
    expect(threads(wrapper)).toHaveLength(3);
    expect(wrapper.text()).toContain('Fine now');
    expect(document.activeElement?.id).toBe('remark-thread-23');
    expect(review.shownRemarkId).toBeNull();
  });

  it('keeps the open filter when the opened remark is open', async () => {
    const wrapper = await mountPanel(['reviewer'], 2);
    useReviewStore().showRemark(21);
    await flushPromises();
    expect(threads(wrapper)).toHaveLength(2);
    expect(document.activeElement?.id).toBe('remark-thread-21');
  });
});
