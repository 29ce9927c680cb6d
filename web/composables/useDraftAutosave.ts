import { onScopeDispose, ref, watch, type Ref } from 'vue';
import {
  clearDraft, readDraft, readForeignDrafts, removeStoredDraft, writeDraft, type ForeignDraft, type StoredDraft,
} from './useDraftStorage';

// Long enough to stay out of the way of the analysis refresh: writing a large text blocks the page.
const WRITE_DELAY_MS = 1000;

/**
 * Keeps the editor's text (and a new mechanism's title) in localStorage while it differs from the
 * saved revision, and offers a stored draft back when the mechanism is opened again: this tab's own
 * draft goes back into the editor; drafts other tabs left are listed, never taken silently.
 */
export function useDraftAutosave(slug: Ref<string | null>, source: Ref<string>, base: Ref<number | null>, savedSource: Ref<string>, title?: Ref<string>) {
  let timer: ReturnType<typeof setTimeout> | undefined;
  /** Drafts other tabs left for this mechanism: shown beside the editor to look at, take or discard. */
  const foreign = ref<ForeignDraft[]>([]);

  const unsaved = () => source.value !== savedSource.value || !!title?.value.trim();
  const snapshot = () => ({ source: source.value, base: base.value, ...(title?.value ? { title: title.value } : {}) });

  // The key, text and base are taken when the text changes, so a navigation in between never
  // files one mechanism's text under another's key.
  watch(() => [source.value, title?.value], () => {
    const key = slug.value;
    const draft = snapshot();
    const keep = unsaved();
    clearTimeout(timer);
    timer = setTimeout(() => (keep ? writeDraft(key, draft) : clearDraft(key)), WRITE_DELAY_MS);
  });

  onScopeDispose(() => {
    clearTimeout(timer);
    if (unsaved()) writeDraft(slug.value, snapshot());
  });

  /** This tab's draft worth restoring over `saved` (started from `revision`, or from any revision when null). */
  function restorable(saved: string, revision: number | null): StoredDraft | null {
    foreign.value = readForeignDrafts(slug.value).filter((draft) => draft.source !== saved || !!draft.title);
    const draft = readDraft(slug.value);
    if (!draft || (draft.source === saved && !draft.title)) return null;
    return revision === null || draft.base === revision ? draft : null;
  }

  function discard(): void {
    clearTimeout(timer);
    clearDraft(slug.value);
  }

  /** Another tab's draft becomes this tab's (the caller puts it in the editor); its old key goes. */
  function takeForeign(draft: ForeignDraft): void {
    clearTimeout(timer);
    writeDraft(slug.value, { source: draft.source, base: draft.base, ...(draft.title ? { title: draft.title } : {}) });
    dropForeign(draft);
  }

  function dropForeign(draft: ForeignDraft): void {
    removeStoredDraft(draft.key);
    foreign.value = foreign.value.filter((other) => other.key !== draft.key);
  }

  return { foreign, restorable, discard, takeForeign, dropForeign };
}
