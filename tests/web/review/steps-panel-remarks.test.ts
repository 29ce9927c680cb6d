import { afterEach, describe, expect, it, vi } from 'vitest';
import { flushPromises } from '@vue/test-utils';
import WorkbenchStepsPanel from '@web/components/workbench/WorkbenchStepsPanel.vue';
import * as auth from '@web/services/auth';
import * as reviews from '@web/services/reviews';
import type { Remark } from '@web/services/reviews';
import { demoUser } from '../mount-app';
import { mountWithProps } from './mount-with-props';
import { analysedAsJson, demoMechanism, demoRemark, demoRound, NOX_SOURCE } from './review-fixtures';

vi.mock('@web/services/auth', () => ({ fetchSession: vi.fn(), GITHUB_SIGN_IN_PATH: '/auth/github' }));
vi.mock('@web/services/reviews', () => ({ listRounds: vi.fn(), getRound: vi.fn(), listRemarks: vi.fn() }));

const source = NOX_SOURCE;
const analysis = analysedAsJson(source);
const c2 = analysis.steps.find((step) => step.id === 'C2')!;

/** The Steps section of a mechanism whose round in progress has these remarks. */
async function stepsPanelWith(remarks: Remark[], withRound = true) {
  vi.mocked(auth.fetchSession).mockResolvedValue({ user: demoUser(['author']), csrfToken: 't' });
  const round = { id: 11, state: 'open' as const, revision: 2, createdAt: '2026-11-20T10:05:00.000Z', closedAt: null };
  vi.mocked(reviews.listRounds).mockResolvedValue(withRound ? [round] : []);
  vi.mocked(reviews.getRound).mockResolvedValue(demoRound());
  vi.mocked(reviews.listRemarks).mockResolvedValue(remarks);
  const { wrapper } = await mountWithProps(WorkbenchStepsPanel, { mechanism: demoMechanism(), revision: null, source, analysis, selectedStep: null }, '/m/stratospheric-nox');
  await flushPromises();
  return wrapper;
}

afterEach(() => {
  vi.clearAllMocks();
  document.body.innerHTML = '';
});

describe('the remarks beside their steps in the Steps section', () => {
  it('puts each remark in a row right under its step, in a line: author, first line, replies, state', async () => {
    const gone = demoRemark({ id: 30, matching: false, stepLabel: 'X9' });
    const wrapper = await stepsPanelWith([demoRemark(), demoRemark({ id: 40, stepLabel: 'C2', stepNormalised: c2.normalised, state: 'settled', bodyHtml: '<p>Fine</p>' }), gone]);
    const rows = wrapper.findAll('tbody tr');
    const rowOf = (id: string) => rows.findIndex((row) => row.find('td')?.text() === id);
    const under = (id: string) => rows[rowOf(id) + 1];
    expect(under('N1').classes()).toContain('p-datatable-row-expansion');
    expect(under('N1').text().replace(/\s+/g, ' ')).toBe('Open remark: Kofi Glasswort Check the rate 0 replies open');
    expect(under('C2').text()).toContain('settled');
    // One row per remark still matching a step, plus one per step; the remark whose step is gone is only in Remarks.
    expect(rows).toHaveLength(analysis.steps.length + 2);
  });

  it('asks the workbench to open the thread when a remark is pressed', async () => {
    const wrapper = await stepsPanelWith([demoRemark()]);
    await wrapper.get('[data-remark-id="21"]').trigger('click');
    expect(wrapper.emitted('open-remark')).toEqual([[21]]);
    expect(wrapper.emitted('select-step')).toBeUndefined();
  });

  it('shows no remark rows without a review round in progress', async () => {
    const wrapper = await stepsPanelWith([demoRemark()], false);
    expect(reviews.listRemarks).not.toHaveBeenCalled();
    expect(wrapper.findAll('.p-datatable-row-expansion')).toHaveLength(0);
  });
});
