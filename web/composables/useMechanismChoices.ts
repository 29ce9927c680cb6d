import { ref } from 'vue';
import { listMechanismChoices, type MechanismChoice } from '@web/services/sets';

/** The set editor's picker suggestions; only the newest search lands, so typing fast stays right. */
export function useMechanismChoices() {
  const choices = ref<MechanismChoice[]>([]);
  const error = ref<string | null>(null);
  let running: AbortController | null = null;

  async function search(text: string): Promise<void> {
    running?.abort();
    const mine = new AbortController();
    running = mine;
    try {
      const found = await listMechanismChoices(text.trim(), mine.signal);
      if (running === mine) {
        choices.value = found;
        error.value = null;
      }
    } catch (caught) {
      if (running !== mine || (caught instanceof DOMException && caught.name === 'AbortError')) return;
      choices.value = [];
      error.value = caught instanceof Error ? caught.message : String(caught);
    }
  }

  /** Drops the search in flight: its answer would open the list again after focus has left. */
  function cancel(): void {
    running?.abort();
    running = null;
  }

  return { choices, error, search, cancel };
}
