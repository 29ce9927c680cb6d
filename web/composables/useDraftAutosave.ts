import { onScopeDispose, watch, type Ref } from 'vue';
import { clearDraft, readDraft, writeDraft, type StoredDraft } from './useDraftStorage';

// Long enough to stay out of the way of the analysis refresh: writing a large text blocks the page.
const WRITE_DELAY_MS = 1000;

/**
 * Keeps the editor's text in localStorage while it differs from the saved revision, and offers
 * a stored draft back when the mechanism is opened again.
 */
export function useDraftAutosave(slug: Ref<string | null>, source: Ref<string>, base: Ref<number | null>, savedSource: Ref<string>) {
  let timer: ReturnType<typeof setTimeout> | undefined;

  // The key, text and base are taken when the text changes, so a navigation in between never
  // files one mechanism's text under another's key.
  watch(source, (text) => {
    const key = slug.value;
    const draft = { source: text, base: base.value };
    clearTimeout(timer);
    timer = setTimeout(() => (text === savedSource.value ? clearDraft(key) : writeDraft(key, draft)), WRITE_DELAY_MS);
  });

  onScopeDispose(() => {
    clearTimeout(timer);
    if (source.value !== savedSource.value) writeDraft(slug.value, { source: source.value, base: base.value });
  });

  /** A stored draft worth restoring over `saved` (started from `revision`, or from any revision when null). */
  function restorable(saved: string, revision: number | null): StoredDraft | null {
    const draft = readDraft(slug.value);
    if (!draft || draft.source === saved) return null;
    return revision === null || draft.base === revision ? draft : null;
  }

  function discard(): void {
    clearTimeout(timer);
    clearDraft(slug.value);
  }

  return { restorable, discard };
}
