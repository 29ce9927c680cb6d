import { ref, watch, type Ref } from 'vue';

/**
 * Keeps the page of a paginated table on the selected row: selecting a step in the editor
 * turns the table to the page that shows it.
 */
export function useStepPage(ids: Ref<string[]>, selected: Ref<string | null>, rows: number) {
  const first = ref(0);
  watch(
    [selected, ids],
    ([id]) => {
      const index = id === null ? -1 : ids.value.indexOf(id);
      if (index >= 0) first.value = Math.floor(index / rows) * rows;
      else if (first.value >= ids.value.length) first.value = 0;
    },
    { immediate: true },
  );
  return first;
}
