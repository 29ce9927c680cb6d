import { reactive, ref } from 'vue';
import { adoptRound, getRound, listToAdopt, type RoundDetail, type QueuedRound } from '@web/services/reviews';
import { useReviewActivityStore } from '@web/stores/reviewActivity';
import { useLoader } from './useLoader';

/** The curator's "to adopt" queue: endorsed rounds, each round's endorsements, and adopting one. */
export function useAdoptionQueue() {
  const queue = useLoader(listToAdopt, []);
  const details = reactive<Record<number, RoundDetail>>({});
  const adoptingId = ref<number | null>(null);
  const adoptError = ref('');
  const activity = useReviewActivityStore();

  async function load(): Promise<void> {
    await queue.load();
    const rounds = await Promise.allSettled(queue.data.value.map((round) => getRound(round.id)));
    for (const result of rounds) if (result.status === 'fulfilled') details[result.value.id] = result.value;
  }

  async function adopt(round: QueuedRound): Promise<void> {
    adoptingId.value = round.id;
    adoptError.value = '';
    try {
      await adoptRound(round.id);
      activity.record();
      await load();
    } catch (caught) {
      adoptError.value = `${round.title}, r${round.revision}: ${caught instanceof Error ? caught.message : String(caught)}`;
    } finally {
      adoptingId.value = null;
    }
  }

  return { rounds: queue.data, pending: queue.pending, error: queue.error, details, load, adopt, adoptingId, adoptError };
}
