/**
 * The editor's unsaved text per mechanism in localStorage, so nothing typed is lost on a failed
 * save, a closed tab or a reload. Each tab files its text under its own key (the tab's id lives in
 * sessionStorage, which a reload keeps), so two tabs of one mechanism never overwrite each other
 * and a tab never takes another's text for its own. `base` is the revision the text started from;
 * `title` is a new mechanism's title, typed before its first save.
 */
export interface StoredDraft {
  source: string;
  base: number | null;
  savedAt: string;
  title?: string;
}

/** A draft filed by another tab (or by a version of the app without tab keys), found by its key. */
export interface ForeignDraft extends StoredDraft {
  key: string;
}

const PREFIX = 'cyclewright:draft:';
const TAB_KEY = 'cyclewright:tab';

let memoryTabId: string | null = null;

// crypto.randomUUID exists only in secure contexts; a plain-http deployment still needs an id.
const newTabId = () => Array.from(crypto.getRandomValues(new Uint8Array(9)), (byte) => byte.toString(36).padStart(2, '0')).join('');

/** This tab's id: kept in sessionStorage so a reload stays the same tab; a new tab gets a new one. */
function tabId(): string {
  try {
    const known = sessionStorage.getItem(TAB_KEY);
    if (known) return known;
    const fresh = newTabId();
    sessionStorage.setItem(TAB_KEY, fresh);
    return fresh;
  } catch {
    memoryTabId ??= newTabId();
    return memoryTabId;
  }
}

const mechanismKey = (slug: string | null) => `${PREFIX}${slug ?? 'new'}`;

export function draftKey(slug: string | null): string {
  return `${mechanismKey(slug)}:${tabId()}`;
}

function parse(raw: string | null): StoredDraft | null {
  if (!raw) return null;
  try {
    const parsed = JSON.parse(raw) as Partial<StoredDraft>;
    if (typeof parsed.source !== 'string') return null;
    const draft: StoredDraft = { source: parsed.source, base: parsed.base ?? null, savedAt: parsed.savedAt ?? '' };
    if (typeof parsed.title === 'string') draft.title = parsed.title;
    return draft;
  } catch {
    return null;
  }
}

/** This tab's draft of the mechanism (`null` slug: a new one). */
export function readDraft(slug: string | null): StoredDraft | null {
  try {
    return parse(localStorage.getItem(draftKey(slug)));
  } catch {
    return null;
  }
}

/** Drafts of the mechanism that other tabs filed, newest first. */
export function readForeignDrafts(slug: string | null): ForeignDraft[] {
  const own = draftKey(slug);
  const found: ForeignDraft[] = [];
  try {
    for (let i = 0; i < localStorage.length; i++) {
      const key = localStorage.key(i);
      if (!key || key === own || (key !== mechanismKey(slug) && !key.startsWith(`${mechanismKey(slug)}:`))) continue;
      const draft = parse(localStorage.getItem(key));
      if (draft) found.push({ ...draft, key });
    }
  } catch {
    return [];
  }
  return found.sort((a, b) => b.savedAt.localeCompare(a.savedAt));
}

export function writeDraft(slug: string | null, draft: Omit<StoredDraft, 'savedAt'>): void {
  try {
    localStorage.setItem(draftKey(slug), JSON.stringify({ ...draft, savedAt: new Date().toISOString() }));
  } catch {
    // Storage full or disabled: the draft still lives in the editor; nothing else to do.
  }
}

export function clearDraft(slug: string | null): void {
  removeStoredDraft(draftKey(slug));
}

/** Forgets one stored draft by its key (another tab's, once taken over or discarded). */
export function removeStoredDraft(key: string): void {
  try {
    localStorage.removeItem(key);
  } catch {
    // Same as above: nothing to clear when storage is unavailable.
  }
}
