import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { effectScope, nextTick, ref } from 'vue';
import { useDraftAutosave } from '@web/composables/useDraftAutosave';
import { readDraft, readForeignDrafts, writeDraft } from '@web/composables/useDraftStorage';
import { useNewMechanism } from '@web/composables/useNewMechanism';
import WorkbenchDraftNotices from '@web/components/workbench/WorkbenchDraftNotices.vue';
import { mountWithProps } from '../review/mount-with-props';

vi.mock('@web/services/mechanisms', () => ({ createMechanism: vi.fn() }));

const R3 = 'B1: Br• + O3 -> BrO• + O2\nB2: BrO• + BrO• -> 2 Br• + O2';
const TAB_B_TEXT = 'B1: Br• + O3 -> BrO• + O2\nB5: Br2 + hν -> 2 Br•';

/** Makes the code under test run as if in the named tab (sessionStorage is per tab). */
const inTab = (id: string) => sessionStorage.setItem('cyclewright:tab', id);

function autosave(slug: string | null, saved: string, title?: string) {
  const scope = effectScope();
  const source = ref(saved);
  const titleRef = ref(title ?? '');
  const drafts = scope.run(() => useDraftAutosave(ref(slug), source, ref<number | null>(3), ref(saved), titleRef))!;
  return { drafts, source, title: titleRef, close: () => scope.stop() };
}

beforeEach(() => {
  localStorage.clear();
  sessionStorage.clear();
  vi.useFakeTimers();
});
afterEach(() => vi.useRealTimers());

describe('drafts of two tabs of one mechanism', () => {
  it('never restores another tab’s text as this tab’s own, and keeps both texts', () => {
    inTab('B');
    writeDraft('salt-lake-bromine', { source: TAB_B_TEXT, base: 2 });
    inTab('A');
    writeDraft('salt-lake-bromine', { source: 'A’s own unsaved text', base: 3 });

    // Tab A reloads on r3: its own text comes back; tab B's is only listed, with the revision it started from.
    const a = autosave('salt-lake-bromine', R3);
    expect(a.drafts.restorable(R3, null)?.source).toBe('A’s own unsaved text');
    expect(a.drafts.foreign.value.map((d) => [d.source, d.base])).toEqual([[TAB_B_TEXT, 2]]);

    // With no text of its own, tab A restores nothing, and tab B's text is still kept.
    localStorage.removeItem('cyclewright:draft:salt-lake-bromine:A');
    expect(a.drafts.restorable(R3, null)).toBeNull();
    expect(a.drafts.foreign.value).toHaveLength(1);

    // Tab B reloads: its own text, based on r2, is what it gets back.
    inTab('B');
    expect(readDraft('salt-lake-bromine')).toMatchObject({ source: TAB_B_TEXT, base: 2 });
    a.close();
  });

  it('takes another tab’s draft only when asked, moving it under this tab’s key', () => {
    inTab('B');
    writeDraft('salt-lake-bromine', { source: TAB_B_TEXT, base: 2 });
    inTab('A');
    const a = autosave('salt-lake-bromine', R3);
    a.drafts.restorable(R3, null);
    a.drafts.takeForeign(a.drafts.foreign.value[0]);
    expect(readDraft('salt-lake-bromine')).toMatchObject({ source: TAB_B_TEXT, base: 2 });
    expect(readForeignDrafts('salt-lake-bromine')).toEqual([]);
    expect(a.drafts.foreign.value).toEqual([]);
    a.close();
  });

  it('files each tab’s typing under its own key', async () => {
    inTab('A');
    const a = autosave('salt-lake-bromine', R3);
    a.source.value = `${R3}\nB3: BrO• + hν -> Br• + O(3P)`;
    await nextTick();
    vi.advanceTimersByTime(1500);
    inTab('B');
    expect(readDraft('salt-lake-bromine')).toBeNull();
    expect(readForeignDrafts('salt-lake-bromine').map((d) => d.source)).toEqual([a.source.value]);
    a.close();
  });
});

describe('a new mechanism’s draft', () => {
  it('keeps the typed title with the text, so a reload restores both', async () => {
    inTab('A');
    const tab = autosave(null, '');
    tab.source.value = 'A1: O3 -> O2 + O(3P)';
    tab.title.value = 'Ozone photolysis';
    await nextTick();
    vi.advanceTimersByTime(1500);
    tab.close();
    const reloaded = autosave(null, '');
    expect(reloaded.drafts.restorable('', null)).toMatchObject({ source: 'A1: O3 -> O2 + O(3P)', title: 'Ozone photolysis' });
    reloaded.close();
  });

  it('clears “Give the mechanism a title” as soon as a title is typed', async () => {
    const scope = effectScope();
    const fresh = scope.run(() => useNewMechanism())!;
    expect(await fresh.create('A1: O3 -> O2 + O(3P)', '')).toBeNull();
    expect(fresh.titleError.value).toBe('Give the mechanism a title');
    fresh.title.value = 'O';
    await nextTick();
    expect(fresh.titleError.value).toBeNull();
    scope.stop();
  });
});

describe('WorkbenchDraftNotices', () => {
  it('says which revision a restored text started from, and offers to compare it with the latest', async () => {
    vi.useRealTimers();
    const { wrapper } = await mountWithProps(WorkbenchDraftNotices, {
      restored: { savedAt: '2026-12-02T08:00:00Z', base: 2 }, latest: 3, foreign: [], editorDirty: true,
    });
    expect(wrapper.get('[data-testid="restored-draft"]').text()).toContain('it is based on r2 and the latest is r3');
    await wrapper.findAll('button').find((button) => button.text() === 'Compare with r3')!.trigger('click');
    expect(wrapper.emitted('compare')).toHaveLength(1);
    wrapper.unmount();
  });

  it('lists another tab’s text as not taken, and will not replace unsaved text in this editor', async () => {
    vi.useRealTimers();
    const foreign = [{ key: 'cyclewright:draft:salt-lake-bromine:B', source: TAB_B_TEXT, base: 2, savedAt: '2026-12-02T08:00:00Z' }];
    const { wrapper } = await mountWithProps(WorkbenchDraftNotices, { restored: null, latest: 3, foreign, editorDirty: true });
    const notice = wrapper.get('[data-testid="foreign-draft"]');
    expect(notice.text()).toContain('another tab or window');
    expect(notice.text()).toContain('(based on r2; the latest is r3)');
    expect(notice.text()).not.toContain('was restored');
    const take = notice.findAll('button').find((button) => button.text() === 'Put it in the editor')!;
    expect(take.attributes('disabled')).toBeDefined();
    await wrapper.setProps({ editorDirty: false });
    await take.trigger('click');
    expect(wrapper.emitted('take')?.[0]).toEqual([foreign[0]]);
    wrapper.unmount();
  });
});
