import { computed, watch } from 'vue';
import type { MechanismAnalysis, StepJson } from '@api/analysis/analysis.schemas';
import type { Remark } from '@web/services/reviews';
import { useReviewStore } from '@web/stores/review';

export interface PlacedRemarks {
  /** Remarks under the step's id (`B2`, or `#3` for an unlabelled step). */
  byStep: Map<string, Remark[]>;
  /** Remarks under the 1-based line of the step in the text being shown. */
  byLine: Map<number, Remark[]>;
}

/**
 * The step a remark is about in the text on screen, found as the server follows remarks into a
 * new revision: the same label first, then the same normalised equation.
 */
export function placeRemark(remark: Remark, steps: readonly StepJson[]): StepJson | undefined {
  const byLabel = remark.stepLabel ? steps.find((step) => step.label === remark.stepLabel) : undefined;
  return byLabel ?? steps.find((step) => step.normalised === remark.stepNormalised);
}

function push<K>(map: Map<K, Remark[]>, key: K, remark: Remark): void {
  map.set(key, [...(map.get(key) ?? []), remark]);
}

/** Groups the still-matching remarks by step id and line; without an analysis, by their saved anchor. */
export function placeRemarks(remarks: readonly Remark[], analysis: MechanismAnalysis | null): PlacedRemarks {
  const placed: PlacedRemarks = { byStep: new Map(), byLine: new Map() };
  for (const remark of remarks.filter((r) => r.matching)) {
    if (!analysis) {
      if (remark.stepLabel) push(placed.byStep, remark.stepLabel, remark);
      push(placed.byLine, remark.stepLine, remark);
      continue;
    }
    const step = placeRemark(remark, analysis.steps);
    if (!step) continue;
    push(placed.byStep, step.id, remark);
    push(placed.byLine, step.line, remark);
  }
  return placed;
}

/**
 * The remarks of the mechanism's review round in progress, placed on the steps of the text the
 * workbench shows (which may be an unsaved edit of the reviewed revision). Empty when no round is
 * in progress. Loads the mechanism's review into the shared store when the slug changes.
 */
export function useStepRemarks(slug: () => string | null, analysis: () => MechanismAnalysis | null) {
  const review = useReviewStore();
  watch(slug, (next) => {
    if (next !== review.slug) void review.load(next);
  }, { immediate: true });
  const placed = computed(() => placeRemarks(review.isActive ? review.remarks : [], analysis()));
  return {
    byStep: computed(() => placed.value.byStep),
    byLine: computed(() => placed.value.byLine),
  };
}
