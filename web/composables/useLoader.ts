import { ref, shallowRef, type Ref } from 'vue';

const toError = (caught: unknown) => (caught instanceof Error ? caught : new Error(String(caught)));

/**
 * One thing loaded from the API: the value, `pending` while a load runs, the last `error`.
 * A failed reload keeps the value that was there, so a page does not go blank on a hiccup;
 * only the newest of overlapping loads lands.
 */
export function useLoader<T>(fetcher: () => Promise<T>, initial: T) {
  const data = shallowRef(initial) as Ref<T>;
  const pending = ref(false);
  const error = ref<Error | null>(null);
  let generation = 0;

  async function load(): Promise<void> {
    const mine = ++generation;
    pending.value = true;
    error.value = null;
    try {
      const value = await fetcher();
      if (mine === generation) data.value = value;
    } catch (caught) {
      if (mine === generation) error.value = toError(caught);
    } finally {
      if (mine === generation) pending.value = false;
    }
  }

  return { data, pending, error, load };
}
