import { computed, onScopeDispose, ref, shallowRef, watch } from 'vue';
import { useRoute, useRouter } from 'vue-router';
import { apiQuery, chipsOf, filtersFromQuery, queryFromFilters, withoutChip, type FilterChip, type LibraryFilters } from '@web/components/library/libraryQuery';
import { listMechanisms, type MechanismPage } from '@web/services/mechanisms';
import { useSessionStore } from '@web/stores/session';

/**
 * The library list: filters read from the address, one page of mechanisms from the server
 * (sorting and paging happen there), with loading and error states.
 */
export function useLibrary() {
  const route = useRoute();
  const router = useRouter();
  const session = useSessionStore();
  const page = shallowRef<MechanismPage | null>(null);
  const loading = ref(false);
  const error = ref<Error | null>(null);
  let inFlight: AbortController | null = null;

  const filters = computed(() => filtersFromQuery(route.query));
  const chips = computed(() => chipsOf(filters.value));
  const filtered = computed(() => chips.value.length > 0);

  async function load(): Promise<void> {
    inFlight?.abort();
    const controller = new AbortController();
    inFlight = controller;
    loading.value = true;
    try {
      page.value = await listMechanisms(apiQuery(filters.value, session.user?.id ?? null), controller.signal);
      error.value = null;
    } catch (caught) {
      if (controller.signal.aborted) return;
      error.value = caught instanceof Error ? caught : new Error(String(caught));
    } finally {
      if (inFlight === controller) loading.value = false;
    }
  }

  function update(change: Partial<LibraryFilters>): void {
    const next = { ...filters.value, page: 1, ...change };
    void router.replace({ name: 'library', query: queryFromFilters(next) });
  }

  const removeChip = (key: FilterChip['key']) => void router.replace({ name: 'library', query: queryFromFilters(withoutChip(filters.value, key)) });
  const clearAll = () => void router.replace({ name: 'library' });

  watch(() => route.name === 'library' && JSON.stringify(filters.value), (key) => key && void load(), { immediate: true });
  onScopeDispose(() => inFlight?.abort());

  return { page, loading, error, filters, chips, filtered, load, update, removeChip, clearAll };
}
