/**
 * The editor's unsaved text per mechanism in localStorage, so nothing typed is lost on a failed
 * save, a closed tab or a reload. `base` is the revision the text started from.
 */
export interface StoredDraft {
  source: string;
  base: number | null;
  savedAt: string;
}

const PREFIX = 'cyclewright:draft:';

export function draftKey(slug: string | null): string {
  return `${PREFIX}${slug ?? 'new'}`;
}

export function readDraft(slug: string | null): StoredDraft | null {
  try {
    const raw = localStorage.getItem(draftKey(slug));
    if (!raw) return null;
    const parsed = JSON.parse(raw) as Partial<StoredDraft>;
    return typeof parsed.source === 'string' ? { source: parsed.source, base: parsed.base ?? null, savedAt: parsed.savedAt ?? '' } : null;
  } catch {
    return null;
  }
}

export function writeDraft(slug: string | null, draft: Omit<StoredDraft, 'savedAt'>): void {
  try {
    localStorage.setItem(draftKey(slug), JSON.stringify({ ...draft, savedAt: new Date().toISOString() }));
  } catch {
    // Storage full or disabled: the draft still lives in the editor; nothing else to do.
  }
}

export function clearDraft(slug: string | null): void {
  try {
    localStorage.removeItem(draftKey(slug));
  } catch {
    // Same as above: nothing to clear when storage is unavailable.
  }
}
