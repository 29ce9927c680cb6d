import { defineStore } from 'pinia';
import { ref } from 'vue';

/**
 * A count of the review acts done in this tab (open a round, assign, verdict, withdraw, adopt).
 * What shows a round's state elsewhere (the workbench header's badge and revision picker, the
 * queue counts) watches it and reads the server again, so an act shows without a reload.
 */
export const useReviewActivityStore = defineStore('review-activity', () => {
  const changes = ref(0);
  const record = () => {
    changes.value += 1;
  };
  return { changes, record };
});
