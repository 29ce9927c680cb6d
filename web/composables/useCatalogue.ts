import { ref } from 'vue';
import { searchCatalogue, type CatalogueEntry } from '@web/services/catalogue';

function toError(caught: unknown): Error {
  return caught instanceof Error ? caught : new Error(String(caught));
}

/** The catalogue page's list: the current filters, the entries found, and which one is open. */
export function useCatalogue() {
  const query = ref('');
  const substructure = ref('');
  const entries = ref<CatalogueEntry[]>([]);
  const total = ref(0);
  const selected = ref<CatalogueEntry | null>(null);
  const pending = ref(false);
  const error = ref<Error | null>(null);

  async function search(): Promise<void> {
    pending.value = true;
    error.value = null;
    try {
      const page = await searchCatalogue({ q: query.value.trim() || undefined, substructure: substructure.value.trim() || undefined });
      entries.value = page.items;
      total.value = page.total;
      if (selected.value) selected.value = page.items.find((entry) => entry.id === selected.value!.id) ?? null;
    } catch (caught) {
      error.value = toError(caught);
    } finally {
      pending.value = false;
    }
  }

  /** Puts a saved entry in place (or first, when new) and opens it. */
  function saved(entry: CatalogueEntry): void {
    const known = entries.value.some((row) => row.id === entry.id);
    entries.value = known ? entries.value.map((row) => (row.id === entry.id ? entry : row)) : [entry, ...entries.value];
    if (!known) total.value += 1;
    selected.value = entry;
  }

  return { query, substructure, entries, total, selected, pending, error, search, saved };
}
