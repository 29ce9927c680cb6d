import { afterEach, describe, expect, it, vi } from 'vitest';
import { flushPromises } from '@vue/test-utils';
import LibraryView from '@web/views/LibraryView.vue';
import * as auth from '@web/services/auth';
import * as mechanisms from '@web/services/mechanisms';
import { ApiError } from '@web/services/http';
import { demoUser, eventually, mountWithApp } from '../mount-app';

vi.mock('@web/services/auth', () => ({ fetchSession: vi.fn(), GITHUB_SIGN_IN_PATH: '/auth/github' }));
vi.mock('@web/services/mechanisms', () => ({ listMechanisms: vi.fn() }));

const author = demoUser(['author']);
const row = {
  id: 1, slug: 'salt-lake-bromine', title: 'Salt-lake bromine cycle', tags: ['field-station'], visibility: 'public' as const,
  latestRevisionNumber: 3, updatedAt: '2026-11-30T10:00:00.000Z', ownerId: 7, ownerName: 'Ines Marlow',
  referenceRevision: 2, roundState: 'endorsed' as const, stepCount: 5, speciesCount: 8,
};

afterEach(() => {
  vi.mocked(mechanisms.listMechanisms).mockReset();
  document.body.innerHTML = '';
});

async function open(path = '/') {
  vi.mocked(auth.fetchSession).mockResolvedValue({ user: author, csrfToken: 't' });
  const mounted = await mountWithApp(LibraryView, { path });
  await flushPromises();
  return mounted;
}

describe('LibraryView', () => {
  it('lists mechanisms with reference and latest revision, round state, counts, owner and visibility', async () => {
    vi.mocked(mechanisms.listMechanisms).mockResolvedValue({ items: [row], total: 1, page: 1, pageSize: 20 });
    const { wrapper } = await open();
    await eventually(() => expect(wrapper.findAll('tbody tr')).toHaveLength(1));
    const cells = wrapper.findAll('tbody td').map((cell) => cell.text().replace(/\s+/g, ' ').trim());
    expect(cells[0]).toBe('Salt-lake bromine cycle');
    expect(cells[1]).toBe('field-station');
    expect(cells[2]).toBe('r2');
    expect(cells[3]).toMatch(/^r3 · /);
    expect(cells[4]).toBe('endorsed');
    expect(cells.slice(5)).toEqual(['8', '5', 'Ines Marlow', 'public']);
  });

  it('sends the search tokens of the address to the API', async () => {
    vi.mocked(mechanisms.listMechanisms).mockResolvedValue({ items: [row], total: 1, page: 1, pageSize: 20 });
    await open('/?q=ozone%20species:BrO.%20tag:field-station&state=endorsed');
    expect(vi.mocked(mechanisms.listMechanisms).mock.calls[0][0]).toMatchObject({ q: 'ozone', species: 'BrO•', tag: 'field-station', state: 'endorsed' });
  });

  it('offers a first mechanism and the demo examples when the library is empty', async () => {
    vi.mocked(mechanisms.listMechanisms).mockResolvedValue({ items: [], total: 0, page: 1, pageSize: 20 });
    const { wrapper } = await open();
    await eventually(() => expect(wrapper.text()).toContain('Write your first mechanism'));
    const examples = wrapper.findAll('.library-empty-state__examples a').map((link) => link.attributes('href'));
    expect(examples).toContain('/new?example=salt-lake-bromine');
  });

  it('says when filters match nothing, with a way to clear them', async () => {
    vi.mocked(mechanisms.listMechanisms).mockResolvedValue({ items: [], total: 0, page: 1, pageSize: 20 });
    const { wrapper } = await open('/?q=tag:nothing');
    await eventually(() => expect(wrapper.text()).toContain('Nothing matches these filters'));
    expect(wrapper.text()).toContain('tag: nothing');
  });

  it('shows the server\'s reason when the list cannot be loaded', async () => {
    vi.mocked(mechanisms.listMechanisms).mockRejectedValue(new ApiError(503, 'DB_DOWN', 'The database is not answering.'));
    const { wrapper } = await open();
    await eventually(() => expect(wrapper.find('[role="alert"]').text()).toContain('The database is not answering.'));
  });
});
