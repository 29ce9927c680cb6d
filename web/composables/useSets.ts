import { ref } from 'vue';
import { deleteSet, getSet, listSets, type SetDetail, type SetSummary } from '@web/services/sets';

function toError(caught: unknown): Error {
  return caught instanceof Error ? caught : new Error(String(caught));
}

/** The sets page: the sets I may read, the one opened with its items, and deleting my own. */
export function useSets() {
  const sets = ref<SetSummary[]>([]);
  const opened = ref<SetDetail | null>(null);
  const pending = ref(false);
  const error = ref<Error | null>(null);
  const deleting = ref(false);
  const deleteError = ref<string | null>(null);

  async function load(): Promise<void> {
    pending.value = true;
    error.value = null;
    try {
      sets.value = await listSets();
    } catch (caught) {
      error.value = toError(caught);
    } finally {
      pending.value = false;
    }
  }

  async function open(id: number): Promise<void> {
    error.value = null;
    try {
      opened.value = await getSet(id);
    } catch (caught) {
      error.value = toError(caught);
    }
  }

  /** Deletes the set and forgets it; a refusal is kept in `deleteError` for the dialog to show. */
  async function remove(id: number): Promise<boolean> {
    deleting.value = true;
    deleteError.value = null;
    try {
      await deleteSet(id);
      if (opened.value?.id === id) opened.value = null;
      sets.value = sets.value.filter((set) => set.id !== id);
      return true;
    } catch (caught) {
      deleteError.value = toError(caught).message;
      return false;
    } finally {
      deleting.value = false;
    }
  }

  return { sets, opened, pending, error, deleting, deleteError, load, open, remove };
}
