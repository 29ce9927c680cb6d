import { ref, watch } from 'vue';
import { ApiError } from '@web/services/http';
import { createMechanism, type MechanismSummary, type Visibility } from '@web/services/mechanisms';
import { fieldErrorsOf } from '@web/services/validation';
import { sourceSizeProblem } from '@web/components/workbench/saveMessages';
import { clearDraft } from './useDraftStorage';

/** A new mechanism: title, visibility and the first text, saved together as r1. */
export function useNewMechanism() {
  const title = ref('');
  const visibility = ref<Visibility>('private');
  const titleError = ref<string | null>(null);
  const creating = ref(false);
  const error = ref<Error | null>(null);
  // The message answers an empty title; once one is typed it no longer applies.
  watch(title, (value) => {
    if (value.trim()) titleError.value = null;
  });

  async function create(source: string, changeNote: string): Promise<MechanismSummary | null> {
    titleError.value = title.value.trim() ? null : 'Give the mechanism a title';
    if (titleError.value || creating.value) return null;
    const tooLong = sourceSizeProblem(source.length);
    error.value = tooLong ? new Error(`The text has ${tooLong}`) : null;
    if (tooLong) return null;
    creating.value = true;
    try {
      const created = await createMechanism({ title: title.value.trim(), visibility: visibility.value, source, changeNote });
      clearDraft(null);
      return created;
    } catch (caught) {
      error.value = caught instanceof Error ? caught : new Error(String(caught));
      if (caught instanceof ApiError) titleError.value = fieldErrorsOf(caught).title ?? null;
      return null;
    } finally {
      creating.value = false;
    }
  }

  return { title, visibility, titleError, creating, error, create };
}
