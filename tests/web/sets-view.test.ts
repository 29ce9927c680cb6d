import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { flushPromises } from '@vue/test-utils';
import SetsView from '@web/views/SetsView.vue';
import * as auth from '@web/services/auth';
import * as sets from '@web/services/sets';
import { demoUser, mountWithApp } from './mount-app';

vi.mock('@web/services/auth', () => ({ fetchSession: vi.fn(), GITHUB_SIGN_IN_PATH: '/auth/github' }));
vi.mock('@web/services/sets', async (original) => ({
  ...(await original<typeof import('@web/services/sets')>()),
  listSets: vi.fn(), getSet: vi.fn(), createSet: vi.fn(),
}));

const summary: sets.SetSummary = {
  id: 5, title: 'Radical chains and catalytic cycles', audience: 'Short course', owner: { id: 9, name: 'Bram Sedge' }, itemCount: 2, youOwn: false, updatedAt: '2026-11-30T10:00:00Z',
};
const detail: sets.SetDetail = {
  ...summary,
  createdAt: '2026-11-28T09:00:00Z',
  items: [
    { position: 1, mechanism: { slug: 'stratospheric-nox', title: 'Ozone and NOx', latestRevision: 3, referenceRevision: 2 }, revision: 2, note: 'Start here' },
    { position: 2, mechanism: { slug: 'clo-dimer', title: 'ClO dimer cycle', latestRevision: 1, referenceRevision: null }, revision: 1, note: '' },
  ],
};

async function openAs(roles: Parameters<typeof demoUser>[0]) {
  vi.mocked(auth.fetchSession).mockResolvedValue({ user: demoUser(roles), csrfToken: 't' });
  return (await mountWithApp(SetsView, { path: '/sets' })).wrapper;
}

beforeEach(() => {
  vi.mocked(sets.listSets).mockResolvedValue([summary]);
  vi.mocked(sets.getSet).mockResolvedValue(detail);
});
afterEach(() => {
  vi.mocked(sets.createSet).mockReset();
  document.body.innerHTML = '';
});

describe('SetsView', () => {
  it('opens a set with its items in order and a download link per format, with and without answers', async () => {
    const wrapper = await openAs(['author']);
    await wrapper.get('tbody tr').trigger('click');
    await flushPromises();
    expect(wrapper.findAll('ol li').map((li) => li.text())).toEqual(['Ozone and NOx (r2) — Start here', 'ClO dimer cycle (r1)']);
    const links = wrapper.findAll('a[download]').map((a) => a.attributes('href'));
    expect(links).toHaveLength(10);
    expect(links).toContain('/api/exports/sets/5?format=pdf&answers=true');
    expect(links).toContain('/api/exports/sets/5?format=tex&answers=false');
    expect(wrapper.text()).not.toContain('New set');
  });

  it('lets an instructor create a set from mechanism addresses and revisions', async () => {
    vi.mocked(sets.createSet).mockResolvedValue(detail);
    const wrapper = await openAs(['instructor']);
    await wrapper.get('button.sets-view__new').trigger('click');
    await flushPromises();
    const field = (selector: string, value: string) => {
      const input = document.querySelector(selector) as HTMLInputElement;
      input.value = value;
      input.dispatchEvent(new Event('input'));
    };
    field('#set-title', 'Radical chains and catalytic cycles');
    field('input[aria-label="Mechanism 1 (address)"]', ' stratospheric-nox ');
    field('input[aria-label="Note for mechanism 1"]', 'Start here');
    document.querySelector('form.set-editor-form')!.dispatchEvent(new Event('submit'));
    await flushPromises();
    expect(sets.createSet).toHaveBeenCalledWith({
      title: 'Radical chains and catalytic cycles', audience: '', items: [{ mechanism: 'stratospheric-nox', revision: 1, note: 'Start here' }],
    });
  });
});
