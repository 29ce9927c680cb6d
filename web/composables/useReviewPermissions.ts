import { computed } from 'vue';
import type { MechanismSummary } from '@web/services/mechanisms';
import { useReviewStore } from '@web/stores/review';
import { useSessionStore } from '@web/stores/session';

/**
 * What the signed-in person may do in the mechanism's review, mirroring the server's rules so
 * that only usable actions are offered (the server still checks every one).
 */
export function useReviewPermissions(mechanism: () => MechanismSummary | null) {
  const session = useSessionStore();
  const review = useReviewStore();

  const isEditor = computed(() => mechanism()?.youCanEdit === true);
  const isCurator = computed(() => session.hasRole('curator'));
  const isAssigned = computed(() => review.round?.reviewers.some((r) => r.id === session.user?.id) === true);
  const active = computed(() => review.isActive);

  return {
    isEditor,
    isCurator,
    isAssigned,
    canOpen: computed(() => isEditor.value && !active.value && mechanism() !== null),
    canAssign: computed(() => isCurator.value && active.value),
    canGiveVerdict: computed(() => isAssigned.value && !isEditor.value && active.value),
    canAdopt: computed(() => isCurator.value && review.round?.state === 'endorsed'),
    canWithdraw: computed(() => isEditor.value && active.value),
    canRemark: computed(() => (isAssigned.value || isCurator.value) && active.value),
    canSettle: (authorId: number) => isEditor.value || session.user?.id === authorId,
    canReply: computed(() => isEditor.value || isAssigned.value || isCurator.value),
  };
}
