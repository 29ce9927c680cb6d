import { ref, shallowRef, type Ref } from 'vue';
import { ApiError } from '@web/services/http';
import { saveRevision, type RevisionConflict, type RevisionDetail } from '@web/services/mechanisms';

/** Two texts side by side: the author's, based on an older revision, and the latest revision's. */
export interface ComparedTexts {
  latest: Pick<RevisionConflict['latest'], 'number' | 'source' | 'changeNote'>;
  yours: Pick<RevisionConflict['yours'], 'base' | 'source'>;
}
import { sourceSizeProblem } from '@web/components/workbench/saveMessages';
import { clearDraft, writeDraft } from './useDraftStorage';

function isConflict(error: unknown): error is ApiError & { details: RevisionConflict } {
  if (!(error instanceof ApiError) || error.status !== 409) return false;
  const details = error.details as Partial<RevisionConflict> | undefined;
  return typeof details?.latest?.source === 'string' && typeof details.yours?.source === 'string';
}

/**
 * Saving the editor's text as the next revision. The revision is based on `base`, the revision
 * the editor started from; when someone saved in between, the server answers 409 and `conflict`
 * holds both texts. The draft stays in localStorage until a save succeeds.
 */
export function useRevisionSave(slug: Ref<string | null>, base: Ref<number | null>, source: Ref<string>) {
  const saving = ref(false);
  const error = ref<Error | null>(null);
  const conflict = shallowRef<ComparedTexts | null>(null);
  /** The author's own text, kept beside the editor after taking the latest, to copy from. */
  const keptText = ref<string | null>(null);

  async function save(changeNote: string): Promise<RevisionDetail | null> {
    if (saving.value || slug.value === null || base.value === null) return null;
    saving.value = true;
    error.value = null;
    writeDraft(slug.value, { source: source.value, base: base.value });
    const tooLong = sourceSizeProblem(source.value.length);
    if (tooLong) {
      // The server would refuse it the same way; saying so here spares sending a megabyte for nothing.
      error.value = new Error(`The text has ${tooLong}`);
      saving.value = false;
      return null;
    }
    try {
      const saved = await saveRevision(slug.value, { base: base.value, source: source.value, changeNote });
      clearDraft(slug.value);
      conflict.value = null;
      keptText.value = null;
      return saved;
    } catch (caught) {
      error.value = caught instanceof Error ? caught : new Error(String(caught));
      if (isConflict(caught)) conflict.value = caught.details;
      return null;
    } finally {
      saving.value = false;
    }
  }

  /**
   * Rebase: the editor takes the latest revision's text and number; the author's text stays
   * beside it (and in the draft) to re-apply the changes from.
   */
  function takeLatest(): void {
    const current = conflict.value;
    if (!current) return;
    keptText.value = current.yours.source;
    base.value = current.latest.number;
    source.value = current.latest.source;
    conflict.value = null;
    error.value = null;
  }

  function dismissKept(): void {
    keptText.value = null;
  }

  /** A restored text based on an older revision, shown against the latest as a refused save would be. */
  function compareWith(latest: RevisionDetail, yours: ComparedTexts['yours']): void {
    conflict.value = { latest: { number: latest.number, source: latest.source, changeNote: latest.changeNote }, yours };
  }

  return { saving, error, conflict, keptText, save, takeLatest, dismissKept, compareWith };
}
