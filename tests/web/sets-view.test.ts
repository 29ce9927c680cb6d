import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { flushPromises } from '@vue/test-utils';
import SetsView from '@web/views/SetsView.vue';
import * as auth from '@web/services/auth';
import { ApiError } from '@web/services/http';
import * as sets from '@web/services/sets';
import { demoUser, mountWithApp } from './mount-app';

vi.mock('@web/services/auth', () => ({ fetchSession: vi.fn(), GITHUB_SIGN_IN_PATH: '/auth/github' }));
vi.mock('@web/services/sets', async (original) => ({
  ...(await original<typeof import('@web/services/sets')>()),
  listSets: vi.fn(), getSet: vi.fn(), createSet: vi.fn(), updateSet: vi.fn(), deleteSet: vi.fn(), listMechanismChoices: vi.fn(),
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
const mine: sets.SetDetail = { ...detail, youOwn: true };
const NOX_CHOICE: sets.MechanismChoice = {
  slug: 'stratospheric-nox', title: 'Ozone and NOx', visibility: 'public', ownerName: 'Mei Tidewell', latestRevision: 3, referenceRevision: 2,
};

async function openAs(roles: Parameters<typeof demoUser>[0]) {
  vi.mocked(auth.fetchSession).mockResolvedValue({ user: demoUser(roles), csrfToken: 't' });
  return (await mountWithApp(SetsView, { path: '/sets' })).wrapper;
}

const $ = <T extends Element = HTMLElement>(selector: string) => document.querySelector(selector) as T | null;
const button = (name: string) => [...document.querySelectorAll('button')].find((b) => b.textContent?.trim() === name || b.getAttribute('aria-label') === name)!;
const dialogText = () => $('[role="dialog"]')?.textContent ?? '';

/** Types as a person does: into a field that has focus (the picker searches only while focused). */
function type(selector: string, value: string): void {
  const input = $<HTMLInputElement>(selector)!;
  input.focus();
  input.value = value;
  input.dispatchEvent(new Event('input'));
}

async function submitForm(): Promise<void> {
  $('form.set-editor-form')!.dispatchEvent(new Event('submit'));
  await flushPromises();
}

/** Types into the picker of mechanism `n` and picks the option whose text holds `title`. */
async function pick(n: number, text: string, title: string): Promise<void> {
  type(`#set-item-${n - 1}-mechanism`, text);
  await vi.waitFor(() => expect([...document.querySelectorAll('[role="option"]')].some((o) => o.textContent?.includes(title))).toBe(true));
  ([...document.querySelectorAll('[role="option"]')].find((o) => o.textContent?.includes(title)) as HTMLElement).click();
  await flushPromises();
}

async function openMySetAndClick(action: 'Edit' | 'Delete') {
  vi.mocked(sets.getSet).mockResolvedValue(mine);
  const wrapper = await openAs(['instructor']);
  await wrapper.get('tbody tr').trigger('click');
  await flushPromises();
  button(action).click();
  await flushPromises();
  return wrapper;
}

beforeEach(() => {
  vi.mocked(sets.listSets).mockResolvedValue([summary]);
  vi.mocked(sets.getSet).mockResolvedValue(detail);
  vi.mocked(sets.listMechanismChoices).mockResolvedValue([NOX_CHOICE]);
});
afterEach(() => {
  vi.mocked(sets.createSet).mockReset();
  vi.mocked(sets.updateSet).mockReset();
  vi.mocked(sets.deleteSet).mockReset();
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
    expect(wrapper.text()).not.toMatch(/Edit|Delete/);
  });

  it('lets an instructor pick a mechanism by title, defaulting to its adopted revision', async () => {
    vi.mocked(sets.createSet).mockResolvedValue(mine);
    const wrapper = await openAs(['instructor']);
    await wrapper.get('button.sets-view__new').trigger('click');
    await flushPromises();
    type('#set-title', 'Radical chains and catalytic cycles');
    await pick(1, 'ozone', 'Ozone and NOx');
    expect(sets.listMechanismChoices).toHaveBeenLastCalledWith('ozone', expect.any(AbortSignal));
    expect($('[aria-label="Revision of mechanism 1"]')!.textContent).toContain('r2 · adopted');
    type('input[aria-label="Note for mechanism 1"]', 'Start here');
    await submitForm();
    expect(sets.createSet).toHaveBeenCalledWith({
      title: 'Radical chains and catalytic cycles', audience: '', items: [{ mechanism: 'stratospheric-nox', revision: 2, note: 'Start here' }],
    });
  });

  it('says what is missing at the field without asking the server', async () => {
    const wrapper = await openAs(['instructor']);
    await wrapper.get('button.sets-view__new').trigger('click');
    await flushPromises();
    await submitForm();
    expect(sets.createSet).not.toHaveBeenCalled();
    expect($('#set-title-error')!.textContent).toContain('Give the set a title');
    expect($('#set-item-0-error')!.textContent).toContain('Mechanism 1: choose a mechanism');
    type('#set-title', 'Halogen cycles');
    await flushPromises();
    expect($('#set-title-error')).toBeNull();
    expect($('#set-item-0-error')!.textContent).toContain('Mechanism 1: choose a mechanism');
    await pick(1, 'nox', 'Ozone and NOx');
    expect($('#set-item-0-error')).toBeNull();
  });

  it('places the server\'s refusals at their fields in plain words and keeps what was typed', async () => {
    vi.mocked(sets.createSet)
      .mockRejectedValueOnce(new ApiError(422, 'UNKNOWN_REVISION', 'Mechanism 1: stratospheric-nox has no revision r5 (latest is r3)', { field: 'items.0.revision', latest: 3 }))
      .mockRejectedValueOnce(new ApiError(400, 'VALIDATION_FAILED', 'Invalid input — title: Too long; items.0.note: Keep the note under 5,000 characters', [
        { path: ['items', '0', 'note'], message: 'Keep the note under 5,000 characters' },
      ]));
    const wrapper = await openAs(['instructor']);
    await wrapper.get('button.sets-view__new').trigger('click');
    await flushPromises();
    type('#set-title', 'Halogen cycles');
    await pick(1, 'nox', 'Ozone and NOx');
    await submitForm();
    expect($('#set-item-0-error')!.textContent).toContain('Mechanism 1: stratospheric-nox has no revision r5 (latest is r3)');
    await submitForm();
    expect($('#set-item-0-error')!.textContent).toContain('Mechanism 1: keep the note under 5,000 characters');
    expect(dialogText()).not.toContain('Invalid input');
    expect($<HTMLInputElement>('#set-title')!.value).toBe('Halogen cycles');
    expect($<HTMLInputElement>('#set-item-0-mechanism')!.value).toBe('Ozone and NOx');
  });

  it('lets the owner edit the set; a failed save keeps the edits in the form', async () => {
    await openMySetAndClick('Edit');
    expect($<HTMLInputElement>('#set-title')!.value).toBe('Radical chains and catalytic cycles');
    type('#set-title', 'Radical chains, week 2');
    button('Move mechanism 2 up').click();
    await flushPromises();
    vi.mocked(sets.updateSet).mockRejectedValueOnce(new ApiError(0, 'NETWORK_ERROR', 'The Cyclewright server could not be reached.'));
    await submitForm();
    expect(dialogText()).toContain('The Cyclewright server could not be reached.');
    expect($<HTMLInputElement>('#set-title')!.value).toBe('Radical chains, week 2');
    vi.mocked(sets.updateSet).mockResolvedValueOnce({ ...mine, title: 'Radical chains, week 2' });
    await submitForm();
    expect(sets.updateSet).toHaveBeenLastCalledWith(5, {
      title: 'Radical chains, week 2', audience: 'Short course',
      items: [{ mechanism: 'clo-dimer', revision: 1, note: '' }, { mechanism: 'stratospheric-nox', revision: 2, note: 'Start here' }],
    });
    expect($('form.set-editor-form')).toBeNull();
  });

  it('deletes the owner\'s set only after the question is confirmed', async () => {
    await openMySetAndClick('Delete');
    expect(dialogText()).toContain('“Radical chains and catalytic cycles” and its notes will be deleted');
    button('Keep the set').click();
    await flushPromises();
    expect(sets.deleteSet).not.toHaveBeenCalled();
    button('Delete').click();
    await flushPromises();
    vi.mocked(sets.deleteSet).mockResolvedValueOnce(undefined);
    button('Delete set').click();
    await flushPromises();
    expect(sets.deleteSet).toHaveBeenCalledWith(5);
    expect(document.body.textContent).not.toContain('Delete this set?');
  });
});
