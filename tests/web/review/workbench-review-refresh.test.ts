import { afterEach, describe, expect, it, vi } from 'vitest';
import { flushPromises } from '@vue/test-utils';
import App from '@web/App.vue';
import * as auth from '@web/services/auth';
import * as mechanisms from '@web/services/mechanisms';
import * as queues from '@web/services/queues';
import * as reviews from '@web/services/reviews';
import { demoUser, eventually, mountWithApp } from '../mount-app';
import { analysedAsJson, demoMechanism, demoRound, NOX_SOURCE } from './review-fixtures';

vi.setConfig({ testTimeout: 30_000 });
vi.mock('@web/services/auth', () => ({ fetchSession: vi.fn(), GITHUB_SIGN_IN_PATH: '/auth/github' }));
vi.mock('@web/services/queues', () => ({ fetchQueueCounts: vi.fn() }));
vi.mock('@web/services/analysis', () => ({ analyseText: vi.fn() }));
vi.mock('@web/services/mechanisms', async (original) => ({
  ...(await original<typeof mechanisms>()), getMechanism: vi.fn(), listRevisions: vi.fn(), getRevision: vi.fn(),
}));
vi.mock('@web/services/reviews', () => ({
  listRounds: vi.fn(), getRound: vi.fn(), listRemarks: vi.fn(), findPeople: vi.fn(), adoptRound: vi.fn(),
}));

const source = NOX_SOURCE;
const analysis = analysedAsJson(source);
const CURATOR_ID = 4;

/** The server's answers before the adoption: r2 endorsed, r1 the reference, one round to adopt. */
function serverBefore() {
  const round = demoRound({ state: 'endorsed', endorsements: 2 });
  vi.mocked(auth.fetchSession).mockResolvedValue({ user: demoUser(['curator'], { id: CURATOR_ID }), csrfToken: 't' });
  vi.mocked(mechanisms.getMechanism).mockResolvedValue(demoMechanism({ activeRound: { id: 11, state: 'endorsed' } }));
  vi.mocked(mechanisms.listRevisions).mockResolvedValue([1, 2].map((number) => ({
    id: number, number, changeNote: '', createdAt: '2026-11-20T10:00:00.000Z', authorId: 1, authorName: 'Rosalind Samphire', stepCount: 12, errorCount: 0,
  })));
  vi.mocked(mechanisms.getRevision).mockResolvedValue({
    id: 2, number: 2, parentId: 1, changeNote: '', author: { id: 1, name: 'Rosalind Samphire' }, createdAt: '2026-11-21T10:00:00.000Z', source, analysis,
  });
  vi.mocked(reviews.listRounds).mockResolvedValue([{ id: 11, state: 'endorsed', revision: 2, createdAt: round.createdAt, closedAt: null }]);
  vi.mocked(reviews.getRound).mockResolvedValue(round);
  vi.mocked(reviews.listRemarks).mockResolvedValue([]);
  vi.mocked(reviews.findPeople).mockResolvedValue([{ id: CURATOR_ID, name: 'Anouk Spartina', roles: ['curator'] }]);
  vi.mocked(queues.fetchQueueCounts).mockResolvedValue({ myReviews: 0, toAdopt: 1 });
}

/** …and after it: the round adopted, r2 the reference, nothing left to adopt. */
function serverAfter() {
  const adopted = demoRound({ state: 'adopted', endorsements: 2, closedAt: '2026-11-22T10:00:00.000Z' });
  vi.mocked(reviews.adoptRound).mockResolvedValue(adopted);
  vi.mocked(reviews.getRound).mockResolvedValue(adopted);
  vi.mocked(reviews.listRounds).mockResolvedValue([{ id: 11, state: 'adopted', revision: 2, createdAt: adopted.createdAt, closedAt: adopted.closedAt }]);
  vi.mocked(mechanisms.getMechanism).mockResolvedValue(demoMechanism({ activeRound: null, referenceRevision: 2 }));
  vi.mocked(queues.fetchQueueCounts).mockResolvedValue({ myReviews: 0, toAdopt: 0 });
}

afterEach(() => {
  vi.clearAllMocks();
  document.body.innerHTML = '';
});

describe('the workbench after a review act', () => {
  it('shows the adoption in the header badge, the revision picker and the queue count without a reload', async () => {
    serverBefore();
    const { wrapper } = await mountWithApp(App, { path: '/m/stratospheric-nox#review' });
    const badge = () => wrapper.find('.workbench-header .library-round-state-tag');
    const toAdopt = () => wrapper.find('[data-queue="to-adopt"] .p-badge');
    await eventually(() => expect(badge().text()).toBe('endorsed'));
    expect(toAdopt().text()).toBe('1');
    expect(wrapper.get('.workbench-header .p-select-label').text()).toMatch(/^r2 · /);

    const adopt = () => wrapper.findAll('button').find((b) => b.text() === 'Adopt r2');
    await eventually(() => expect(adopt()).toBeDefined());
    await flushPromises();
    serverAfter();
    await adopt()!.trigger('click');
    await flushPromises();

    expect(reviews.adoptRound).toHaveBeenCalledWith(11);
    await eventually(() => expect(badge().text()).toBe('adopted'));
    await eventually(() => expect(wrapper.get('.workbench-header .p-select-label').text()).toMatch(/^r2 ★ reference/));
    expect(toAdopt().exists()).toBe(false);
    wrapper.unmount();
  });
});
