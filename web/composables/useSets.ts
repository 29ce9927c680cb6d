import { ref } from 'vue';
import { getSet, listSets, type SetDetail, type SetSummary } from '@web/services/sets';

function toError(caught: unknown): Error {
  return caught instanceof Error ? caught : new Error(String(caught));
}

/** The sets page: the sets I may read, and the one opened with its items. */
export function useSets() {
  const sets = ref<SetSummary[]>([]);
  const opened = ref<SetDetail | null>(null);
  const pending = ref(false);
  const error = ref<Error | null>(null);

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

  return { sets, opened, pending, error, load, open };
}
