import { reactive, ref } from 'vue';
import { adoptRound, getRound, listRemarks, listToAdopt, type QueuedRound, type Remark, type RoundDetail } from '@web/services/reviews';
import { useReviewActivityStore } from '@web/stores/reviewActivity';
import { useLoader } from './useLoader';

/** The curator's "to adopt" queue: endorsed rounds, each round's endorsements, and adopting one. */
export function useAdoptionQueue() {
  const queue = useLoader(listToAdopt, []);
  const details = reactive<Record<number, RoundDetail>>({});
  const adoptingId = ref<number | null>(null);
  const adoptError = ref('');
  /** A round whose adoption waits for the curator to confirm over its open remarks. */
  const caution = ref<{ round: QueuedRound; remarks: Remark[] } | null>(null);
  const activity = useReviewActivityStore();

  async function load(): Promise<void> {
    await queue.load();
    const rounds = await Promise.allSettled(queue.data.value.map((round) => getRound(round.id)));
    for (const result of rounds) if (result.status === 'fulfilled') details[result.value.id] = result.value;
  }

  /** Adopts the round; with open remarks, first only lists them (`confirmed` adopts over them). */
  async function adopt(round: QueuedRound, confirmed = false): Promise<void> {
    adoptingId.value = round.id;
    adoptError.value = '';
    try {
      const open = confirmed ? [] : (await listRemarks(round.id)).filter((remark) => remark.state === 'open');
      caution.value = open.length > 0 ? { round, remarks: open } : null;
      if (caution.value) return;
      await adoptRound(round.id);
      activity.record();
      await load();
    } catch (caught) {
      adoptError.value = `${round.title}, r${round.revision}: ${caught instanceof Error ? caught.message : String(caught)}`;
    } finally {
      adoptingId.value = null;
    }
  }

  return { rounds: queue.data, pending: queue.pending, error: queue.error, details, load, adopt, adoptingId, adoptError, caution };
}
