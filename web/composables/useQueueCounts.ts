import { ref, watch } from 'vue';
import { useRoute } from 'vue-router';
import { fetchQueueCounts } from '@web/services/queues';
import type { QueueCounts } from '@web/services/types';
import { useReviewActivityStore } from '@web/stores/reviewActivity';

/**
 * The numbers beside the queue links, fetched again after every navigation and every review act
 * done in this tab, so that a verdict or an adoption shows at once. A failure only hides the numbers:
 * the links themselves still work.
 */
export function useQueueCounts(enabled: () => boolean) {
  const route = useRoute();
  const counts = ref<QueueCounts | null>(null);
  const activity = useReviewActivityStore();

  async function load(): Promise<void> {
    if (!enabled()) return;
    try {
      counts.value = await fetchQueueCounts();
    } catch {
      counts.value = null;
    }
  }

  watch(() => [route.fullPath, activity.changes], load, { immediate: true });
  return counts;
}
