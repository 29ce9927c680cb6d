import { computed, watch, type Ref } from 'vue';
import { useReviewStore } from '@web/stores/review';
import { useReviewActivityStore } from '@web/stores/reviewActivity';
import { placeRemark } from './useStepRemarks';
import type { useWorkbenchOpening } from './useWorkbenchOpening';

type Bench = ReturnType<typeof useWorkbenchOpening>;

/**
 * The review as the workbench frame shows it: the round's state for the header, the summary read
 * again after any review act (the badge, the reference star), and opening a remark's thread.
 */
export function useWorkbenchReview(bench: Bench, activePanel: Ref<string>) {
  const { workbench: wb, live, selection } = bench;
  const review = useReviewStore();
  const activity = useReviewActivityStore();
  watch(() => activity.changes, () => wb.refreshSummary().catch(() => undefined));

  // The review store holds the round as the last act left it (in progress, else the latest, as the
  // library shows it); before it has loaded, the summary's round in progress.
  const roundState = computed(() => {
    const mechanism = wb.mechanism.value;
    return review.slug === mechanism?.slug && review.round ? review.round.state : (mechanism?.activeRound?.state ?? null);
  });

  /** The editor's and the Steps section's remark buttons: the thread in Remarks, its step selected everywhere. */
  function openRemark(remarkId: number): void {
    const remark = review.remarks.find((r) => r.id === remarkId);
    const step = remark?.matching && live.analysis.value ? placeRemark(remark, live.analysis.value.steps) : undefined;
    if (step) selection.selectStep(step.id);
    activePanel.value = 'remarks';
    review.showRemark(remarkId);
  }

  return { roundState, openRemark };
}
